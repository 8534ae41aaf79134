// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { planLoad } from "@/lib/comparisons/loadPlan";
import { LOAD_BASE, LOAD_LABELS } from "@/lib/comparisons/loadPlanTestUtil";
import LoadPressureChart from "./LoadPressureChart";

vi.setConfig({ testTimeout: 30_000 });
vi.mock("recharts", async (importOriginal) => (await import("@/components/comparison/chartsTestUtil")).fixedSizeRecharts(importOriginal));
afterEach(cleanup);

const { plan } = planLoad(LOAD_BASE, LOAD_LABELS, { units: "imperial", lengths: "decimal" });

const xTicks = () =>
  [...screen.getByTestId("load-chart").querySelectorAll(".recharts-xAxis-tick-labels .recharts-cartesian-axis-tick-value")].map(
    (t) => t.textContent ?? "",
  );

describe("the load chart's pressure axis", () => {
  // The curve runs from 70 kPa (half the P-metric road minimum 140 kPa, FMVSS 138 Table 1, from memory) to 50 psi
  // (flotation load range D, from memory); 70 kPa = 10.15 psi (NIST SP 811), once shown as 10.2, 20.2, 30.2, 40.2, 50.
  it("ticks round psi in the imperial display", () => {
    render(<LoadPressureChart plan={plan!} prefs={{ units: "imperial", lengths: "decimal" } satisfies DisplayPrefs} />);
    expect(xTicks()).toEqual(["10", "20", "30", "40", "50"]);
  });

  it("ticks round kPa in the metric display", () => {
    render(<LoadPressureChart plan={plan!} prefs={{ units: "metric", lengths: "decimal" } satisfies DisplayPrefs} />);
    expect(xTicks()).toEqual(["50", "100", "150", "200", "250", "300", "350"]);
  });
});
