import { describe, expect, it } from "vitest";
import { formatQuantity, parseQuantity, toHundredths } from "./quantity";

describe("quote line quantities", () => {
  it("reads an hour and a half however the counter types it", () => {
    // 1 h 30 min = 1.5 h; ½ = 0.5 (arithmetic).
    for (const t of ["1.5", "1.50", "1 1/2", "1-1/2", "1½", "1:30", "90 min", "1.5 h", "1.5hr", "3/2"])
      expect(parseQuantity(t, "hour"), t).toBe(1.5);
    expect(parseQuantity("¾", "hour")).toBe(0.75);
    expect(parseQuantity(".25", "hour")).toBe(0.25);
    expect(parseQuantity("0:45", "hour")).toBe(0.75);
    expect(parseQuantity(2, "hour")).toBe(2);
  });

  it("refuses part hours that are not exact hundredths, naming the figures to type instead", () => {
    // 1:20 = 80/60 h = 1.333… h (arithmetic).
    expect(() => parseQuantity("1:20", "hour")).toThrow(
      "1:20 is 1.333… h, which is not exact to the hundredth of an hour: enter 1.33 or 1.34.",
    );
    expect(() => parseQuantity("1 1/3", "hour")).toThrow(/1\.333…/);
    // 1/8 = 0.125 exactly, still finer than a hundredth.
    expect(() => parseQuantity("⅛", "hour")).toThrow("⅛ is 0.125 h, which is not exact to the hundredth of an hour: enter 0.12 or 0.13.");
    expect(() => parseQuantity("1.255", "hour")).toThrow(/1\.25 or 1\.26/);
  });

  it("refuses a decimal comma, nonsense, zero and too much", () => {
    expect(() => parseQuantity("1,5", "hour")).toThrow("Use a point for part hours: 1.5, not 1,5.");
    expect(() => parseQuantity("an hour", "hour")).toThrow(/1\.5, 1 1\/2 or 1:30/);
    expect(() => parseQuantity("0", "hour")).toThrow(/more than 0/);
    expect(() => parseQuantity("1:75", "hour")).toThrow();
    expect(() => parseQuantity("1000", "hour")).toThrow(/At most 999/);
    expect(() => parseQuantity("", "hour")).toThrow("Enter a quantity.");
  });

  it("counts items in whole numbers", () => {
    expect(parseQuantity("4", "each")).toBe(4);
    expect(() => parseQuantity("1.5", "each")).toThrow(/whole/);
    expect(() => parseQuantity("1½", "each")).toThrow(/whole/);
    expect(() => parseQuantity(2.5, "each")).toThrow(/whole/);
    expect(() => parseQuantity("four", "each")).toThrow("Enter a whole number, e.g. 4.");
  });

  it("shows hours with their unit and items bare", () => {
    expect(formatQuantity(1.5, "hour")).toBe("1.5 h");
    expect(formatQuantity(0.25, "hour")).toBe("0.25 h");
    expect(formatQuantity(4, "each")).toBe("4");
    expect(toHundredths(1.15)).toBe(115); // 1.15 is not exact in binary; still 115 hundredths
    expect(toHundredths(1.155)).toBeNull();
  });
});
