// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import ComparisonCharts from "./ComparisonCharts";

// jsdom lays nothing out, so the responsive wrapper would measure 0 × 0 and draw nothing:
// give the charts a fixed size instead.
vi.mock("recharts", async (importOriginal) => (await import("@/components/comparison/chartsTestUtil")).fixedSizeRecharts(importOriginal));

const inch: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const metric: DisplayPrefs = { units: "metric", lengths: "decimal" };

/** The tick labels of a chart's horizontal axis. */
function xTicks(figureId: string): string[] {
  const fig = screen.getByRole("figure", { name: new RegExp(figureId) });
  return [...fig.querySelectorAll(".recharts-xAxis-tick-labels .recharts-cartesian-axis-tick-value")].map((t) => t.textContent ?? "");
}

afterEach(cleanup);

describe("speed axes in the reader's unit", () => {
  it("metric: round km/h ticks (20 … 120), not converted mph (16.1, 46.1 …)", () => {
    render(<ComparisonCharts result={computeComparison(DEFAULT_INPUT)} prefs={metric} />);
    expect(xTicks("True speed vs speedometer")).toEqual(["20", "40", "60", "80", "100", "120"]);
    expect(xTicks("Engine speed vs road speed")).toEqual(["20", "40", "60", "80", "100", "120"]);
  });

  it("imperial: round mph ticks (10 … 80)", () => {
    render(<ComparisonCharts result={computeComparison(DEFAULT_INPUT)} prefs={inch} />);
    expect(xTicks("True speed vs speedometer")).toEqual(["10", "20", "30", "40", "50", "60", "70", "80"]);
    expect(xTicks("Engine speed vs road speed")).toEqual(["10", "20", "30", "40", "50", "60", "70", "80"]);
  });
});
