import { describe, expect, it } from "vitest";
import { boltPatternsEquivalent, formatBoltPattern, parseBoltPattern } from "./boltPattern";
import { FitmentInputError } from "./errors";

describe("parseBoltPattern (inch PCDs exact: 1 in = 25.4 mm, NIST SP 811)", () => {
  it("parses inch and mm forms", () => {
    expect(parseBoltPattern("5x4.5").pcdMm).toBeCloseTo(114.3, 9);
    expect(parseBoltPattern("5x114.3")).toMatchObject({ boltCount: 5, count: 5, pcdMm: 114.3, unit: "mm" });
    expect(parseBoltPattern("6x139.7").pcdIn).toBeCloseTo(5.5, 9);
    expect(parseBoltPattern("8x6.5").pcdMm).toBeCloseTo(165.1, 9);
    expect(parseBoltPattern("5 on 5.5")).toMatchObject({ boltCount: 5, unit: "in", text: "5x5.5" });
    expect(parseBoltPattern("8X170mm").pcdMm).toBe(170);
  });
  it("equivalence: 5x4.5 ≡ 5x114.3, 6x5.5 ≡ 6x139.7, 8x6.5 ≡ 8x165.1; 5x4.75 ≢ 5x120", () => {
    expect(boltPatternsEquivalent("5x4.5", "5x114.3")).toBe(true);
    expect(boltPatternsEquivalent("6x5.5", "6x139.7")).toBe(true);
    expect(boltPatternsEquivalent("8x6.5", "8x165.1")).toBe(true);
    expect(boltPatternsEquivalent("5x4.75", "5x120")).toBe(false);
    expect(boltPatternsEquivalent("5x5.5", "6x5.5")).toBe(false);
  });
  it("formats in either unit", () => {
    expect(formatBoltPattern(parseBoltPattern("5x4.5"), "mm")).toBe("5x114.3");
    expect(formatBoltPattern(parseBoltPattern("6x139.7"), "in")).toBe("6x5.5");
  });
  it("rejects anything else", () => {
    for (const bad of ["", "5", "x114.3", "1x114.3", "5x2", "5x999", "five on five"]) {
      expect(() => parseBoltPattern(bad)).toThrow(FitmentInputError);
    }
    expect(() => parseBoltPattern("5x")).toThrow(/e\.g\. 5x4\.5/);
  });
});
