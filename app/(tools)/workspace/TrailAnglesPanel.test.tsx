// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import { TrailAnglesPanel } from "./TrailAnglesPanel";

afterEach(cleanup);
const IMPERIAL: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const METRIC: DisplayPrefs = { units: "metric", lengths: "decimal" };
// 265/70R17: D = 431.8 + 371 = 802.8 mm; 37x12.50R17LT: 939.8 mm (ISO 4000-1 / TRA designations).
const result = computeComparison(DEFAULT_INPUT);
// Tangent from a point to a circle on the ground, θ = atan2(h − R, d) + asin(R / ρ) (SAE J1100 definition, from memory).
const theta = (D: number, d: number, h: number) => {
  const R = D / 2;
  return ((Math.atan2(h - R, d) + Math.asin(R / Math.hypot(d, h - R))) * 180) / Math.PI;
};

describe("TrailAnglesPanel", () => {
  it("shows approach for current and planned with the lift, converts on a unit switch, and the brake torque caution", async () => {
    const user = userEvent.setup();
    const { rerender } = render(<TrailAnglesPanel result={result} prefs={METRIC} />);
    await user.type(screen.getByLabelText("Front corner height (mm)"), "600");
    await user.type(screen.getByLabelText("Front corner ahead of the front axle (mm)"), "900");
    await user.type(screen.getByLabelText("Suspension lift (optional) (mm)"), "50");
    const cur = theta(802.8, 900, 600);
    const planned = theta(939.8, 900, 600 + (939.8 - 802.8) / 2 + 50);
    const row = screen.getByTestId("angle-approach");
    expect(row.textContent).toBe(`Approach${cur.toFixed(1)}°${planned.toFixed(1)}°+${(planned - cur).toFixed(1)}°`);
    // Brake torque ratio = planned ÷ current radius = 939.8 / 802.8 (README worked figures).
    expect(screen.getByTestId("brake-torque").textContent).toMatch(/\+17\.1 % brake torque for the same stop \(ratio 1\.171/);

    rerender(<TrailAnglesPanel result={result} prefs={IMPERIAL} />);
    // 600 mm = 23.62 in, 50 mm = 1.97 in (1 in = 25.4 mm, NIST SP 811); the angles do not move.
    expect(screen.getByLabelText("Front corner height (in)")).toHaveProperty("value", "23.62");
    expect(screen.getByLabelText("Suspension lift (optional) (in)")).toHaveProperty("value", "1.97");
    expect(screen.getByTestId("angle-approach").textContent).toBe(row.textContent);
  });

  it("puts the engine's message beside a body point inside the tire", async () => {
    const user = userEvent.setup();
    render(<TrailAnglesPanel result={result} prefs={METRIC} />);
    await user.type(screen.getByLabelText("Front corner height (mm)"), "300");
    await user.type(screen.getByLabelText("Front corner ahead of the front axle (mm)"), "100");
    expect(screen.getByText(/^Front corner height \(mm\): the body point .* is inside the tire's circle/)).toBeTruthy();
    expect(screen.queryByTestId("angle-approach")).toBeNull();
  });
});
