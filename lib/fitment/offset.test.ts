import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import { backspacingFromOffset, offsetFromBackspacing } from "./offset";

describe("offset ⇄ backspacing", () => {
  it("9.5 in wheel, 3.5 in backspacing from the bead seat → −1.25 in = −31.75 mm offset (common practice, no source)", () => {
    expect(offsetFromBackspacing({ widthIn: 9.5, backspacingIn: 3.5, measuredFrom: "bead-seat" })).toBeCloseTo(-31.75, 9);
  });

  it("the same wheel measured to the flange reads 0.5 in more (flange allowance, common practice, no source)", () => {
    expect(offsetFromBackspacing({ widthIn: 9.5, backspacingIn: 4, measuredFrom: "flange" })).toBeCloseTo(-31.75, 9);
    expect(backspacingFromOffset({ widthIn: 9.5, offsetMm: -31.75, measuredFrom: "flange" })).toBeCloseTo(4, 9);
    expect(backspacingFromOffset({ widthIn: 9.5, offsetMm: -31.75, measuredFrom: "flange", flangeIn: 0.75 })).toBeCloseTo(4.25, 9);
  });

  it("zero offset is half the width from the bead seat (definition of the centreline)", () => {
    expect(backspacingFromOffset({ widthIn: 8, offsetMm: 0, measuredFrom: "bead-seat" })).toBe(4);
    expect(offsetFromBackspacing({ widthIn: 8, backspacingIn: 4, measuredFrom: "bead-seat" })).toBe(0);
  });

  it("round-trips (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 14, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.constantFrom("flange" as const, "bead-seat" as const),
        (widthIn, offsetMm, measuredFrom) => {
          const bs = backspacingFromOffset({ widthIn, offsetMm, measuredFrom });
          expect(offsetFromBackspacing({ widthIn, backspacingIn: bs, measuredFrom })).toBeCloseTo(offsetMm, 6);
        },
      ),
    );
  });

  it("invalid input names the field and why", () => {
    expect(() => offsetFromBackspacing({ widthIn: 0, backspacingIn: 4, measuredFrom: "bead-seat" })).toThrow(
      /widthIn must be between 3 and 20/,
    );
    expect(() => backspacingFromOffset({ widthIn: 9, offsetMm: 400, measuredFrom: "bead-seat" })).toThrow(/offsetMm 400 mm/);
    expect(() => offsetFromBackspacing({ widthIn: 9, backspacingIn: 25, measuredFrom: "bead-seat" })).toThrow(/backspacingIn/);
    expect(() => offsetFromBackspacing({ widthIn: 9, backspacingIn: 4, measuredFrom: "hub" as unknown as "flange" })).toThrow(
      /measuredFrom/,
    );
    try {
      offsetFromBackspacing({ widthIn: -9, backspacingIn: 4, measuredFrom: "bead-seat" });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(FitmentInputError);
      expect((e as FitmentInputError).field).toBe("widthIn");
    }
  });
});
