import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { BodyPointError, FitmentInputError } from "./errors";
import { errorField, real } from "./testUtil";
import { parseTireSize } from "./tireSize";
import { approachAngleDeg, breakoverAngleDeg, departureAngleDeg, raiseBodyPoint } from "./trailAngles";

/**
 * Independent construction (no closed form): a ramp at slope θ laid against the tire touches it
 * at T = C + R·(sin θ, −cos θ), C = (0, R), the point where the circle's outward normal points
 * down and forward; the ramp's height at the body point's distance d is T_y + (d − T_x)·tan θ.
 * That height rises with θ, so bisection finds the θ at which the ramp reaches the body point:
 * the largest slope the vehicle meets before the point touches (SAE J1100 approach angle).
 */
function rampAngleByBisection(diameterMm: number, d: number, h: number): number {
  const r = diameterMm / 2;
  const rampHeightAt = (theta: number): number => {
    const tx = r * Math.sin(theta);
    const ty = r - r * Math.cos(theta);
    return ty + (d - tx) * Math.tan(theta);
  };
  let lo = 0;
  let hi = Math.PI / 2 - 1e-12;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (rampHeightAt(mid) < h) lo = mid;
    else hi = mid;
  }
  return ((lo + hi) / 2) * (180 / Math.PI);
}

/** Distance from the circle's centre to the line through (px, py) at slope θ (for the tangency check). */
function distanceToLine(r: number, px: number, py: number, theta: number): number {
  // Line direction (cos θ, sin θ); centre (0, r).
  return Math.abs((0 - px) * Math.sin(theta) - (r - py) * Math.cos(theta));
}

describe("approach and departure angle (SAE J1100 definition, from memory)", () => {
  it("worked: 800 mm tire, point 900 mm ahead at 600 mm: atan(200/900) + asin(400/921.95) = 12.529° + 25.713° = 38.24° (by hand)", () => {
    expect(approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 600, cornerOffsetMm: 900 })).toBeCloseTo(38.2416, 3);
    expect(departureAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 600, cornerOffsetMm: 900 })).toBeCloseTo(38.2416, 3);
  });

  it("a point at hub height: θ = asin(R/d) (tangent from a point level with the centre), 800 mm tire, 800 mm ahead → 30°", () => {
    expect(approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 400, cornerOffsetMm: 800 })).toBeCloseTo(30, 9);
  });

  it("agrees with the ramp found by bisection (independent construction), and the line is tangent to the tire", () => {
    fc.assert(
      fc.property(real(600, 1200), real(100, 1200), real(50, 2500), (D, h, extra) => {
        const r = D / 2;
        const d = r + extra; // beyond the tire's front
        const deg = approachAngleDeg({ tireDiameterMm: D, cornerHeightMm: h, cornerOffsetMm: d });
        expect(deg).toBeCloseTo(rampAngleByBisection(D, d, h), 6);
        expect(distanceToLine(r, d, h, (deg * Math.PI) / 180)).toBeCloseTo(r, 6);
      }),
      { numRuns: 1000 },
    );
  });

  it("refuses a point inside the tire's circle and a point over the tire, naming the field", () => {
    expect(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 500, cornerOffsetMm: 300 })).toThrow(/inside the tire's circle/);
    expect(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 500, cornerOffsetMm: 300 })).toThrow(BodyPointError);
    // On the circle counts as inside: 800 mm tire, point 400 mm ahead at hub height touches it.
    expect(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 400, cornerOffsetMm: 400 })).toThrow(BodyPointError);
    expect(errorField(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 500, cornerOffsetMm: 300 }))).toBe("cornerHeightMm");
    expect(errorField(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 900, cornerOffsetMm: 300 }))).toBe("cornerOffsetMm");
    expect(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 900, cornerOffsetMm: 300 })).toThrow(/sits over the tire/);
    expect(errorField(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: -1, cornerOffsetMm: 900 }))).toBe("cornerHeightMm");
    expect(errorField(() => approachAngleDeg({ tireDiameterMm: Number.NaN, cornerHeightMm: 600, cornerOffsetMm: 900 }))).toBe(
      "tireDiameterMm",
    );
    expect(errorField(() => approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 600, cornerOffsetMm: 0 }))).toBe("cornerOffsetMm");
    expect(errorField(() => approachAngleDeg(null as never))).toBe("input");
  });
});

