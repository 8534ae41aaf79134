// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { PREFS_STORAGE_KEY } from "@/lib/comparisons/format";
import { detailOf, point, vehicleWith } from "@/lib/garage/testUtil";
import { answerFetch } from "@/tests/support/fetchAnswer";
import { VehicleView } from "./VehicleView";

vi.mock("next/link", () => import("@/tests/support/nextLink"));
vi.mock("next/navigation", () => import("@/tests/support/navigation"));
afterEach(() => {
  cleanup();
  window.localStorage.clear();
  vi.unstubAllGlobals();
});

// Hand-checked, 1 in = 25.4 mm exactly (NIST SP 811): a 101.6 mm lift is 4 in; 106.1 mm of hub bore is
// 4.177 in → 4.18 in, 66.8 sixteenths → 4-3/16 in; 40 mm of room is 1.5748 in → 1.57 in, 25.2 sixteenths → 1-9/16 in.
const detail = detailOf(vehicleWith({ liftHeightMm: 101.6, hubBoreMm: 106.1 }), [point("rail", "inboard", 40)]);

function renderView(prefs: object) {
  window.localStorage.setItem(PREFS_STORAGE_KEY, JSON.stringify(prefs));
  answerFetch(200, { profile: null });
  render(
    <QueryClientProvider client={new QueryClient()}>
      <VehicleView initial={detail} initialPlanned={null} />
    </QueryClientProvider>,
  );
}
const figure = (label: string) => screen.getByText(label).nextElementSibling!.textContent;

describe("vehicle page: the figures follow the Units switch", () => {
  it("inch mode shows lift, hub bore, tire diameter, reach and measured points in inches first", () => {
    renderView({ units: "imperial", lengths: "decimal" });
    expect(figure("Lift height")).toBe("4 in (101.6 mm)");
    expect(figure("Hub bore")).toBe("4.18 in (106.1 mm)");
    expect(figure("Current tire diameter")).toMatch(/^[\d.]+ in \([\d.]+ mm\)$/);
    expect(figure("Current reach inboard / outboard of the hub face")).toMatch(/^[\d.]+ in \([\d.]+ mm\) \/ [\d.]+ in \([\d.]+ mm\)$/);
    expect(screen.getByTestId("clearance-point").textContent).toContain("1.57 in (40 mm) (entered as 40 mm)");
  });

  it("metric mode shows millimetres first", () => {
    renderView({ units: "metric", lengths: "fraction" });
    expect(figure("Lift height")).toBe("101.6 mm (4 in)");
    expect(figure("Hub bore")).toBe("106.1 mm (4-3/16 in)");
    expect(figure("Current tire diameter")).toMatch(/^[\d.]+ mm \([\d-/]+ in\)$/);
    expect(screen.getByTestId("clearance-point").textContent).toContain("40 mm (1-9/16 in) (entered as 40 mm)");
  });
});
