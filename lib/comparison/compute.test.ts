import { describe, expect, it } from "vitest";
import { computeComparison, REGEAR_WARN_PCT, SCRUB_WARN_MM, SPEEDO_WARN_PCT } from "./compute";
import { type ComparisonInput, DEFAULT_INPUT } from "./schema";

const r = computeComparison(DEFAULT_INPUT);

const withPlanned = (patch: Partial<ComparisonInput["planned"]>, vehicle: Partial<ComparisonInput["vehicle"]> = {}): ComparisonInput => ({
  ...DEFAULT_INPUT,
  planned: { ...DEFAULT_INPUT.planned, ...patch },
  vehicle: { ...DEFAULT_INPUT.vehicle, ...vehicle },
});

describe("computeComparison — the demo comparison 265/70R17 on 17x8 +25 vs 37x12.50R17LT on 17x9 −12", () => {
  it("diameters: D = d + 2H (ISO 4000-1 / ETRTO) for the metric size, as designated for flotation", () => {
    // 17 in = 431.8 mm (1 in = 25.4 mm exactly, NIST SP 811); H = 265 × 0.70 = 185.5 mm.
    expect(r.current.overallDiameterMm).toBeCloseTo(431.8 + 2 * 185.5, 6);
    // 37 in × 25.4 = 939.8 mm.
    expect(r.planned.overallDiameterMm).toBeCloseTo(939.8, 6);
    expect(r.changes.diameterMm).toBeCloseTo(137, 6);
    expect(r.changes.groundClearanceMm).toBeCloseTo(68.5, 6);
  });

  it("section width on the rim: S = S1 + 0.4 (A − A1) (UN R30 §6.1.1.1) from the 10 in measuring rim of a 12.50 section", () => {
    expect(r.planned.sectionWidthMm).toBeCloseTo(12.5 * 25.4 - 0.4 * 25.4, 6);
    expect(r.current.sectionWidthMm).toBeCloseTo(265, 6);
  });

  it("swing, poke, track and scrub (offset conventions: common practice, no source; arithmetic by hand)", () => {
    // inner swing = offset + S/2: 25 + 132.5 = 157.5; planned −12 + 153.67 = 141.67.
    expect(r.current.innerSwingMm).toBeCloseTo(157.5, 6);
    expect(r.planned.innerSwingMm).toBeCloseTo(141.67, 6);
    expect(r.changes.innerClearanceMm).toBeCloseTo(15.83, 6);
    // outer swing = S/2 − offset: 107.5 → 165.67.
    expect(r.changes.outerPokeMm).toBeCloseTo(58.17, 6);
    // wheel-plane shift 25 − (−12) = 37 mm per side: track +74 mm; with no KPI entered, scrub = shift.
    expect(r.changes.trackWidthMm).toBeCloseTo(74, 6);
    expect(r.changes.scrubRadiusMm).toBeCloseTo(37, 6);
    expect(r.kingpinInclinationDeg).toBeNull();
  });

  it("scrub with KPI: s − (ΔD/2)·tan(KPI) (inclined-axis geometry, common practice, no source)", () => {
    const k = computeComparison({ ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, kingpinInclinationDeg: 8 } });
    expect(k.changes.scrubRadiusMm).toBeCloseTo(37 - 68.5 * Math.tan((8 * Math.PI) / 180), 6);
    expect(k.kingpinInclinationDeg).toBe(8);
  });

  it("backspacing of the wheels: W/2 + offset to the bead seat, + 0.5 in to the flange (common practice, no source)", () => {
    expect(r.planned.backspacingBeadSeatIn).toBeCloseTo(4.5 - 12 / 25.4, 9);
    expect(r.planned.backspacingFlangeIn).toBeCloseTo(5 - 12 / 25.4, 9);
    expect(r.current.backspacingBeadSeatIn).toBeCloseTo(4 + 25 / 25.4, 9);
  });

  it("speedometer: actual = indicated × D_planned / D_current (handbook ratio); 60 mph reads 70.24 mph", () => {
    expect(r.speedometer.headline.indicatedMph).toBe(60);
    expect(r.speedometer.headline.actualMph).toBeCloseTo((60 * 939.8) / 802.8, 9);
    expect(r.speedometer.errorPct).toBeCloseTo((939.8 / 802.8 - 1) * 100, 9);
    expect(r.speedometer.rows.map((x) => x.indicatedMph)).toEqual([10, 20, 30, 40, 50, 60, 70, 80]);
  });

  it("engine speed: RPM = mph · axle · top gear · 336.135 / D(in) (handbook formula)", () => {
    const cur = r.gearing.cruise.find((x) => x.mph === 60);
    expect(cur?.currentRpm).toBeCloseTo((60 * 3.73 * 336.135) / (802.8 / 25.4), 6);
    expect(cur?.plannedRpm).toBeCloseTo((60 * 3.73 * 336.135) / 37, 6);
    expect(r.gearing.cruise.map((x) => x.mph)).toEqual([60, 70]);
    // ratio to restore = 3.73 × 939.8 / 802.8 = 4.3665; nearest common ratio 4.30 (list: common practice).
    expect(r.gearing.ratioToRestore).toBeCloseTo((3.73 * 939.8) / 802.8, 9);
    expect(r.gearing.suggestedRatio).toBe(4.3);
  });

  it("detail figures: circumference π·D, revs per mile 1 609 344 mm / C (NIST SP 811 mile), per km 10⁶ mm / C", () => {
    expect(r.current.circumferenceMm).toBeCloseTo(Math.PI * 802.8, 6);
    expect(r.current.revsPerMile).toBeCloseTo(1_609_344 / (Math.PI * 802.8), 6);
    expect(r.current.revsPerKm).toBeCloseTo(1_000_000 / (Math.PI * 802.8), 6);
    expect(r.current.sidewallMm).toBeCloseTo(185.5, 9);
  });

  it("load index, speed symbol and load range (ISO 4000-1 tables; pressure from memory of TRA practice)", () => {
    // ISO 4000-1: LI 113 = 1150 kg, LI 124 = 1600 kg; 1 lb = 0.45359237 kg exactly (NIST SP 811 B.8).
    expect(r.current.load?.kg).toBe(1150);
    expect(r.current.load?.lb).toBeCloseTo(1150 / 0.45359237, 1);
    expect(r.planned.load?.kg).toBe(1600);
    // Speed symbol T = 190 km/h, Q = 160 km/h (ISO 4000-1); 1 mi = 1.609344 km.
    expect(r.current.speed).toEqual({ symbol: "T", kmh: 190, mph: 190 / 1.609344 });
    expect(r.planned.speed?.kmh).toBe(160);
    // Load range D flotation: 8 ply, 50 psi maximum (from memory, TRA practice).
    expect(r.planned.loadRange?.plyRating).toBe(8);
    expect(r.planned.loadRange?.maxPressurePsi).toBe(50);
    expect(r.current.loadRange).toBeNull();
  });

  it("warns on the demo: scrub, speedometer and regear — and not on rim width (both rims within ± 1 in)", () => {
    expect(r.warnings.map((w) => w.kind).sort()).toEqual(["regear", "scrub", "speedometer"]);
    for (const w of r.warnings) {
      expect(w.why.length).toBeGreaterThan(30);
      expect(w.basis).toMatch(/common practice, no source|engine|measurement/);
    }
    expect(r.warnings.find((w) => w.kind === "scrub")?.lengthMm).toBeCloseTo(37, 6);
  });
});

