import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  DEFAULT_CLEARANCE_MARGIN_MM,
  classifyClearance,
  clearanceChangeMm,
  clearanceLimits,
  predictClearance,
  predictClearances,
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

  it("inboard points gain the inner clearance change: 157.5 − 142.96 = +14.54 mm", () => {
    const p = predictClearance({ direction: "inboard", distanceMm: 30, measuredWith: CUR }, PLA);
    expect(p.changeMm).toBeCloseTo(14.54, 9);
    expect(p.predictedMm).toBeCloseTo(44.54, 9);
    expect(p.status).toBe("clear");
    expect(p.shortfallMm).toBe(0);
  });

  it("outboard points lose the poke change: 60 − (166.96 − 107.5) = 0.54 mm, tight", () => {
    const p = predictClearance({ direction: "outboard", distanceMm: 60, measuredWith: CUR }, PLA);
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

  it("a spacer of 25 mm takes 25 mm from outboard points and gives 25 mm to inboard points", () => {
    const spaced = { ...CUR, spacerMm: 25 };
    expect(predictClearance({ direction: "outboard", distanceMm: 40, measuredWith: CUR }, spaced).predictedMm).toBeCloseTo(15, 9);
    expect(predictClearance({ direction: "inboard", distanceMm: 40, measuredWith: CUR }, spaced).predictedMm).toBeCloseTo(65, 9);
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

  it("a setup at the inner limit keeps exactly the margin at that inboard point", () => {
    const limit = clearanceLimits([{ direction: "inboard", distanceMm: 30, measuredWith: CUR }]).maxInnerSwingMm!;
    const g = setupGeometry(PLA);
    // planned inner swing 142.96: the predicted gap equals limit − inner + margin
    const p = predictClearance({ direction: "inboard", distanceMm: 30, measuredWith: CUR }, PLA);
    expect(p.predictedMm).toBeCloseTo(limit - g.innerSwingMm + DEFAULT_CLEARANCE_MARGIN_MM, 9);
  });

  it("rejects a bad direction, a negative gap and a bad margin with FitmentInputError", () => {
    expect(() => predictClearance({ direction: "sideways" as never, distanceMm: 3, measuredWith: CUR }, PLA)).toThrow(FitmentInputError);
    expect(() => predictClearance({ direction: "upward", distanceMm: -1, measuredWith: CUR }, PLA)).toThrow(/distanceMm/);
    expect(() => predictClearance({ direction: "upward", distanceMm: 3, measuredWith: CUR }, PLA, { marginMm: Number.NaN })).toThrow(/marginMm/);
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
