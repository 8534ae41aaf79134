// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { PREFS_STORAGE_KEY } from "@/lib/comparisons/format";
import { HAULER, PLAN, detailOf, point } from "@/lib/garage/testUtil";
import { PlannedPanel } from "./PlannedPanel";

vi.setConfig({ testTimeout: 20_000 });
vi.mock("next/link", () => import("@/tests/support/nextLink"));
afterEach(cleanup);

const detail = detailOf(HAULER);

describe("plan a setup: the margin's messages name it as labelled", () => {
  it("says “Safety margin”, not “Margin”, when a bare 12 is typed", async () => {
    const user = userEvent.setup();
    render(<PlannedPanel detail={detail} initialPlanned={null} />);
    const margin = screen.getByLabelText("Safety margin");
    await user.clear(margin);
    await user.type(margin, "12");
    expect(await screen.findByText("Safety margin: say which unit 12 is in, e.g. 1/2 in or 12 mm.")).toBeTruthy();
  });
});

describe("plan a setup: the predictions follow the page's Units switch", () => {
  afterEach(() => window.localStorage.clear());
  const withPoint = detailOf(HAULER, [point("rail", "inboard", 40)]);
  /** The panel as drawn after the page's Units switch was last left on `units`, lengths as `lengths`. */
  const renderIn = (units: "imperial" | "metric", lengths: "decimal" | "fraction", detail = withPoint) => {
    window.localStorage.setItem(PREFS_STORAGE_KEY, JSON.stringify({ units, lengths }));
    render(<PlannedPanel detail={detail} initialPlanned={PLAN} />);
  };
  const measuredCell = () => within(screen.getByTestId("predictions")).getAllByRole("row")[1]!.querySelectorAll("td")[1]!.textContent;

  // 40 mm / 25.4 = 1.5748 in (1 in = 25.4 mm exactly, NIST SP 811): 1.57 in; 25.2 sixteenths → 1-9/16 in.
  it("inch mode shows the measured gap in inches first, the millimetres in brackets", () => {
    renderIn("imperial", "decimal");
    expect(measuredCell()).toBe("1.57 in (40 mm)");
    for (const tile of ["Diameter", "Radius (upward)", "Inner clearance", "Poke"]) {
      expect(screen.getByText(tile).nextElementSibling!.textContent, tile).toMatch(/ in$/);
    }
  });

  it("inch mode writes the steering axis in the prediction note in inches", () => {
    renderIn(
      "imperial",
      "decimal",
      detailOf({ ...HAULER, kingpinInclinationDeg: 9 }, [point("rail", "inboard", 40, { suspensionState: "full-lock" })]),
    );
    expect(screen.getByTestId("prediction-note").textContent).toMatch(/[\d.]+ in inboard of the hub face/);
  });

  it("metric mode shows millimetres first, the inches in brackets", () => {
    renderIn("metric", "fraction");
    expect(measuredCell()).toBe("40 mm (1-9/16 in)");
    for (const tile of ["Diameter", "Radius (upward)", "Inner clearance", "Poke"]) {
      expect(screen.getByText(tile).nextElementSibling!.textContent, tile).toMatch(/ mm$/);
    }
  });
});
