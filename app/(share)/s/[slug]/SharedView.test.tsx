// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { PREFS_STORAGE_KEY } from "@/lib/comparisons/format";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { SharedView } from "./SharedView";

// The charts load through next/dynamic in the page; here they render at once, at a fixed size
// (jsdom lays nothing out, so the responsive wrapper would draw nothing).
vi.mock("@/components/comparison/LazyComparisonCharts", async () => {
  const { default: ComparisonCharts } = await import("@/components/comparison/ComparisonCharts");
  return { LazyComparisonCharts: ComparisonCharts };
});
vi.mock("recharts", async (importOriginal) => (await import("@/components/comparison/chartsTestUtil")).fixedSizeRecharts(importOriginal));

const stat = (id: string) => [...screen.getByTestId(id).querySelectorAll("dt, dd")].map((n) => n.textContent);
const xTicks = (name: RegExp) =>
  [...screen.getByRole("figure", { name }).querySelectorAll(".recharts-xAxis-tick-labels .recharts-cartesian-axis-tick-value")].map(
    (t) => t.textContent,
  );

beforeEach(() => window.localStorage.clear());
afterEach(cleanup);

// A reader who chose metric; the owner typed cruise speeds of 100 and 113 km/h (stored as km/h ÷ 1.609344).
const input = { ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, cruiseSpeedsMph: [100 / 1.609344, 113 / 1.609344] } };

describe("shared page in the reader's units", () => {
  it("gives a metric reader the same round km/h as the workspace: headline, cruise speeds, chart ticks", () => {
    window.localStorage.setItem(PREFS_STORAGE_KEY, JSON.stringify({ units: "metric", lengths: "decimal" }));
    render(<SharedView name="Trail build" slug="AbC" input={input} />);
    // r = 939.8 / 802.8 (ISO 4000-1 diameters); 100 km/h × r = 117.07 km/h.
    expect(stat("change-speed")).toEqual([
      "True speed at 100 km/h shown",
      "117.1 km/h",
      "Actual speed is 17.1 % above the speedometer; the speedometer reads 14.6 % low.",
    ]);
    expect(stat("change-rpm")[0]).toBe("RPM at 100 km/h");
    const vehicle = screen.getByRole("region", { name: "Vehicle figures used" });
    expect(vehicle.textContent).toContain("Cruise speeds100 km/h, 113 km/h");
    expect(xTicks(/True speed vs speedometer/)).toEqual(["20", "40", "60", "80", "100", "120"]);
    expect(xTicks(/Engine speed vs road speed/)).toEqual(["20", "40", "60", "80", "100", "120"]);
    expect(document.body.textContent).not.toMatch(/96\.6 km\/h|99\.9 km\/h/);
  });

  it("gives an imperial reader round mph and the typed km/h beside the converted cruise speed", () => {
    render(<SharedView name="Trail build" slug="AbC" input={input} />);
    expect(stat("change-speed").slice(0, 2)).toEqual(["True speed at 60 mph shown", "70.2 mph"]);
    // 100 km/h = 62.137 mph, 113 km/h = 70.215 mph (1 mi = 1.609344 km exactly, NIST SP 811).
    expect(screen.getByRole("region", { name: "Vehicle figures used" }).textContent).toContain(
      "Cruise speeds62.1 mph (100 km/h), 70.2 mph (113 km/h)",
    );
    expect(xTicks(/True speed vs speedometer/)).toEqual(["10", "20", "30", "40", "50", "60", "70", "80"]);
  });
});
