import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import { formatLength, parseLength } from "./length";

describe("parseLength (1 in = 25.4 mm exactly, NIST SP 811)", () => {
  it("accepts fractions, inch marks, mm and bare numbers", () => {
    expect(parseLength("4-3/4", "in")).toBeCloseTo(4.75 * 25.4, 12);
    expect(parseLength("4 7/8 in", "mm")).toBeCloseTo(4.875 * 25.4, 12);
    expect(parseLength('3.5"', "mm")).toBeCloseTo(88.9, 12);
    expect(parseLength("120 mm", "in")).toBe(120);
    expect(parseLength("2", "in")).toBeCloseTo(50.8, 12);
    expect(parseLength("2", "mm")).toBe(2);
    expect(parseLength("3/4", "in")).toBeCloseTo(19.05, 12);
    expect(parseLength("-1-1/4 in", "mm")).toBeCloseTo(-31.75, 12);
    expect(parseLength("4.5in", "mm")).toBeCloseTo(114.3, 12);
    expect(parseLength("12 cm", "in")).toBe(120);
  });

  it("reads the Unicode fractions people type or paste: ¾, 4¾, 4 ¾, 4-¾, 4 3⁄4 (fraction slash), 4³⁄₄", () => {
    // Vulgar fraction characters and U+2044 FRACTION SLASH: the Unicode Standard, ch. 6 "Fractions".
    for (const t of ["4¾", "4 ¾", "4-¾", "4 3⁄4", "4-3⁄4", "4³⁄₄", "4 ³⁄₄", "4¾ in", '4¾"']) {
      expect(parseLength(t, "in"), t).toBeCloseTo(4.75 * 25.4, 12);
    }
    expect(parseLength("¾", "in")).toBeCloseTo(19.05, 12);
    expect(parseLength("-1¼ in", "mm")).toBeCloseTo(-31.75, 12);
    const eighths: [string, number][] = [
      ["⅛", 1 / 8],
      ["⅜", 3 / 8],
      ["½", 1 / 2],
      ["⅝", 5 / 8],
      ["⅞", 7 / 8],
      ["¼", 1 / 4],
      ["⅓", 1 / 3],
      ["⅔", 2 / 3],
    ];
    for (const [c, v] of eighths) expect(parseLength(`2${c}`, "in"), c).toBeCloseTo((2 + v) * 25.4, 12);
    expect(parseLength("1⁄2", "in")).toBeCloseTo(12.7, 12);
  });

  it("reads a fraction only as inches: 1-1/2 in a mm field is refused unless the text says in", () => {
    expect(() => parseLength("1-1/2", "mm")).toThrow(/read only in inches: write "1-1\/2 in"/);
    expect(() => parseLength("1½", "mm")).toThrow(FitmentInputError);
    expect(() => parseLength("3/4", "mm")).toThrow(FitmentInputError);
    expect(() => parseLength("1/2 mm", "in")).toThrow(/fractions are for inches/);
    expect(() => parseLength("1-1/2 cm", "in")).toThrow(FitmentInputError);
    expect(parseLength("1-1/2 in", "mm")).toBeCloseTo(38.1, 12);
    expect(parseLength("1½ in", "mm")).toBeCloseTo(38.1, 12);
    expect(parseLength("1.5", "mm")).toBe(1.5);
  });

  for (const bad of ["", "abc", "¾¾", "4¾/8", "4 ⁄ ", "4-3/0", "4 5/4", "1/0", "4..5", "4 in mm", "4-", "mm", "1e5", "0x10", "4 3/4/5"]) {
    it(`rejects ${JSON.stringify(bad)}`, () => {
      expect(() => parseLength(bad, "in")).toThrow(FitmentInputError);
    });
  }
  it("the error shows accepted examples", () => {
    expect(() => parseLength("four", "in")).toThrow(/4-3\/4/);
  });
});

describe("formatLength", () => {
  it("prints 4-3/4 in, sixteenths, decimals and mm", () => {
    expect(formatLength(120.65, { unit: "in", fraction: 8 })).toBe("4-3/4 in");
    expect(formatLength(4.875 * 25.4, { unit: "in", fraction: 16 })).toBe("4-7/8 in");
    expect(formatLength(4.9375 * 25.4, { unit: "in", fraction: 16 })).toBe("4-15/16 in");
    expect(formatLength(101.6, { unit: "in", fraction: 8 })).toBe("4 in");
    expect(formatLength(-31.75, { unit: "in", fraction: 8 })).toBe("-1-1/4 in");
    expect(formatLength(12.7, { unit: "in", fraction: 16 })).toBe("1/2 in");
    expect(formatLength(120.65, { unit: "in" })).toBe("4.75 in");
    expect(formatLength(120.65, { unit: "mm" })).toBe("120.7 mm");
  });
  it("rejects NaN and bad options", () => {
    expect(() => formatLength(Number.NaN, { unit: "in" })).toThrow(FitmentInputError);
    expect(() => formatLength(1, { unit: "in", fraction: 4 as 8 })).toThrow(/fraction/);
  });
  it("format then parse returns the length to within half a step (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -500, max: 500, noNaN: true }), fc.constantFrom(8 as const, 16 as const), (mm, fraction) => {
        const back = parseLength(formatLength(mm, { unit: "in", fraction }), "mm");
        expect(Math.abs(back - mm)).toBeLessThanOrEqual(25.4 / fraction / 2 + 1e-9);
      }),
    );
  });
});
