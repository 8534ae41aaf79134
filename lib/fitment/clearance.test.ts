import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  DEFAULT_CLEARANCE_MARGIN_MM,
  classifyClearance,
  clearanceChangeMm,
  clearanceLimits,
  predictClearance,
  predictClearances,
  predictPreparedMm,
  prepareClearance,
  steeringAxisInboardMm,
} from "./clearance";
import { compareSetups } from "./compare";
import { FitmentInputError } from "./errors";
import { setupGeometry } from "./geometry";
import { STANDARD_SIZES } from "./standardSizes";
import { nonFinite } from "./testUtil";

// Worked example, by hand from the formulas in README.md:
// current 265/70R17 on 17x8 +25: measuring rim 8 in (265 × 0.75 = 198.75 mm ≈ 7.8 in → 8), section 265 mm,
//   inner swing 25 + 132.5 = 157.5, outer 132.5 − 25 = 107.5, D = 431.8 + 2 × 185.5 = 802.8 mm (ISO 4000-1: D = d + 2H).
// planned 315/70R17 on 17x9 −12: measuring rim 9.5 in (315 × 0.75 = 236.25 mm ≈ 9.3 in → 9.5),
//   section 315 + 0.4 × (9 − 9.5) × 25.4 = 309.92 mm (UN R30 §6.1.1.1, K = 0.4), inner −12 + 154.96 = 142.96,
//   outer 154.96 + 12 = 166.96, D = 431.8 + 2 × 220.5 = 872.8 mm, radius change +35 mm.
const CUR = { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
const PLA = { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } };

