import { describe, expect, it } from "vitest";
import { planLoad } from "@/lib/comparisons/loadPlan";
import { LOAD_BASE, LOAD_LABELS } from "@/lib/comparisons/loadPlanTestUtil";
import { pressureAxis, roundAxis } from "./chartData";

describe("round chart axes", () => {
  it("puts the ticks on round numbers of the unit shown, spanning the data (common practice, no source)", () => {
    expect(roundAxis(10.15, 50)).toEqual({ ticks: [10, 20, 30, 40, 50], domain: [10, 50] });
    expect(roundAxis(70, 344.7)).toEqual({ ticks: [50, 100, 150, 200, 250, 300, 350], domain: [50, 350] });
    expect(roundAxis(70, 551.6)).toEqual({ ticks: [0, 100, 200, 300, 400, 500, 600], domain: [0, 600] });
    expect(roundAxis(0.1, 0.7)).toEqual({ ticks: [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7], domain: [0.1, 0.7] });
    for (const [lo, hi] of [
      [3, 97],
      [10.15, 80],
      [1234, 5678],
      [0.013, 0.019],
    ] as const) {
      const a = roundAxis(lo, hi);
      expect(a.ticks.length).toBeLessThanOrEqual(8);
      expect(a.domain[0]).toBeLessThanOrEqual(lo);
      expect(a.domain[1]).toBeGreaterThanOrEqual(hi);
    }
  });

  it("gives the load chart's pressure axis round psi and kPa ticks (P265/70R17 113S placard → 37x12.50R17LT LRD)", () => {
    const { plan } = planLoad(LOAD_BASE, LOAD_LABELS, { units: "imperial", lengths: "decimal" });
    // The curve runs from half the lower road minimum to the higher maximum pressure: 50 psi (flotation load range D,
    // from memory) = 344.7 kPa; the P-metric road minimum 140 kPa (FMVSS 138 Table 1, from memory) halved = 70 kPa = 10.15 psi
    // (1 psi = 6.894757 kPa, NIST SP 811), which the chart used to show as 10.2, 20.2, 30.2 …
    expect(pressureAxis(plan!, { units: "imperial", lengths: "decimal" }).ticks).toEqual([10, 20, 30, 40, 50]);
    expect(pressureAxis(plan!, { units: "metric", lengths: "decimal" }).ticks).toEqual([50, 100, 150, 200, 250, 300, 350]);
  });
});
