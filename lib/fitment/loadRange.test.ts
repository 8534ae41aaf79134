import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import { loadRangeFromPly, loadRangeInfo, plyRating } from "./loadRange";

describe("load range", () => {
  it("ply ratings B 4 … E 10 … N 24 (from memory, TRA practice)", () => {
    expect(plyRating("B")).toBe(4);
    expect(plyRating("C")).toBe(6);
    expect(plyRating("D")).toBe(8);
    expect(plyRating("E")).toBe(10);
    expect(plyRating("F")).toBe(12);
    expect(plyRating("N")).toBe(24);
    expect(loadRangeFromPly(10)).toBe("E");
  });

  it("a load range D flotation LT tire is marked 50 psi maximum (common practice, no source)", () => {
    const d = loadRangeInfo("D", "flotation");
    expect(d.maxPressurePsi).toBe(50);
    expect(d.maxPressureKpa).toBeCloseTo(344.7, 1);
  });

  it("flotation C 35 / D 50 / E 65 psi vs metric LT C 50 / D 65 / E 80 psi (from memory, TRA practice)", () => {
    expect(["C", "D", "E"].map((r) => loadRangeInfo(r, "flotation").maxPressurePsi)).toEqual([35, 50, 65]);
    expect(["C", "D", "E"].map((r) => loadRangeInfo(r, "metric").maxPressurePsi)).toEqual([50, 65, 80]);
  });

  it("unknown letters and odd ply ratings throw", () => {
    expect(() => plyRating("I")).toThrow(FitmentInputError);
    expect(() => loadRangeFromPly(7)).toThrow(/ply rating/);
    expect(loadRangeInfo("J", "metric").maxPressurePsi).toBeNull();
  });
});
