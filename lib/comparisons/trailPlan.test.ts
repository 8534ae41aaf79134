import { describe, expect, it } from "vitest";
import { type TrailInput, type TrailLabels, planTrail } from "./trailPlan";

const LABELS: TrailLabels = {
  frontHeight: "Front corner height (mm)",
  frontAhead: "Front corner ahead of the axle (mm)",
  rearHeight: "Rear corner height (mm)",
  rearBehind: "Rear corner behind the axle (mm)",
  wheelbase: "Wheelbase (mm)",
  midHeight: "Lowest point midway (mm)",
  lift: "Lift (mm)",
};
const BASE: TrailInput = {
  currentDiameterMm: 800,
  plannedDiameterMm: 889,
  frontHeightMm: 600,
  frontAheadMm: 900,
  rearHeightMm: 600,
  rearBehindMm: 900,
  wheelbaseMm: 2450,
  midHeightMm: 280,
  liftMm: 0,
};

// Tangent from a point to a circle resting on the ground: θ = atan2(h − R, d) + asin(R / ρ) (plane geometry; SAE J1100 definition, from memory).
const theta = (D: number, d: number, h: number) => {
  const R = D / 2;
  return ((Math.atan2(h - R, d) + Math.asin(R / Math.hypot(d, h - R))) * 180) / Math.PI;
};

describe("planTrail", () => {
  it("gives the worked approach angle (800 mm tire, 900 mm ahead at 600 mm → 38.24°) and the raised one", () => {
    const { angles } = planTrail({ ...BASE, liftMm: 50 }, LABELS);
    const a = angles.find((x) => x.kind === "approach")!;
    expect(a.currentDeg).toBeCloseTo(38.24, 2);
    // Raised by the radius change (44.5 mm) and the lift (50 mm).
    expect(a.plannedDeg).toBeCloseTo(theta(889, 900, 600 + 44.5 + 50), 9);
    expect(a.plannedDeg).toBeGreaterThan(a.currentDeg);
    const b = angles.find((x) => x.kind === "breakover")!;
    expect(b.currentDeg).toBeCloseTo(2 * theta(800, 1225, 280), 9);
  });
  it("puts the engine's message beside the height of a body point inside the tire, and skips only that angle", () => {
    const { angles, errors } = planTrail({ ...BASE, frontAheadMm: 100, frontHeightMm: 300 }, LABELS);
    expect(errors.frontHeight).toMatch(/^Front corner height \(mm\): the body point .* is inside the tire's circle/);
    expect(angles.map((a) => a.kind)).toEqual(["departure", "breakover"]);
  });
});
