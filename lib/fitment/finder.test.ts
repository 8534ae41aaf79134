import { describe, expect, it } from "vitest";
import { type MeasuredClearance, predictClearance } from "./clearance";
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
    const a = findFitments(truck, {
      onProgress: (d) => {
        if (d > 0) signal.aborted = true;
      },
      signal,
    });
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

  describe("measured points (the same prediction as the vehicle page, lib/fitment/clearance.ts)", () => {
    // A pickup on 265/70R17, 17x8 +25 (R = 401.4 mm, ISO 4000-1), with a bumper corner 3/4 in
    // (19.05 mm) ahead of the tread at full lock and a frame rail 1-1/4 in (31.75 mm) inboard at
    // full lock; margin 1/2 in = 12.7 mm (common practice, no source).
    const CUR = { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
    const points: MeasuredClearance[] = [
      { label: "Frame rail, full left lock", direction: "inboard", state: "full-lock", distanceMm: 31.75, measuredWith: CUR },
      { label: "Bumper corner, full right lock", direction: "fore-aft", state: "full-lock", distanceMm: 19.05, measuredWith: CUR },
    ];
    const goals = {
      boltPattern: "6x5.5",
      minDiameterMm: 787.4,
      maxDiameterMm: 876.3,
      wheelDiametersIn: [17],
      clearancePoints: points,
      clearanceMarginMm: 12.7,
    };

    it("keeps only fitments that keep the margin at every point, by predictClearance itself", () => {
      const r = findFitments(goals, { limit: 300 });
      expect(r.results.length).toBeGreaterThan(0);
      for (const m of r.results) {
        for (const p of points) {
          const pred = predictClearance(p, { tire: m.tire, wheel: m.wheel }, { marginMm: 12.7 });
          expect(pred.status, `${m.tire.text} ${m.wheel.widthIn} ${m.wheel.offsetMm} at ${p.label}`).toBe("clear");
        }
        expect(m.tightestClearance).not.toBeNull();
        expect(m.tightestClearance!.predictedMm).toBeGreaterThanOrEqual(12.7);
      }
      // Without the points the same goals find more, among them sizes that touch the bumper corner.
      const loose = findFitments({ ...goals, clearancePoints: undefined }, { limit: 300 });
      expect(loose.matched).toBeGreaterThan(r.matched);
      expect(r.matched + r.excludedCount).toBe(loose.matched);
    });

    it("says which limit decided each excluded size, with the predicted gap and what it needs", () => {
      const r = findFitments(goals, { limit: 10_000, excludedLimit: 20 });
      expect(r.excluded.length).toBe(Math.min(20, r.excludedSizes));
      expect(r.excluded.length).toBeGreaterThan(0);
      const fitting = new Set(r.results.map((m) => m.tire.text));
      for (const x of r.excluded) {
        expect(fitting.has(x.tire.text), `${x.tire.text} is both found and excluded`).toBe(false);
        const reason = x.reason;
        expect(reason.kind).toBe("clearance");
        if (reason.kind !== "clearance") continue;
        const pred = predictClearance(points[reason.pointIndex]!, { tire: x.tire, wheel: x.wheel }, { marginMm: 12.7 });
        expect(reason.label).toBe(points[reason.pointIndex]!.label);
        expect(reason.predictedMm).toBeCloseTo(pred.predictedMm, 9);
        expect(reason.shortfallMm).toBeCloseTo(pred.shortfallMm, 9);
        expect(reason.status).toBe(pred.status);
        // The deciding point is the one short by the most.
        for (const p of points) {
          expect(predictClearance(p, { tire: x.tire, wheel: x.wheel }, { marginMm: 12.7 }).shortfallMm).toBeLessThanOrEqual(
            reason.shortfallMm + 1e-9,
          );
        }
      }
      // 35x12.50R17LT (889 mm) on 17x9 −12: the outer corner's sweep at hub height grows from
      // √(401.4² + 132.5²) = 422.703 to √(444.5² + 190.67²) = 483.669 mm: 19.05 − 60.965 = −41.915 mm,
      // needs 12.7 + 41.915 = 54.615 mm (the frame rail needs 12.7 − (31.75 − 36.853) = 17.80 mm).
      const wide = findFitments({ ...goals, maxDiameterMm: 900 }, { wheelWidthsIn: [9], offsetsMm: [-12], excludedLimit: 100 });
      const x = wide.excluded.find((e) => e.tire.text === "35x12.50R17LT")!;
      expect(x.reason).toMatchObject({ kind: "clearance", pointIndex: 1, status: "contact" });
      expect(x.reason.kind === "clearance" && x.reason.shortfallMm).toBeCloseTo(54.615, 2);
      expect(x.limitsFailed).toBe(2);
    });

    it("an excluded size is shown by its nearest miss: the wheel short by the least (dense check)", () => {
      const widths = [8, 8.5, 9, 9.5];
      const offsets = [-25, -12, 0, 12, 25, 44];
      const r = findFitments(goals, { wheelWidthsIn: widths, offsetsMm: offsets, limit: 10_000, excludedLimit: 10_000 });
      for (const x of r.excluded) {
        let least = Infinity;
        for (const widthIn of widths) {
          for (const offsetMm of offsets) {
            const wheel = { diameterIn: 17, widthIn, offsetMm };
            const g = setupGeometry({ tire: x.tire, wheel });
            if (!g.rimWidthSuitable) continue;
            const short = Math.max(...points.map((p) => predictClearance(p, g, { marginMm: 12.7 }).shortfallMm));
            expect(short, `${x.tire.text} on ${widthIn} ${offsetMm} fits but the size is listed as excluded`).toBeGreaterThan(0);
            least = Math.min(least, short);
          }
        }
        expect(x.reason.shortfallMm).toBeCloseTo(least, 9);
      }
    });

    it("reports the poke limit as the deciding limit where it fails first", () => {
      const r = findFitments(
        { boltPattern: "6x5.5", minDiameterMm: 800, maxDiameterMm: 806, maxOuterSwingMm: 120 },
        { wheelWidthsIn: [8], offsetsMm: [0], excludedLimit: 100 },
      );
      // 265/70R17 on 17x8 0: outer reach 132.5 mm > 120 mm: 12.5 mm over.
      const x = r.excluded.find((e) => e.tire.text === "265/70R17")!;
      expect(x.reason).toMatchObject({ kind: "outer-swing", limitMm: 120 });
      expect(x.reason.kind === "outer-swing" && x.reason.shortfallMm).toBeCloseTo(12.5, 9);
    });

    it("refuses a bad point naming the field", () => {
      expect(() => findFitments({ clearancePoints: [{ ...points[0]!, distanceMm: -1 }] })).toThrow(/clearancePoints\[0\]\.distanceMm/);
      expect(() => findFitments({ clearancePoints: points, clearanceMarginMm: -1 })).toThrow(/clearanceMarginMm/);
    });
  });
});
