import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { compareSetups, crawlRatio, effectiveCrawlRatio, engineRpm, RPM_CONSTANT } from "./compare";
import { FitmentInputError } from "./errors";
import { setupGeometry, type SetupInput } from "./geometry";
import { STANDARD_SIZES } from "./standardSizes";
import { nonFinite } from "./testUtil";
import { parseTireSize } from "./tireSize";

const stock: SetupInput = { tire: parseTireSize("265/70R17"), wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
const lifted: SetupInput = { tire: parseTireSize("35x12.50R17LT"), wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } };

describe("engine RPM (handbook formula RPM = mph · axle · trans · 336.135 / D)", () => {
  it("worked example: 50 mph, 6.66 axle, 37.5 in tire ≈ 2985 rpm (handbook formula)", () => {
    expect(engineRpm(50, 6.66, 1, 37.5)).toBeCloseTo(2985, -1); // 2984.9, within ±5 rpm
    expect(Math.abs(engineRpm(50, 6.66, 1, 37.5) - 2985)).toBeLessThan(1);
  });
  it("336.135 = 63 360 in/mile ÷ 60 min/h ÷ π to 6 figures (derivation of the constant)", () => {
    expect(RPM_CONSTANT).toBeCloseTo(63360 / 60 / Math.PI, 3);
  });
  it("rejects impossible ratios", () => {
    expect(() => engineRpm(50, 0, 1, 35)).toThrow(/axleRatio/);
  });
});

describe("crawl ratio (first gear × transfer-case low × axle; common 4x4 handbook definition, common practice, no written source)", () => {
  it("worked example: 4.03 first, 2.72 low, 3.73 axle = 40.89:1 (by hand: 4.03 × 2.72 = 10.9616; × 3.73 = 40.8868)", () => {
    expect(crawlRatio(4.03, 2.72, 3.73)).toBeCloseTo(40.8868, 4);
  });
  it("a taller tire lowers the effective crawl by D_current / D_planned: 265/70R17 (802.8 mm, ISO 4000-1) → 37 in (939.8 mm)", () => {
    // 40.8868 × 802.8 / 939.8 = 34.9265 (by hand).
    expect(effectiveCrawlRatio(40.8868, 802.8, 939.8)).toBeCloseTo(34.9265, 3);
    expect(effectiveCrawlRatio(40, 800, 800)).toBe(40);
  });
  it("refuses impossible gear ratios by field", () => {
    expect(() => crawlRatio(0, 2.72, 3.73)).toThrow(/firstGearRatio/);
    expect(() => crawlRatio(4.03, Number.NaN, 3.73)).toThrow(/transferLowRatio/);
  });
});