describe("ramp breakover angle (SAE J1100 definition, from memory)", () => {
  it("worked: 33 in tire (838.2 mm), wheelbase 2450 mm, 280 mm midway: 2 × (−6.478° + 19.873°) = 26.79° — a spec-sheet figure for an off-road truck", () => {
    // a = 1225, c − R = 280 − 419.1 = −139.1, ρ = √(1225² + 139.1²) = 1232.87; atan2 = −6.478°, asin(419.1/1232.87) = 19.873° (by hand)
    expect(breakoverAngleDeg({ tireDiameterMm: 838.2, wheelbaseMm: 2450, clearanceMm: 280 })).toBeCloseTo(26.7897, 3);
    expect(breakoverAngleDeg({ tireDiameterMm: 800, wheelbaseMm: 3000, clearanceMm: 250 })).toBeCloseTo(19.3535, 3);
  });

  it("is the supplement of the angle between the two tangent lines meeting at the midpoint (the J1100 construction)", () => {
    fc.assert(
      fc.property(real(600, 1100), real(2000, 4500), real(150, 500), (D, L, c) => {
        const r = D / 2;
        const a = L / 2;
        // Each tangent from M = (a, c) (front axle at x = 0) found by the independent ramp bisection.
        const front = (rampAngleByBisection(D, a, c) * Math.PI) / 180;
        // The rear line is the mirror image: direction from M toward the front tire goes down-forward, toward the rear tire down-backward.
        const toFront = { x: -Math.cos(front), y: -Math.sin(front) };
        const toRear = { x: Math.cos(front), y: -Math.sin(front) };
        const between = (Math.acos(toFront.x * toRear.x + toFront.y * toRear.y) * 180) / Math.PI;
        expect(breakoverAngleDeg({ tireDiameterMm: D, wheelbaseMm: L, clearanceMm: c })).toBeCloseTo(180 - between, 6);
        expect(distanceToLine(r, a, c, front)).toBeCloseTo(r, 6);
      }),
      { numRuns: 500 },
    );
  });

  it("refuses a midpoint inside the tire's circle (short wheelbase, big tire)", () => {
    expect(errorField(() => breakoverAngleDeg({ tireDiameterMm: 2000, wheelbaseMm: 1000, clearanceMm: 900 }))).toBe("clearanceMm");
    expect(() => breakoverAngleDeg({ tireDiameterMm: 2000, wheelbaseMm: 1000, clearanceMm: 900 })).toThrow(BodyPointError);
    expect(errorField(() => breakoverAngleDeg({ tireDiameterMm: 800, wheelbaseMm: 0, clearanceMm: 250 }))).toBe("wheelbaseMm");
    // Midway point far above the tires: the tangent lines would be vertical, nothing is limited — refused, not 180°.
    expect(() => breakoverAngleDeg({ tireDiameterMm: 1200, wheelbaseMm: 1000, clearanceMm: 2900 })).toThrow(/clearanceMm/);
  });
});

describe("raiseBodyPoint (the axle centre sits one radius above the ground; common practice, no source)", () => {
  it("265/70R17 (802.8 mm) → 35x12.50R17LT (889 mm) with a 50 mm lift: + 43.1 + 50 mm", () => {
    const cur = parseTireSize("265/70R17").overallDiameterMm; // ISO 4000-1: 802.8 mm
    const pla = parseTireSize("35x12.50R17LT").overallDiameterMm; // 35 × 25.4 = 889 mm (NIST SP 811 inch)
    expect(raiseBodyPoint({ heightMm: 600, currentTireDiameterMm: cur, plannedTireDiameterMm: pla, liftMm: 50 })).toBeCloseTo(693.1, 9);
    expect(raiseBodyPoint({ heightMm: 600, currentTireDiameterMm: cur, plannedTireDiameterMm: pla })).toBeCloseTo(643.1, 9);
  });

  it("refuses a point driven into the ground and bad numbers", () => {
    expect(errorField(() => raiseBodyPoint({ heightMm: 100, currentTireDiameterMm: 900, plannedTireDiameterMm: 700, liftMm: -50 }))).toBe(
      "liftMm",
    );
    expect(errorField(() => raiseBodyPoint({ heightMm: 600, currentTireDiameterMm: 800, plannedTireDiameterMm: 889, liftMm: 5000 }))).toBe(
      "liftMm",
    );
    expect(errorField(() => raiseBodyPoint({ heightMm: 600, currentTireDiameterMm: 800, plannedTireDiameterMm: Number.NaN }))).toBe(
      "plannedTireDiameterMm",
    );
  });
});

