import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import {
  formatTorqueEntry,
  parseTorqueEntry,
  requireTorqueNm,
  switchTorqueUnit,
  tighteningSequence,
  torqueEntryNm,
  torqueFromNm,
  torqueLimitsIn,
  torquePlan,
  torqueToNm,
  type TorqueEntry,
} from "./tightening";
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
        for (let i = 0; i < 4; i++)
          for (let j = 0; j < i; j++) expect(sep(firstFour[i] as number, firstFour[j] as number, n)).toBeGreaterThan(1.5 / n);
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
    expect(() => torquePlan({ boltCount: 8, torqueFtLb: "17" as unknown as number })).toThrow(/torqueFtLb/);
    expect(() => torquePlan({ boltCount: 8, torqueNm: 100, stages: [0.6, 0.3, 1] })).toThrow(/rise/);
    expect(() => torquePlan({ boltCount: 8, torqueNm: 100, stages: [0.3, 0.6] })).toThrow(/last stage/);
  });
});

// NIST SP 811 (2008), Appendix B.9 (torque): 1 ft·lbf = 1.355 818 E+00 N·m.
const NIST_NM_PER_FTLBF = 1.355818;
const FIELD_FTLB = "Maker's torque (ft·lb)";
const FIELD_NM = "Maker's torque (N·m)";