describe("clearance predictions (worked example above; change rules common practice, no source)", () => {
  it("the default margin is 1/2 in = 12.7 mm exactly (1 in = 25.4 mm, NIST SP 811)", () => {
    expect(DEFAULT_CLEARANCE_MARGIN_MM).toBe(25.4 / 2);
  });

  it("inboard points beside the sidewall at hub height gain the inner clearance change: 157.5 − 142.96 = +14.54 mm", () => {
    const p = predictClearance({ direction: "inboard", distanceMm: 30, measuredWith: CUR, heightMm: 0 }, PLA);
    expect(p.changeMm).toBeCloseTo(14.54, 9);
    expect(p.predictedMm).toBeCloseTo(44.54, 9);
    expect(p.status).toBe("clear");
    expect(p.shortfallMm).toBe(0);
  });

  it("outboard points beside the sidewall at hub height lose the poke change: 60 − (166.96 − 107.5) = 0.54 mm, tight", () => {
    const p = predictClearance({ direction: "outboard", distanceMm: 60, measuredWith: CUR, heightMm: 0 }, PLA);
    expect(p.changeMm).toBeCloseTo(-59.46, 9);
    expect(p.predictedMm).toBeCloseTo(0.54, 9);
    expect(p.status).toBe("tight");
    expect(p.shortfallMm).toBeCloseTo(12.16, 9);
  });

  it("upward and fore/aft points lose the radius change (35 mm)", () => {
    const up = predictClearance({ direction: "upward", distanceMm: 40, measuredWith: CUR }, PLA);
    expect(up.predictedMm).toBeCloseTo(5, 9);
    expect(up.status).toBe("tight");
    const lock = predictClearance({ direction: "fore-aft", distanceMm: 25, measuredWith: CUR }, PLA);
    expect(lock.predictedMm).toBeCloseTo(-10, 9);
    expect(lock.status).toBe("contact");
    expect(lock.shortfallMm).toBeCloseTo(22.7, 9);
  });

  it("agrees with compareSetups for every direction and keeps the list order", () => {
    const c = compareSetups(CUR, PLA);
    expect(clearanceChangeMm("inboard", c)).toBe(c.innerClearanceChangeMm);
    expect(clearanceChangeMm("outboard", c)).toBe(-c.outerPokeChangeMm);
    expect(clearanceChangeMm("upward", c)).toBe(-c.diameterChangeMm / 2);
    const list = predictClearances(
      [
        { direction: "fore-aft", distanceMm: 25, measuredWith: CUR },
        { direction: "inboard", distanceMm: 30, measuredWith: CUR },
      ],
      PLA,
    );
    expect(list.map((p) => p.status)).toEqual(["contact", "clear"]);
  });

  it("the same setup predicts the measured gap unchanged", () => {
    for (const direction of ["inboard", "outboard", "upward", "fore-aft"] as const) {
      const p = predictClearance({ direction, distanceMm: 17, measuredWith: CUR }, CUR);
      expect(p.predictedMm).toBe(17);
      expect(p.changeMm).toBe(0);
    }
  });

  it("a spacer of 25 mm takes 25 mm from outboard points and gives 25 mm to inboard points beside the sidewall", () => {
    const spaced = { ...CUR, spacerMm: 25 };
    expect(predictClearance({ direction: "outboard", distanceMm: 40, measuredWith: CUR }, spaced).predictedMm).toBeCloseTo(15, 9);
    expect(predictClearance({ direction: "inboard", distanceMm: 40, measuredWith: CUR, heightMm: 0 }, spaced).predictedMm).toBeCloseTo(
      65,
      9,
    );
  });

  it("classes against the margin: ≤ 0 contact, below margin tight, at or above clear", () => {
    expect(classifyClearance(0)).toBe("contact");
    expect(classifyClearance(-0.1)).toBe("contact");
    expect(classifyClearance(12.69)).toBe("tight");
    expect(classifyClearance(12.7)).toBe("clear");
    expect(classifyClearance(5, 3)).toBe("clear");
    expect(classifyClearance(5, 0)).toBe("clear");
  });

  it("derives the limits the points set: inner 157.5 + 30 − 12.7, outer 107.5 + 60 − 12.7, diameter 2 × (401.4 + 40 − 12.7)", () => {
    const l = clearanceLimits([
      { direction: "inboard", distanceMm: 30, measuredWith: CUR },
      { direction: "inboard", distanceMm: 50, measuredWith: CUR },
      { direction: "outboard", distanceMm: 60, measuredWith: CUR },
      { direction: "upward", distanceMm: 40, measuredWith: CUR },
      { direction: "fore-aft", distanceMm: 60, measuredWith: CUR },
    ]);
    expect(l.maxInnerSwingMm).toBeCloseTo(174.8, 9);
    expect(l.maxOuterSwingMm).toBeCloseTo(154.8, 9);
    expect(l.maxDiameterMm).toBeCloseTo(857.4, 9);
    expect(clearanceLimits([])).toEqual({ maxInnerSwingMm: null, maxOuterSwingMm: null, maxDiameterMm: null });
  });

  it("a setup at the inner limit keeps exactly the margin at that inboard point, beside the sidewall at hub height", () => {
    const limit = clearanceLimits([{ direction: "inboard", distanceMm: 30, measuredWith: CUR }]).maxInnerSwingMm!;
    const g = setupGeometry(PLA);
    // planned inner swing 142.96: the predicted gap equals limit − inner + margin (the limits are
    // first-order bounds for a part beside the tire; over the shoulder a taller tire closes more)
    const p = predictClearance({ direction: "inboard", distanceMm: 30, measuredWith: CUR, heightMm: 0 }, PLA);
    expect(p.predictedMm).toBeCloseTo(limit - g.innerSwingMm + DEFAULT_CLEARANCE_MARGIN_MM, 9);
  });

  it("rejects a bad direction, a negative gap and a bad margin with FitmentInputError", () => {
    expect(() => predictClearance({ direction: "sideways" as never, distanceMm: 3, measuredWith: CUR }, PLA)).toThrow(FitmentInputError);
    expect(() => predictClearance({ direction: "upward", distanceMm: -1, measuredWith: CUR }, PLA)).toThrow(/distanceMm/);
    expect(() => predictClearance({ direction: "upward", distanceMm: 3, measuredWith: CUR }, PLA, { marginMm: Number.NaN })).toThrow(
      /marginMm/,
    );
    expect(() => classifyClearance(Number.POSITIVE_INFINITY)).toThrow(FitmentInputError);
  });

  it("never returns NaN or Infinity (property)", () => {
    const metric = STANDARD_SIZES.filter((s) => s.system === "metric");
    fc.assert(
      fc.property(
        fc.constantFrom(...metric),
        fc.integer({ min: -40, max: 40 }),
        fc.constantFrom("inboard", "outboard", "upward", "fore-aft" as const),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        (size, offset, direction, gap) => {
          const planned = { tire: size, wheel: { diameterIn: size.rimDiameterIn, widthIn: 8, offsetMm: offset } };
          expect(nonFinite(predictClearance({ direction, distanceMm: gap, measuredWith: CUR }, planned))).toEqual([]);
        },
      ),
      { numRuns: 300 },
    );
  });
});

