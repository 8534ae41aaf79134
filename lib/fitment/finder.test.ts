import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import { findFitments } from "./finder";
import { setupGeometry } from "./geometry";
import { STANDARD_SIZES } from "./standardSizes";
import { nonFinite } from "./testUtil";

const truck = { boltPattern: "6x5.5", minDiameterMm: 850, maxDiameterMm: 950, maxInnerSwingMm: 175, maxOuterSwingMm: 175 };

describe("findFitments", () => {
  it("every result meets every constraint, checked again through setupGeometry", () => {
    const r = findFitments(truck, { limit: 500 });
    expect(r.results.length).toBeGreaterThan(0);
    for (const m of r.results) {
      const g = setupGeometry({ tire: m.tire, wheel: m.wheel });
      expect(g.overallDiameterMm).toBeGreaterThanOrEqual(850);
      expect(g.overallDiameterMm).toBeLessThanOrEqual(950);
      expect(g.innerSwingMm).toBeLessThanOrEqual(175 + 1e-9);
      expect(g.outerSwingMm).toBeLessThanOrEqual(175 + 1e-9);
      expect(g.rimWidthSuitable).toBe(true);
      expect(m.innerSwingMm).toBeCloseTo(g.innerSwingMm, 9);
      expect(m.boltPattern?.pcdMm).toBeCloseTo(139.7, 9);
    }
    expect(nonFinite(r.results)).toEqual([]);
  });

  it("reports how many combinations it evaluated: sizes × widths × offsets", () => {
    const r = findFitments(truck, { wheelWidthsIn: [8, 9, 10], offsetsMm: [-12, 0, 12, 25] });
    expect(r.total).toBe(STANDARD_SIZES.length * 3 * 4);
    expect(r.evaluated).toBe(r.total);
    expect(r.matched).toBeGreaterThanOrEqual(r.results.length);
    expect(r.aborted).toBe(false);
  });

  it("ranks toward the target diameter (default: the maximum)", () => {
    const r = findFitments(truck, { limit: 50 });
    const d = r.results.map((m) => Math.abs(m.overallDiameterMm - 950));
    for (let i = 1; i < d.length; i++) expect(d[i]).toBeGreaterThanOrEqual((d[i - 1] as number) - 1e-6);
    expect(r.results.map((m) => m.rank)).toEqual(r.results.map((_, i) => i + 1));
  });

  it("tighter swing limits never add results", () => {
    const loose = findFitments(truck).matched;
    const tight = findFitments({ ...truck, maxInnerSwingMm: 150 }).matched;
    expect(tight).toBeLessThan(loose);
  });

  it("filters a wheel list by bolt pattern (5x4.5 ≡ 5x114.3)", () => {
    const r = findFitments(
      { boltPattern: "5x114.3", minDiameterMm: 700, maxDiameterMm: 800 },
      {
        wheels: [
          { id: "a", diameterIn: 17, widthIn: 7.5, offsetMm: 40, boltPattern: "5x4.5" },
          { id: "b", diameterIn: 17, widthIn: 7.5, offsetMm: 40, boltPattern: "6x139.7" },
        ],
      },
    );
    expect(r.results.length).toBeGreaterThan(0);
    expect(r.results.every((m) => m.wheelId === "a")).toBe(true);
    expect(r.total).toBe(STANDARD_SIZES.length * 2);
  });

  it("progress callback reaches total; abort stops early", () => {
    const calls: [number, number][] = [];
    const r = findFitments(truck, { onProgress: (d, t) => calls.push([d, t]) });
    expect(calls.length).toBeGreaterThan(5);
    expect(calls.at(-1)).toEqual([r.total, r.total]);
    for (let i = 1; i < calls.length; i++) expect((calls[i] as [number, number])[0]).toBeGreaterThan((calls[i - 1] as [number, number])[0]);
    const signal = { aborted: false };
    const a = findFitments(truck, { onProgress: (d) => { if (d > 0) signal.aborted = true; }, signal });
    expect(a.aborted).toBe(true);
    expect(a.evaluated).toBeLessThan(a.total);
  });

  it("invalid constraints throw FitmentInputError naming the field", () => {
    expect(() => findFitments({ minDiameterMm: 900, maxDiameterMm: 800 })).toThrow(/minDiameterMm/);
    expect(() => findFitments({ maxInnerSwingMm: Number.NaN })).toThrow(FitmentInputError);
    expect(() => findFitments({ boltPattern: "banana" })).toThrow(/bolt pattern/);
    expect(() => findFitments({}, { offsetsMm: [500] })).toThrow(/offsetsMm/);
    expect(() => findFitments({}, { wheelWidthsIn: [0] })).toThrow(/wheelWidthsIn\[0\]/);
  });
});