describe("torque units (NIST SP 811 B.9: 1 ft·lbf = 1.355818 N·m)", () => {
  it("18 ft·lb = 24.40 N·m and back", () => {
    // 18 × 1.355818 = 24.404724 N·m
    expect(torqueToNm(18, "ftlb")).toBeCloseTo(18 * NIST_NM_PER_FTLBF, 5);
    expect(torqueToNm(24.4, "nm")).toBe(24.4);
    expect(torqueFromNm(torqueToNm(18, "ftlb"), "ftlb")).toBeCloseTo(18, 12);
    expect(torqueFromNm(24.404724, "ftlb")).toBeCloseTo(24.404724 / NIST_NM_PER_FTLBF, 5);
  });

  it("writes a converted figure to 0.1 without thousands separators, so it reads back as one number", () => {
    expect(formatTorqueEntry(torqueToNm(18, "ftlb"), "nm")).toBe("24.4");
    expect(formatTorqueEntry(torqueToNm(18, "ftlb"), "ftlb")).toBe("18");
    // 1000 ft·lb × 1.355818 = 1355.818 N·m
    expect(formatTorqueEntry(torqueToNm(1000, "ftlb"), "nm")).toBe("1355.8");
  });

  it("switching units converts the figure and keeps the exact value behind the text: 18 → 24.4 → 18, never 17.99", () => {
    let e: TorqueEntry = { text: "18", unit: "ftlb", exact: null };
    const exactNm = torqueToNm(18, "ftlb");
    for (let i = 0; i < 25; i++) {
      e = switchTorqueUnit(e, "nm", FIELD_FTLB);
      expect(e.text).toBe("24.4");
      expect(e.unit).toBe("nm");
      expect(torqueEntryNm(e, FIELD_NM)).toBe(exactNm);
      e = switchTorqueUnit(e, "ftlb", FIELD_NM);
      expect(e.text).toBe("18");
      expect(torqueEntryNm(e, FIELD_FTLB)).toBe(exactNm);
    }
  });

  it("a figure typed over a converted one is read as typed, in the unit shown", () => {
    const switched = switchTorqueUnit({ text: "18", unit: "ftlb", exact: null }, "nm", FIELD_FTLB);
    // The exact value only stands behind the very text the switch wrote.
    expect(torqueEntryNm({ ...switched, text: "24.5" }, FIELD_NM)).toBe(24.5);
    expect(torqueEntryNm({ ...switched, text: "25" }, FIELD_NM)).toBe(25);
    expect(torqueEntryNm({ text: "  ", unit: "nm", exact: null }, FIELD_NM)).toBeNull();
  });

  it("switching an empty field only changes the unit", () => {
    expect(switchTorqueUnit({ text: "", unit: "ftlb", exact: null }, "nm", FIELD_FTLB)).toEqual({ text: "", unit: "nm", exact: null });
  });

  it("refuses to switch an entry it cannot read, naming the field", () => {
    expect(() => switchTorqueUnit({ text: "16-18", unit: "ftlb", exact: null }, "nm", FIELD_FTLB)).toThrow(/^Maker's torque \(ft·lb\)/);
  });
});

describe("parseTorqueEntry", () => {
  it("reads a plain figure, with or without the unit chosen", () => {
    expect(parseTorqueEntry("18", "ftlb", FIELD_FTLB)).toBe(18);
    expect(parseTorqueEntry(" 17.5 ", "ftlb", FIELD_FTLB)).toBe(17.5);
    expect(parseTorqueEntry(".5", "nm", FIELD_NM)).toBe(0.5);
    expect(parseTorqueEntry("18 ft-lb", "ftlb", FIELD_FTLB)).toBe(18);
    expect(parseTorqueEntry("18 lb·ft", "ftlb", FIELD_FTLB)).toBe(18);
    expect(parseTorqueEntry("18ft lbs", "ftlb", FIELD_FTLB)).toBe(18);
    expect(parseTorqueEntry("24.4 Nm", "nm", FIELD_NM)).toBe(24.4);
    expect(parseTorqueEntry("24.4 N·m", "nm", FIELD_NM)).toBe(24.4);
  });

  const refused: [string, "ftlb" | "nm", RegExp][] = [
    ["", "ftlb", /enter the maker's figure/],
    ["16-18", "ftlb", /range/],
    ["16 – 18", "ftlb", /range/],
    ["16 to 18", "ftlb", /range/],
    ["18,5", "ftlb", /comma/],
    ["1,500", "nm", /comma/],
    ["-18", "ftlb", /negative/],
    ["18 N·m", "ftlb", /N·m.*chosen unit is ft·lb/],
    ["24 ft·lb", "nm", /ft·lb.*chosen unit is N·m/],
    ["200 in-lb", "ftlb", /inch-pounds/],
    ["abc", "ftlb", /not a number/],
    ["18.5.2", "ftlb", /not a number/],
    ["1e3", "nm", /not a number/],
    ["18 24", "ftlb", /not a number/],
  ];
  for (const [text, unit, why] of refused) {
    it(`refuses ${JSON.stringify(text)} in ${unit} with a message naming the field`, () => {
      const field = unit === "ftlb" ? FIELD_FTLB : FIELD_NM;
      let err: unknown;
      try {
        parseTorqueEntry(text, unit, field);
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(FitmentInputError);
      expect((err as FitmentInputError).field).toBe(field);
      expect((err as Error).message.startsWith(field)).toBe(true);
      expect((err as Error).message).toMatch(why);
    });
  }
});

describe("torque range does not depend on the unit it is given in", () => {
  it("1490 ft·lb (2020.2 N·m) is refused like 2020.2 N·m; 0.8 ft·lb (1.08 N·m) is accepted like 1.08 N·m", () => {
    expect(() => torquePlan({ boltCount: 24, torqueNm: torqueToNm(1490, "ftlb") })).toThrow(FitmentInputError);
    expect(() => torquePlan({ boltCount: 24, torqueFtLb: 1490 })).toThrow(FitmentInputError);
    expect(torquePlan({ boltCount: 24, torqueNm: torqueToNm(0.8, "ftlb") }).torqueFtLb).toBeCloseTo(0.8, 12);
    expect(torquePlan({ boltCount: 24, torqueFtLb: 0.8 }).torqueFtLb).toBeCloseTo(0.8, 12);
  });

  it("states the limits in the unit of the field, rounded inward (1–2000 N·m = 0.74–1475.1 ft·lb)", () => {
    expect(torqueLimitsIn("nm")).toEqual({ min: 1, max: 2000 });
    expect(torqueLimitsIn("ftlb")).toEqual({ min: 0.8, max: 1475.1 });
    expect(() => requireTorqueNm(torqueToNm(1600, "ftlb"), "ftlb", FIELD_FTLB)).toThrow(
      /^Maker's torque \(ft·lb\) must be between 0\.8 and 1475\.1 ft·lb \(1 and 2000 N·m\), got 1600 ft·lb/,
    );
    // 1475.1 × 1.355818 = 1999.967 N·m, just inside 2000 N·m
    expect(requireTorqueNm(torqueToNm(1475.1, "ftlb"), "ftlb", FIELD_FTLB)).toBeCloseTo(1999.967, 3);
    expect(() => requireTorqueNm(Number.NaN, "nm", FIELD_NM)).toThrow(/Maker's torque \(N·m\)/);
  });
});
