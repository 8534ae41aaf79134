import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import { tighteningSequence, torquePlan } from "./tightening";
import { ftLbToNm } from "./units";

/** Angular distance between bolts a and b (1-based) as a fraction of a turn, 0–0.5. */
const sep = (a: number, b: number, n: number): number => {
  const d = Math.abs(a - b) % n;
  return Math.min(d, n - d) / n;
};
const quadrant = (bolt: number, n: number): number => Math.floor((((bolt - 1) / n) * 4 + 1e-9) % 4);

describe("tighteningSequence", () => {
  it("classic lug orders (common practice, no source): 4, 5, 8 bolts", () => {
    expect(tighteningSequence(4)).toEqual([1, 3, 2, 4]);
    expect(tighteningSequence(5)).toEqual([1, 3, 5, 2, 4]);
    expect(tighteningSequence(8)).toEqual([1, 5, 3, 7, 2, 6, 4, 8]);
  });

  it("6 bolts: each bolt followed by its opposite", () => {
    const s = tighteningSequence(6);
    expect(s).toEqual([1, 4, 2, 5, 3, 6]);
  });

  for (let n = 4; n <= 40; n++) {
    it(`${n} bolts: a permutation of 1..${n}, bolt 1 first, each start followed by the most opposite bolt left`, () => {
      const s = tighteningSequence(n);
      expect([...s].sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i + 1));
      expect(s[0]).toBe(1);
      for (let i = 1; i < n; i += 2) {
        const prev = s[i - 1] as number;
        const here = s[i] as number;
        const remaining = s.slice(i);
        const bestSep = Math.max(...remaining.map((b) => sep(prev, b, n)));
        expect(sep(prev, here, n)).toBeCloseTo(bestSep, 12);
      }
      // one bolt in each quadrant before any neighbour of a tightened bolt (possible from 8 bolts up)
      const firstFour = s.slice(0, 4);
      if (n % 4 === 0) expect(new Set(firstFour.map((b) => quadrant(b, n))).size).toBe(4);
      if (n >= 8) {
        for (let i = 0; i < 4; i++) for (let j = 0; j < i; j++) expect(sep(firstFour[i] as number, firstFour[j] as number, n)).toBeGreaterThan(1.5 / n);
      }
    });
  }

  it("24 and 32 bolt beadlock rings start at 0°, 180°, 90°, 270° (common practice, no source)", () => {
    expect(tighteningSequence(24).slice(0, 4)).toEqual([1, 13, 7, 19]);
    expect(tighteningSequence(32).slice(0, 4)).toEqual([1, 17, 9, 25]);
  });

  it("rejects bolt counts that are not whole numbers 3–64", () => {
    for (const n of [0, 2, 4.5, 65, Number.NaN]) expect(() => tighteningSequence(n)).toThrow(FitmentInputError);
    expect(() => tighteningSequence(2)).toThrow(/boltCount/);
  });
});

describe("torquePlan", () => {
  it("beadlock ring bolts 16–18 ft·lb ≈ 21.7–24.4 N·m (common practice, no source)", () => {
    expect(ftLbToNm(16)).toBeCloseTo(21.7, 1);
    expect(ftLbToNm(18)).toBeCloseTo(24.4, 1);
    const p = torquePlan({ boltCount: 24, torqueFtLb: 17 });
    expect(p.startBolts).toEqual([1, 13, 7, 19]); // one bolt started in each quadrant first
    expect(p.passes.map((x) => x.fraction)).toEqual([0.3, 0.6, 1, 1]);
    expect(p.passes.map((x) => x.kind)).toEqual(["stage", "stage", "stage", "check"]);
    expect(p.passes[2]?.torqueFtLb).toBeCloseTo(17, 9);
    expect(p.passes[2]?.torqueNm).toBeCloseTo(23.05, 2);
    expect(p.passes[0]?.sequence).toEqual(tighteningSequence(24));
  });

  it("accepts N·m, custom stages, no final check", () => {
    const p = torquePlan({ boltCount: 8, torqueNm: 190, stages: [0.5, 1], finalCheck: false });
    expect(p.passes.map((x) => x.torqueNm)).toEqual([95, 190]);
  });

  it("rejects missing or double torque, bad stages", () => {
    expect(() => torquePlan({ boltCount: 8 })).toThrow(/exactly one/);
    expect(() => torquePlan({ boltCount: 8, torqueNm: 100, torqueFtLb: 70 })).toThrow(/exactly one/);
    expect(() => torquePlan({ boltCount: 8, torqueNm: -1 })).toThrow(/torqueNm/);
    expect(() => torquePlan({ boltCount: 8, torqueNm: 100, stages: [0.6, 0.3, 1] })).toThrow(/rise/);
    expect(() => torquePlan({ boltCount: 8, torqueNm: 100, stages: [0.3, 0.6] })).toThrow(/last stage/);
  });
});