describe("properties (fast-check): angles grow with tire size and lift, never NaN", () => {
  const corner = fc.record({
    D: real(650, 950),
    grow: real(1, 200),
    lift: real(0, 150),
    h: real(300, 900),
    beyond: real(250, 1500),
  });

  it("approach/departure: a taller tire (body raised by ΔR) and a lift each give a larger angle", () => {
    fc.assert(
      fc.property(corner, ({ D, grow, lift, h, beyond }) => {
        const d = D / 2 + beyond;
        const base = approachAngleDeg({ tireDiameterMm: D, cornerHeightMm: h, cornerOffsetMm: d });
        const taller = approachAngleDeg({
          tireDiameterMm: D + grow,
          cornerHeightMm: raiseBodyPoint({ heightMm: h, currentTireDiameterMm: D, plannedTireDiameterMm: D + grow }),
          cornerOffsetMm: d,
        });
        const lifted = approachAngleDeg({
          tireDiameterMm: D,
          cornerHeightMm: raiseBodyPoint({ heightMm: h, currentTireDiameterMm: D, plannedTireDiameterMm: D, liftMm: lift }),
          cornerOffsetMm: d,
        });
        expect(taller).toBeGreaterThan(base);
        expect(lifted).toBeGreaterThanOrEqual(base);
        if (lift > 1e-6) expect(lifted).toBeGreaterThan(base);
      }),
      { numRuns: 1000 },
    );
  });

  it("breakover: a taller tire (midpoint raised by ΔR) and a lift each give a larger angle", () => {
    fc.assert(
      fc.property(real(650, 950), real(1, 200), real(1, 150), real(2200, 4000), real(150, 450), (D, grow, lift, L, c) => {
        const base = breakoverAngleDeg({ tireDiameterMm: D, wheelbaseMm: L, clearanceMm: c });
        const taller = breakoverAngleDeg({
          tireDiameterMm: D + grow,
          wheelbaseMm: L,
          clearanceMm: raiseBodyPoint({ heightMm: c, currentTireDiameterMm: D, plannedTireDiameterMm: D + grow }),
        });
        const lifted = breakoverAngleDeg({ tireDiameterMm: D, wheelbaseMm: L, clearanceMm: c + lift });
        expect(taller).toBeGreaterThan(base);
        expect(lifted).toBeGreaterThan(base);
      }),
      { numRuns: 1000 },
    );
  });

  it("over the whole accepted range: a finite angle in (0°, 90°] (approach) or (0°, 180°) (breakover), or a FitmentInputError — never NaN", () => {
    fc.assert(
      fc.property(real(300, 2000), real(1, 3000), real(1, 5000), real(1000, 10000), (D, h, d, L) => {
        for (const f of [
          () => approachAngleDeg({ tireDiameterMm: D, cornerHeightMm: h, cornerOffsetMm: d }),
          () => breakoverAngleDeg({ tireDiameterMm: D, wheelbaseMm: L, clearanceMm: h }),
        ]) {
          try {
            const deg = f();
            expect(Number.isFinite(deg)).toBe(true);
            expect(deg).toBeGreaterThan(0);
            expect(deg).toBeLessThan(180);
          } catch (e) {
            if (!(e instanceof FitmentInputError)) throw e;
          }
        }
      }),
      { numRuns: 3000 },
    );
  });
});