// Direction × suspension state, worked by hand (plane geometry; the model is written out in
// clearance.ts and README.md). Setups:
//   CUR  265/70R17 on 17x8 +25: R = 401.4, inner reach 157.5, outer reach 107.5 (above).
//   P35  35x12.50R17LT on 17x9 −12: D = 35 in = 889 mm, R = 444.5 (TRA flotation size:
//        D as designated); section on 9 in = 317.5 + 0.4 × (9 − 10) × 25.4 = 307.34
//        (UN R30 §6.1.1.1, measuring rim 10 in), inner −12 + 153.67 = 141.67, outer 165.67.
//   P35B the same tire on 17x9 +12: inner 165.67, outer 141.67.
// Steering axis (default, no vehicle figures): vertical through the measured tire's centre
// line, i.e. 25 mm inboard of the hub face for CUR (zero scrub, 0° KPI; common practice, no source).
const P35 = { tire: "35x12.50R17LT", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } };
const P35B = { tire: "35x12.50R17LT", wheel: { diameterIn: 17, widthIn: 9, offsetMm: 12 } };

describe("clearance geometry by direction and suspension state", () => {
  it("upward, at ride height, full stuff and full lock: the tread rises by the radius change, 444.5 − 401.4 = 43.1 mm", () => {
    for (const state of ["ride-height", "full-stuff", "full-lock"] as const) {
      const p = predictClearance({ direction: "upward", state, distanceMm: 50.8, measuredWith: CUR }, P35);
      expect(p.predictedMm).toBeCloseTo(50.8 - 43.1, 9);
      expect(p.basis).toBe("radius");
    }
  });

  it("full lock, bumper corner 300 mm above the hub: the farthest tread corner's sweep about the steering axis grows 81.60 mm", () => {
    // Plan view at 300 mm above the hub: the tread's half-length is √(R² − 300²)
    //   CUR √(401.4² − 300²) = √71 121.96 = 266.687;  P35 √(444.5² − 300²) = √107 580.25 = 327.994.
    // Outer corner from the axis (25 mm inboard of the hub face): CUR 107.5 + 25 = 132.5, P35 165.67 + 25 = 190.67.
    //   r(CUR) = √(266.687² + 132.5²) = √88 678.2 = 297.789;  r(P35) = √(327.994² + 190.67²) = √143 935.3 = 379.388.
    // Change 379.388 − 297.789 = 81.599 mm (the radius change alone would say 43.1).
    const p = predictClearance({ direction: "fore-aft", state: "full-lock", heightMm: 300, distanceMm: 38.1, measuredWith: CUR }, P35);
    expect(p.changeMm).toBeCloseTo(-81.599, 2);
    expect(p.predictedMm).toBeCloseTo(38.1 - 81.599, 2);
    expect(p.status).toBe("contact");
    expect(p.basis).toBe("sweep-farthest");
    // The same point at hub height: √(401.4² + 132.5²) = 422.703 → √(444.5² + 190.67²) = 483.669, +60.965 mm.
    const hub = predictClearance({ direction: "fore-aft", state: "full-lock", distanceMm: 38.1, measuredWith: CUR }, P35);
    expect(hub.changeMm).toBeCloseTo(-60.965, 2);
  });

  it("full lock, frame rail (inboard): the inner tread corner's sweep grows with the diameter, not just the inner reach", () => {
    // Inner corner from the axis: CUR 157.5 − 25 = 132.5, P35 141.67 − 25 = 116.67; at hub height
    //   r(CUR) = √(401.4² + 132.5²) = 422.703, r(P35) = √(444.5² + 116.67²) = √211 192.1 = 459.556: +36.853 mm.
    // 1-1/4 in = 31.75 mm measured → −5.10 mm: contact, where the inner reach alone (+14.54 mm room) said clear.
    const p = predictClearance({ direction: "inboard", state: "full-lock", distanceMm: 31.75, measuredWith: CUR }, P35);
    expect(p.predictedMm).toBeCloseTo(31.75 - 36.853, 2);
    expect(p.status).toBe("contact");
    expect(p.basis).toBe("sweep-inner");
    // Outboard at lock uses the outer corner: +60.965 mm at hub height.
    const out = predictClearance({ direction: "outboard", state: "full-lock", distanceMm: 80, measuredWith: CUR }, P35);
    expect(out.predictedMm).toBeCloseTo(80 - 60.965, 2);
    expect(out.basis).toBe("sweep-outer");
  });

  it("full lock at 300 mm above the hub, inboard: √(266.687² + 132.5²) = 297.789 → √(327.994² + 116.67²) = 348.127, +50.338 mm", () => {
    const p = predictClearance({ direction: "inboard", state: "full-lock", heightMm: 300, distanceMm: 60, measuredWith: CUR }, P35);
    expect(p.changeMm).toBeCloseTo(-50.338, 2);
  });

  it("the steering axis from kingpin inclination and scrub: d = offset + scrub + R·tan(KPI)", () => {
    // LT285/70R17 on 17x8.5 +18: D = 431.8 + 2 × 199.5 = 830.8 mm (ISO 4000-1), R = 415.4;
    // KPI 12°, zero scrub: 18 + 415.4 × tan 12° = 18 + 415.4 × 0.212557 = 106.296 mm inboard of the hub face.
    const g = { tire: "LT285/70R17", wheel: { diameterIn: 17, widthIn: 8.5, offsetMm: 18 } };
    expect(steeringAxisInboardMm(g, { kingpinInclinationDeg: 12 })).toBeCloseTo(106.296, 2);
    // With 20 mm of scrub (axis meets the ground 20 mm inboard of the contact patch centre): 126.296.
    expect(steeringAxisInboardMm(g, { kingpinInclinationDeg: 12, scrubRadiusMm: 20 })).toBeCloseTo(126.296, 2);
    // KPI 0, no scrub: through the tire's centre line, 18 mm inboard (offset +18).
    expect(steeringAxisInboardMm(g)).toBe(18);
    // Moving the axis inboard grows the outer corner's arm: at lock the same swap closes more.
    const near = predictClearance({ direction: "fore-aft", state: "full-lock", distanceMm: 38.1, measuredWith: CUR }, P35);
    const far = predictClearance({ direction: "fore-aft", state: "full-lock", distanceMm: 38.1, measuredWith: CUR }, P35, {
      steeringAxisInboardMm: 120,
    });
    // √(401.4² + 227.5²) = 461.384 → √(444.5² + 285.67²) = 528.376: +66.99 mm
    expect(far.changeMm).toBeCloseTo(-66.99, 1);
    expect(far.predictedMm).toBeLessThan(near.predictedMm);
  });

  it("a lateral point with no height: the worst place beside the sidewall or up to 45° over the shoulder corner", () => {
    // Upper control arm 22 mm inboard; P35B reaches 165.67 − 157.5 = 8.17 mm further inboard and its
    // corner rises 43.1 mm. Beside the sidewall: 22 − 8.17 = 13.83 (clear). At 45° over the inner
    // corner the part sits 22 cos 45° = 15.556 inboard of it and 15.556 above; the corner moves 8.17
    // inboard and 43.1 up, passing above the part: the gap becomes 15.556 − 8.17 = 7.386 mm (tight).
    const p = predictClearance({ direction: "inboard", distanceMm: 22, measuredWith: CUR }, P35B);
    expect(p.predictedMm).toBeCloseTo(7.386, 2);
    expect(p.status).toBe("tight");
    expect(p.basis).toBe("shoulder");
    expect(predictClearance({ direction: "inboard", distanceMm: 22, measuredWith: CUR, heightMm: 0 }, P35B).predictedMm).toBeCloseTo(
      13.83,
      9,
    );
  });

  it("the fender lip takes the height gained: outboard 1 in, the corner moves 58.17 out and 43.1 up", () => {
    // Part at angle φ over the outer corner, 25.4 mm away; the planned corner is at (58.17, 43.1) from
    // the measured one, so the part is inside the planned section for every φ ≤ 45°; the deepest is
    // where both escapes are equal: sin φ − cos φ = (43.1 − 58.17)/25.4 → φ = 20.195°,
    // depth 58.17 − 25.4 cos 20.195° = 34.332 mm (beside at hub height: 25.4 − 58.17 = −32.77).
    const p = predictClearance({ direction: "outboard", distanceMm: 25.4, measuredWith: CUR }, P35);
    expect(p.predictedMm).toBeCloseTo(-34.332, 2);
    expect(p.status).toBe("contact");
    // With the lip's height known, above the measured tread: 420 mm (18.6 above R = 401.4) at 25.4 mm
    // → 17.297 mm out from the corner (√(25.4² − 18.6²)); the P35 section reaches 165.67 out and 444.5 up:
    // the part is 40.87 mm inside its side and 24.5 mm below its top: −24.5 mm.
    const lip = predictClearance({ direction: "outboard", distanceMm: 25.4, heightMm: 420, measuredWith: CUR }, P35);
    expect(lip.predictedMm).toBeCloseTo(-24.5, 2);
    expect(lip.basis).toBe("corner");
  });

  it("fore/aft with the wheel straight: −ΔR along the radius, or the chord at a given height", () => {
    expect(
      predictClearance({ direction: "fore-aft", state: "ride-height", distanceMm: 50, measuredWith: CUR }, P35).predictedMm,
    ).toBeCloseTo(50 - 43.1, 9);
    // 300 mm above the hub, measured level: 327.994 − 266.687 = 61.307 mm closer.
    const p = predictClearance({ direction: "fore-aft", state: "full-stuff", heightMm: 300, distanceMm: 50, measuredWith: CUR }, P35);
    expect(p.predictedMm).toBeCloseTo(50 - 61.307, 2);
    expect(p.basis).toBe("chord");
  });

  it("every direction and state predicts the measured gap unchanged with the same setup", () => {
    for (const direction of ["inboard", "outboard", "upward", "fore-aft"] as const) {
      for (const state of ["ride-height", "full-stuff", "full-lock"] as const) {
        for (const heightMm of [undefined, 0, 250]) {
          const p = predictClearance({ direction, state, heightMm, distanceMm: 17, measuredWith: CUR }, CUR);
          expect(p.predictedMm, `${direction} ${state} ${heightMm}`).toBeCloseTo(17, 9);
        }
      }
    }
  });

  it("refuses a height outside the measured tire and a bad state, naming the field", () => {
    expect(() =>
      predictClearance({ direction: "fore-aft", state: "full-lock", heightMm: 401.4, distanceMm: 10, measuredWith: CUR }, P35),
    ).toThrow(/heightMm/);
    expect(() => predictClearance({ direction: "outboard", heightMm: 440, distanceMm: 10, measuredWith: CUR }, P35)).toThrow(/heightMm/);
    expect(() => predictClearance({ direction: "upward", state: "parked" as never, distanceMm: 10, measuredWith: CUR }, P35)).toThrow(
      /state/,
    );
    expect(() =>
      predictClearance({ direction: "upward", distanceMm: 10, measuredWith: CUR }, P35, { steeringAxisInboardMm: Number.NaN }),
    ).toThrow(/steeringAxisInboardMm/);
  });

  it("never returns NaN or Infinity for any direction, state and height (property)", () => {
    const metric = STANDARD_SIZES.filter((s) => s.system === "metric" && s.rimDiameterIn === 17);
    fc.assert(
      fc.property(
        fc.constantFrom(...metric),
        fc.integer({ min: -40, max: 40 }),
        fc.constantFrom("inboard", "outboard", "upward", "fore-aft" as const),
        fc.constantFrom("ride-height", "full-stuff", "full-lock" as const),
        fc.option(fc.double({ min: -390, max: 390, noNaN: true }), { nil: undefined }),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        (size, offset, direction, state, heightMm, gap) => {
          const planned = { tire: size, wheel: { diameterIn: 17, widthIn: 8, offsetMm: offset } };
          const lateralAbove = heightMm !== undefined && Math.abs(heightMm) > 401.4 && gap < Math.abs(heightMm) - 401.4;
          fc.pre(!lateralAbove);
          expect(nonFinite(predictClearance({ direction, state, heightMm, distanceMm: gap, measuredWith: CUR }, planned))).toEqual([]);
        },
      ),
      { numRuns: 400 },
    );
  });

  it("the shoulder's worst place equals a dense search over the arc (property; plane geometry)", () => {
    // Brute force: the part at angle φ on the arc of radius g about the measured corner (0 … 45°,
    // 20 001 steps) or beside the sidewall, its signed distance to the planned section by cases.
    const sd = (y: number, z: number, a: number, b: number) =>
      y <= a && z <= b ? -Math.min(a - y, b - z) : Math.hypot(Math.max(0, y - a), Math.max(0, z - b));
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 80, noNaN: true }),
        fc.double({ min: -60, max: 80, noNaN: true }),
        fc.double({ min: -60, max: 80, noNaN: true }),
        (g, a, b) => {
          const p = prepareClearance({ direction: "outboard", distanceMm: g, measuredWith: CUR });
          const got = predictPreparedMm(p, { radiusMm: 401.4 + b, innerSwingMm: 157.5, outerSwingMm: 107.5 + a });
          let brute = g - a;
          for (let k = 0; k <= 20000; k++) {
            const phi = (k / 20000) * (Math.PI / 4);
            brute = Math.min(brute, sd(g * Math.cos(phi), g * Math.sin(phi), a, b));
          }
          expect(got).toBeLessThanOrEqual(brute + 1e-9);
          expect(got).toBeGreaterThanOrEqual(brute - 1e-3);
        },
      ),
      { numRuns: 300 },
    );
  });
});