describe("computeComparison — warning thresholds", () => {
  it("rim width outside measuring rim ± 1 in (12.50 section: 9–11 in)", () => {
    const w = computeComparison(withPlanned({ wheelWidthIn: 12 })).warnings.find((x) => x.kind === "rim-width");
    expect(w?.setup).toBe("planned");
    expect(w?.title).toContain("9–11 in");
    expect(computeComparison(withPlanned({ wheelWidthIn: 11 })).warnings.some((x) => x.kind === "rim-width")).toBe(false);
  });

  it("poke past the fender line: only when the outer swing exceeds the entered distance", () => {
    // planned outer swing 165.67 mm
    const past = computeComparison(withPlanned({}, { fenderLineMm: 150 }));
    expect(past.pokePastFenderMm?.planned).toBeCloseTo(15.67, 6);
    expect(past.warnings.find((x) => x.kind === "poke")?.lengthMm).toBeCloseTo(15.67, 6);
    expect(computeComparison(withPlanned({}, { fenderLineMm: 170 })).warnings.some((x) => x.kind === "poke")).toBe(false);
    expect(r.pokePastFenderMm).toBeNull();
  });

  it(`scrub: warns above ${SCRUB_WARN_MM} mm, not at 20 mm`, () => {
    // offset 5 mm → shift 20 mm
    expect(computeComparison(withPlanned({ position: { mode: "offset", offsetMm: 5 } })).warnings.some((x) => x.kind === "scrub")).toBe(false);
    expect(computeComparison(withPlanned({ position: { mode: "offset", offsetMm: -1 } })).warnings.some((x) => x.kind === "scrub")).toBe(true);
  });

  it(`speedometer beyond ${SPEEDO_WARN_PCT} %, regear from ${REGEAR_WARN_PCT} %: 265/75R17 (+3.3 %) earns the first only`, () => {
    // 265/75R17: D = 431.8 + 397.5 = 829.3 mm; 829.3 / 802.8 = 1.033 → 3.3 % (speedometer yes); regear no (< 5 %).
    const small = computeComparison(withPlanned({ tire: "265/75R17", wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 } }));
    expect(small.speedometer.errorPct).toBeCloseTo((829.3 / 802.8 - 1) * 100, 6);
    // Its 7.5 in measuring rim (265 × 0.70 / 25.4 = 7.30 → 7.5) makes it 2.54 mm wider on 8 in: it reaches 1.27 mm further in.
    expect(small.warnings.map((x) => x.kind)).toEqual(["speedometer", "inner-reach"]);
    expect(small.changes.innerClearanceMm).toBeCloseTo(-0.4 * 0.5 * 25.4 / 2, 6);
    const same = computeComparison(withPlanned({ tire: "265/70R17", wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 } }));
    expect(same.warnings).toEqual([]);
    expect(same.changes.diameterMm).toBe(0);
  });

  it("inner reach and spacer notes", () => {
    const x = computeComparison(withPlanned({ position: { mode: "offset", offsetMm: 40 }, spacerMm: 25 }));
    // effective offset 15: inner swing 15 + 153.67 = 168.67 > 157.5
    expect(x.changes.innerClearanceMm).toBeCloseTo(157.5 - 168.67, 6);
    expect(x.warnings.find((w) => w.kind === "inner-reach")?.lengthMm).toBeCloseTo(11.17, 6);
    expect(x.warnings.find((w) => w.kind === "spacer")?.why).toMatch(/spacer maker's/);
  });

  it("backspacing positions go through the engine (9.5 in wheel, 4 in to the flange = −31.75 mm; common practice, no source)", () => {
    const x = computeComparison(withPlanned({ tire: "35x12.50R17LT", wheelWidthIn: 9.5, position: { mode: "backspacing", backspacingIn: 4, reference: "flange", flangeIn: 0.5 } }));
    expect(x.planned.offsetMm).toBeCloseTo(-31.75, 9);
    const bead = computeComparison(withPlanned({ tire: "35x12.50R17LT", wheelWidthIn: 9.5, position: { mode: "backspacing", backspacingIn: 3.5, reference: "bead-seat", flangeIn: 0.5 } }));
    expect(bead.planned.offsetMm).toBeCloseTo(-31.75, 9);
  });
});
