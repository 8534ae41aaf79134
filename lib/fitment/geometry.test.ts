import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import { setupGeometry } from "./geometry";
import { STANDARD_SIZES } from "./standardSizes";
import { nonFinite } from "./testUtil";

describe("setupGeometry", () => {
  it("9.5 in wheel at −31.75 mm: 3.5 in of rim inboard of the mounting face, 6 in outboard (common practice, no source)", () => {
    const g = setupGeometry({ tire: "35x12.50R17LT", wheel: { diameterIn: 17, widthIn: 9.5, offsetMm: -31.75 } });
    expect(g.beadSeatInboardMm).toBeCloseTo(3.5 * 25.4, 9);
    expect(g.beadSeatOutboardMm).toBeCloseTo(6 * 25.4, 9);
    expect(g.backspacingIn).toBeCloseTo(3.5, 9);
  });

  it("inner swing = offset + section/2, outer = section/2 − offset (definition)", () => {
    const g = setupGeometry({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } });
    expect(g.sectionWidthMm).toBe(265);
    expect(g.innerSwingMm).toBeCloseTo(157.5, 9);
    expect(g.outerSwingMm).toBeCloseTo(107.5, 9);
    expect(g.rimWidthSuitable).toBe(true);
  });

  it("a spacer of t mm acts as offset − t", () => {
    const a = setupGeometry({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 }, spacerMm: 38 });
    const b = setupGeometry({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: -13 } });
    expect(a.effectiveOffsetMm).toBe(-13);
    expect(a.innerSwingMm).toBeCloseTo(b.innerSwingMm, 9);
    expect(a.outerSwingMm).toBeCloseTo(b.outerSwingMm, 9);
  });

  it("flags rims outside the suited range without changing the numbers", () => {
    const g = setupGeometry({ tire: "37x12.50R17LT", wheel: { diameterIn: 17, widthIn: 7, offsetMm: 0 } });
    expect(g.rimWidthSuitable).toBe(false);
    expect(g.sectionWidthMm).toBeCloseTo(317.5 - 0.4 * 3 * 25.4, 9);
  });

  const setup = fc.record({
    size: fc.constantFrom(...STANDARD_SIZES),
    widthIn: fc.double({ min: 5, max: 14, noNaN: true }),
    offsetMm: fc.double({ min: -120, max: 120, noNaN: true }),
    spacerMm: fc.double({ min: 0, max: 60, noNaN: true }),
  });

  it("inner + outer swing = section width; inner − outer = 2 × effective offset; no NaN (property)", () => {
    fc.assert(
      fc.property(setup, ({ size, widthIn, offsetMm, spacerMm }) => {
        const g = setupGeometry({ tire: size, wheel: { diameterIn: size.rimDiameterIn, widthIn, offsetMm }, spacerMm });
        expect(g.innerSwingMm + g.outerSwingMm).toBeCloseTo(g.sectionWidthMm, 6);
        expect(g.innerSwingMm - g.outerSwingMm).toBeCloseTo(2 * g.effectiveOffsetMm, 6);
        expect(g.beadSeatInboardMm + g.beadSeatOutboardMm).toBeCloseTo(widthIn * 25.4, 6);
        expect(nonFinite(g)).toEqual([]);
      }),
      { numRuns: 2000 },
    );
  });

  it("invalid wheels: errors say which field and why", () => {
    const tire = "265/70R17";
    expect(() => setupGeometry({ tire, wheel: { diameterIn: 17, widthIn: 0, offsetMm: 0 } })).toThrow(
      /wheel\.widthIn must be between 3 and 20 in, got 0/,
    );
    expect(() => setupGeometry({ tire, wheel: { diameterIn: -17, widthIn: 8, offsetMm: 0 } })).toThrow(
      /wheel\.diameterIn must be between 8 and 30 in, got -17/,
    );
    expect(() => setupGeometry({ tire, wheel: { diameterIn: 17, widthIn: 8, offsetMm: 200 } })).toThrow(
      /wheel\.offsetMm 200 mm puts the mounting face/,
    );
    expect(() => setupGeometry({ tire, wheel: { diameterIn: 18, widthIn: 8, offsetMm: 0 } })).toThrow(/does not match the rim diameter 17/);
    expect(() => setupGeometry({ tire, wheel: { diameterIn: 17, widthIn: 8, offsetMm: 0 }, spacerMm: -5 })).toThrow(/spacerMm/);
    expect(() => setupGeometry({ tire, wheel: { diameterIn: 17, widthIn: 8, offsetMm: Number.POSITIVE_INFINITY } })).toThrow(
      FitmentInputError,
    );
    try {
      setupGeometry({ tire, wheel: { diameterIn: 17, widthIn: 0, offsetMm: 0 } });
    } catch (e) {
      expect((e as FitmentInputError).field).toBe("wheel.widthIn");
    }
  });
});