describe("compareSetups", () => {
  const c = compareSetups(stock, lifted, { axleRatio: 3.73, kingpinInclinationDeg: 8 });

  it("diameter and ground clearance (half the diameter change)", () => {
    expect(c.diameterChangeMm).toBeCloseTo(889 - 802.8, 9);
    expect(c.groundClearanceChangeMm).toBeCloseTo((889 - 802.8) / 2, 9);
  });

  it("inner clearance, outer poke, track width, scrub", () => {
    const cur = setupGeometry(stock);
    const pla = setupGeometry(lifted);
    expect(c.innerClearanceChangeMm).toBeCloseTo(cur.innerSwingMm - pla.innerSwingMm, 9);
    expect(c.outerPokeChangeMm).toBeCloseTo(pla.outerSwingMm - cur.outerSwingMm, 9);
    expect(c.trackWidthChangeMm).toBeCloseTo(2 * 37, 9); // offset 25 → −12 moves each wheel 37 mm out
    // scrub change = outward shift − Δr · tan(KPI) (zero camber)
    expect(c.scrubRadiusChangeMm).toBeCloseTo(37 - (86.2 / 2) * Math.tan((8 * Math.PI) / 180), 9);
  });

  it("speedometer: actual = indicated × D_planned / D_current", () => {
    expect(c.speedometer.ratio).toBeCloseTo(889 / 802.8, 12);
    const row60 = c.speedometer.rows.find((r) => r.indicatedMph === 60);
    expect(row60?.actualMph).toBeCloseTo(60 * (889 / 802.8), 9); // ≈ 66.4 mph
  });

  it("gearing: ratio to restore, suggested common ratio, RPM rows", () => {
    expect(c.gearing.ratioToRestore).toBeCloseTo(3.73 * (889 / 802.8), 9); // ≈ 4.13
    expect(c.gearing.effectiveRatio).toBeCloseTo(3.73 * (802.8 / 889), 9);
    expect(c.gearing.suggestedRatio).toBe(4.1);
    const r = c.gearing.rpmAt.find((x) => x.mph === 65);
    expect(r?.currentRpm).toBeCloseTo((65 * 3.73 * 336.135) / (802.8 / 25.4), 6);
    expect(r?.plannedRpm).toBeCloseTo((65 * 3.73 * 336.135) / 35, 6);
  });

  it("defaults: KPI 0°, axle 3.73, transmission 1.0, speeds 45–75 mph", () => {
    const d = compareSetups(stock, lifted);
    expect(d.kingpinInclinationDeg).toBe(0);
    expect(d.gearing.axleRatio).toBe(3.73);
    expect(d.gearing.transmissionRatio).toBe(1);
    expect(d.speedometer.rows.map((r) => r.indicatedMph)).toEqual([45, 55, 60, 65, 70, 75]);
    expect(d.scrubRadiusChangeMm).toBeCloseTo(37, 9);
  });

  it("commonRatios and speeds are overridable", () => {
    const d = compareSetups(stock, lifted, { commonRatios: [4.56, 4.88], speedsMph: [30] });
    expect(d.gearing.suggestedRatio).toBe(4.56);
    expect(d.gearing.rpmAt).toHaveLength(1);
  });

  it("invalid options throw FitmentInputError naming the field", () => {
    expect(() => compareSetups(stock, lifted, { axleRatio: -3 })).toThrow(FitmentInputError);
    expect(() => compareSetups(stock, lifted, { kingpinInclinationDeg: 90 })).toThrow(/kingpinInclinationDeg/);
    expect(() => compareSetups(stock, lifted, { speedsMph: [] })).toThrow(/speedsMph/);
    expect(() => compareSetups(stock, lifted, { commonRatios: [Number.NaN] })).toThrow(/commonRatios\[0\]/);
  });

  it("brakeTorqueRatio = planned ÷ current radius, the radius compare uses (half the nominal overall diameter): T = F·r (Newton, handbook), 889 / 802.8 = 1.10737", () => {
    // D 265/70R17 = 802.8 mm (ISO 4000-1), 35x12.50R17LT = 889 mm (35 × 25.4, NIST SP 811 inch)
    expect(c.brakeTorqueRatio).toBeCloseTo(1.10737, 5);
    expect(c.brakeTorqueRatio).toBeCloseTo(889 / 802.8, 12);
    expect(c.rotatingMass).toBeNull();
  });

  it("rotating mass per corner when wheel and tire masses are given: change in kg, inertia and its translating equivalent (approximation, no source: tire a uniform annulus bead seat → tread, wheel a thin ring at the bead seat)", () => {
    const m = compareSetups(stock, lifted, {
      rotatingMass: { current: { wheelKg: 12, tireKg: 22 }, planned: { wheelKg: 20, tireKg: 36 } },
    }).rotatingMass;
    expect(m).not.toBeNull();
    if (m === null) return;
    expect(m.currentKg).toBe(34);
    expect(m.plannedKg).toBe(56);
    expect(m.changeKg).toBe(22);
    // Bead seat radius 17 × 25.4 / 2 = 215.9 mm; R = 401.4 mm and 444.5 mm.
    // I_cur = ½·22·(0.2159² + 0.4014²) + 12·0.2159² = 2.28508 + 0.55935 = 2.84444 kg·m² (by hand)
    // I_pla = ½·36·(0.2159² + 0.4445²) + 20·0.2159² = 4.39547 + 0.93226 = 5.32773 kg·m² (by hand)
    expect(m.currentInertiaKgM2).toBeCloseTo(2.84444, 5);
    expect(m.plannedInertiaKgM2).toBeCloseTo(5.32773, 5);
    expect(m.inertiaRatio).toBeCloseTo(1.87304, 5);
    // I / R²: the mass the spin adds to the vehicle's in braking and accelerating (rolling without slip; Newton)
    expect(m.currentEquivalentMassKg).toBeCloseTo(2.84444 / 0.4014 ** 2, 3); // 17.654 kg
    expect(m.plannedEquivalentMassKg).toBeCloseTo(5.32773 / 0.4445 ** 2, 3); // 26.965 kg
    expect(m.approximation).toMatch(/approximation/);
  });

  it("the equivalent mass lies between all the mass as a thin ring at the bead seat and all of it at the tread (thin ring I = m·r², textbook)", () => {
    const m = compareSetups(stock, lifted, {
      rotatingMass: { current: { wheelKg: 10, tireKg: 30 }, planned: { wheelKg: 10, tireKg: 30 } },
    }).rotatingMass;
    const rb = (17 * 25.4) / 2000;
    const R = 0.4014;
    expect(m?.currentEquivalentMassKg).toBeCloseTo((0.5 * 30 * (rb ** 2 + R ** 2) + 10 * rb ** 2) / R ** 2, 9);
    expect(m?.currentEquivalentMassKg).toBeGreaterThan(40 * (rb / R) ** 2);
    expect(m?.currentEquivalentMassKg).toBeLessThan(40);
    expect(m?.changeKg).toBe(0);
  });

  it("rotating masses partly given or impossible are refused naming the field", () => {
    expect(() => compareSetups(stock, lifted, { rotatingMass: { current: { wheelKg: 12, tireKg: 22 } } as never })).toThrow(
      /rotatingMass\.planned/,
    );
    expect(() =>
      compareSetups(stock, lifted, { rotatingMass: { current: { wheelKg: 12, tireKg: 22 }, planned: { wheelKg: 20, tireKg: -1 } } }),
    ).toThrow(/rotatingMass\.planned\.tireKg/);
    expect(() =>
      compareSetups(stock, lifted, {
        rotatingMass: { current: { wheelKg: Number.NaN, tireKg: 22 }, planned: { wheelKg: 20, tireKg: 30 } },
      }),
    ).toThrow(FitmentInputError);
  });

  const setup = fc
    .record({
      size: fc.constantFrom(...STANDARD_SIZES),
      widthIn: fc.double({ min: 5, max: 14, noNaN: true }),
      offsetMm: fc.double({ min: -100, max: 100, noNaN: true }),
      spacerMm: fc.double({ min: 0, max: 50, noNaN: true }),
    })
    .map(({ size, widthIn, offsetMm, spacerMm }): SetupInput => ({
      tire: size,
      wheel: { diameterIn: size.rimDiameterIn, widthIn, offsetMm },
      spacerMm,
    }));
  const opts = fc.record({
    kingpinInclinationDeg: fc.double({ min: 0, max: 20, noNaN: true }),
    axleRatio: fc.double({ min: 2.5, max: 7.5, noNaN: true }),
    transmissionRatio: fc.double({ min: 0.6, max: 4, noNaN: true }),
  });

  it("compareSetups(a, a) is all zeros (property)", () => {
    fc.assert(
      fc.property(setup, opts, (a, o) => {
        const r = compareSetups(a, a, o);
        expect(r.diameterChangeMm).toBe(0);
        expect(r.groundClearanceChangeMm).toBe(0);
        expect(r.innerClearanceChangeMm).toBe(0);
        expect(r.outerPokeChangeMm).toBe(0);
        expect(r.scrubRadiusChangeMm).toBe(0);
        expect(r.trackWidthChangeMm).toBe(0);
        expect(r.speedometer.ratio).toBe(1);
        for (const row of r.speedometer.rows) expect(row.actualMph).toBe(row.indicatedMph);
        for (const row of r.gearing.rpmAt) expect(row.plannedRpm).toBe(row.currentRpm);
        expect(r.gearing.ratioToRestore).toBe(o.axleRatio);
        expect(r.brakeTorqueRatio).toBe(1);
      }),
      { numRuns: 1000 },
    );
  });

  it("no output is ever NaN or infinite (property)", () => {
    fc.assert(
      fc.property(setup, setup, opts, (a, b, o) => {
        expect(nonFinite(compareSetups(a, b, o))).toEqual([]);
      }),
      { numRuns: 1000 },
    );
  });
});
