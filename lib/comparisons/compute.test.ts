import { describe, expect, it } from "vitest";
import { REGEAR_WARN_PCT, SCRUB_WARN_MM, SPEEDO_WARN_PCT } from "./assess/thresholds";
import { computeComparison } from "./compute";
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
    const mph = r.speedometer.bySystem.imperial;
    expect(mph.unit).toBe("mph");
    expect(mph.headline.indicated).toBe(60);
    expect(mph.headline.actual).toBeCloseTo((60 * 939.8) / 802.8, 9);
    expect(r.speedometer.trueAbovePct).toBeCloseTo((939.8 / 802.8 - 1) * 100, 9);
    expect(mph.rows.map((x) => x.indicated)).toEqual([10, 20, 30, 40, 50, 60, 70, 80]);
  });

  it("engine speed: RPM = mph · axle · top gear · 336.135 / D(in) (handbook formula)", () => {
    const cur = r.gearing.cruise.find((x) => x.mph === 60);
    expect(cur?.entered).toEqual({ value: 60, unit: "mph" });
    expect(cur?.currentRpm).toBeCloseTo((60 * 3.73 * 336.135) / (802.8 / 25.4), 6);
    expect(cur?.plannedRpm).toBeCloseTo((60 * 3.73 * 336.135) / 37, 6);
    expect(r.gearing.cruise.map((x) => x.mph)).toEqual([60, 70]);
    // ratio to restore = 3.73 × 939.8 / 802.8 = 4.3665; nearest common ratio 4.30 (list: common practice).
    expect(r.gearing.ratioToRestore).toBeCloseTo((3.73 * 939.8) / 802.8, 9);
    expect(r.gearing.suggestedRatio).toBe(4.3);
  });

  it("crawl ratio = first gear × transfer-case low × axle (common 4x4 handbook definition, common practice, no written source): 4.03 × 2.72 × 3.73 = 40.89:1", () => {
    expect(r.gearing.crawl).toBeNull();
    const c = computeComparison({ ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, firstGearRatio: 4.03, transferLowRatio: 2.72 } })
      .gearing.crawl;
    // By hand: 4.03 × 2.72 = 10.9616; × 3.73 = 40.8868.
    expect(c?.ratio).toBeCloseTo(40.8868, 4);
    // The 37 in tire (939.8 mm) over the 265/70R17 (802.8 mm, ISO 4000-1) acts like 40.8868 × 802.8 / 939.8 = 34.9265:1, 14.6 % lower.
    expect(c?.onPlannedTire).toBeCloseTo(34.9265, 3);
    expect(c?.changePct).toBeCloseTo((802.8 / 939.8 - 1) * 100, 9);
    // Regeared to the suggested 4.30 (see the engine-speed check above): 10.9616 × 4.30 = 47.1349;
    // on the 37 in tire × 802.8 / 939.8 = 40.2637, back near the 40.89 of the current tire.
    expect(r.gearing.suggestedRatio).toBe(4.3);
    expect(c?.regeared).toBeCloseTo(47.1349, 3);
    expect(c?.regearedOnPlannedTire).toBeCloseTo(40.2637, 3);
    // Only one of the two gear ratios gives no crawl ratio.
    expect(computeComparison({ ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, firstGearRatio: 4.03 } }).gearing.crawl).toBeNull();
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
    expect(computeComparison(withPlanned({ position: { mode: "offset", offsetMm: 5 } })).warnings.some((x) => x.kind === "scrub")).toBe(
      false,
    );
    expect(computeComparison(withPlanned({ position: { mode: "offset", offsetMm: -1 } })).warnings.some((x) => x.kind === "scrub")).toBe(
      true,
    );
  });

  it(`speedometer beyond ${SPEEDO_WARN_PCT} %, regear from ${REGEAR_WARN_PCT} %: 265/75R17 (+3.3 %) earns the first only`, () => {
    // 265/75R17: D = 431.8 + 397.5 = 829.3 mm; 829.3 / 802.8 = 1.033 → 3.3 % (speedometer yes); regear no (< 5 %).
    const small = computeComparison(withPlanned({ tire: "265/75R17", wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 } }));
    expect(small.speedometer.trueAbovePct).toBeCloseTo((829.3 / 802.8 - 1) * 100, 6);
    // Its 7.5 in measuring rim (265 × 0.70 / 25.4 = 7.30 → 7.5) makes it 2.54 mm wider on 8 in: it reaches 1.27 mm further in.
    expect(small.warnings.map((x) => x.kind)).toEqual(["speedometer", "inner-reach"]);
    expect(small.changes.innerClearanceMm).toBeCloseTo((-0.4 * 0.5 * 25.4) / 2, 6);
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
    const on95 = (backspacingIn: number, reference: "flange" | "bead-seat") =>
      computeComparison(
        withPlanned({
          tire: "35x12.50R17LT",
          wheelWidthIn: 9.5,
          position: { mode: "backspacing", backspacingIn, reference, flangeIn: 0.5 },
        }),
      );
    const x = on95(4, "flange");
    expect(x.planned.offsetMm).toBeCloseTo(-31.75, 9);
    const bead = on95(3.5, "bead-seat");
    expect(bead.planned.offsetMm).toBeCloseTo(-31.75, 9);
  });
});

describe("computeComparison — reference speeds in the reader's own unit", () => {
  // The demo: 265/70R17 (802.8 mm, ISO 4000-1: 431.8 + 2 × 0.70 × 265) against 37 in (939.8 mm).
  const ratio = 939.8 / 802.8;

  it("metric rows and headline are round km/h, generated in km/h, not converted from mph", () => {
    const kmh = r.speedometer.bySystem.metric;
    expect(kmh.unit).toBe("km/h");
    expect(kmh.rows.map((x) => x.indicated)).toEqual([20, 30, 40, 50, 60, 70, 80, 90, 100, 110, 120]);
    // Exactly the round figures (toBe, not toBeCloseTo): no 96.6 or 49.9 km/h rows.
    for (const v of [50, 80, 100, 120]) expect(kmh.rows.some((x) => x.indicated === v)).toBe(true);
    expect(kmh.headline.indicated).toBe(100);
    // Actual = indicated × ratio in the same unit: 100 km/h × 1.17065 = 117.07 km/h.
    expect(kmh.headline.actual).toBeCloseTo(117.0653, 4);
    for (const row of kmh.rows) expect(row.actual).toBeCloseTo(row.indicated * ratio, 9);
  });

  it("imperial rows stay round mph (as before)", () => {
    const mph = r.speedometer.bySystem.imperial;
    expect(mph.rows.map((x) => x.indicated)).toEqual([10, 20, 30, 40, 50, 60, 70, 80]);
    expect(mph.headline).toEqual({ indicated: 60, actual: 60 * ratio });
  });

  it("engine-speed rows at round km/h use the handbook formula at v / 1.609344 mph (NIST SP 811 mile)", () => {
    const rows = r.gearing.bySystem.metric.rows;
    expect(r.gearing.bySystem.metric.unit).toBe("km/h");
    expect(rows.map((x) => x.speed)).toEqual([20, 30, 40, 50, 60, 70, 80, 90, 100, 110, 120]);
    const at100 = rows.find((x) => x.speed === 100);
    // RPM = mph · axle · top gear · 336.135 / D(in): 62.137 × 3.73 × 336.135 / 31.606 = 2464.9.
    expect(at100?.currentRpm).toBeCloseTo(((100 / 1.609344) * 3.73 * 336.135) / (802.8 / 25.4), 6);
    expect(at100?.currentRpm).toBeCloseTo(2464.9, 1);
    expect(r.gearing.bySystem.imperial.rows.map((x) => x.speed)).toEqual([10, 20, 30, 40, 50, 60, 70, 80]);
  });

  it("worked example by hand: speed ∝ rolling circumference (v = revolutions × π·D; rolling without slip, handbook kinematics, from memory)", () => {
    // The speedometer counts wheel revolutions calibrated to the current tire's circumference.
    // Indicated 100 km/h on 265/70R17: 100 000 000 mm/h ÷ (π × 802.8 mm) = 39 650 rev/h.
    // The 37 in tire covers π × 939.8 mm = 2952.5 mm a turn: 39 650 × 2952.5 mm = 117.07 km/h.
    const revsPerHour = 100_000_000 / (Math.PI * 802.8);
    expect(revsPerHour).toBeCloseTo(39_650, 0);
    expect((revsPerHour * Math.PI * 939.8) / 1_000_000).toBeCloseTo(117.07, 2);
    expect(r.speedometer.bySystem.metric.headline.actual).toBeCloseTo(117.07, 2);
    // Two percentages from the one ratio r = 1.17065:
    // actual is (r − 1) = 17.07 % above the indicated speed;
    expect(r.speedometer.trueAbovePct).toBeCloseTo(17.07, 2);
    // the speedometer shows 100 of 117.07, i.e. reads (1 − 1/r) = 137 / 939.8 = 14.58 % low.
    expect(r.speedometer.readsLowPct).toBeCloseTo(14.58, 2);
    expect(r.speedometer.readsLowPct).toBeCloseTo((137 / 939.8) * 100, 9);
  });

  it("cruise speeds show back as entered: km/h entries stored as mph / 1.609344 are recovered exactly", () => {
    const x = computeComparison({
      ...DEFAULT_INPUT,
      vehicle: { ...DEFAULT_INPUT.vehicle, cruiseSpeedsMph: [100 / 1.609344, 113 / 1.609344, 62.5] },
    });
    expect(x.gearing.cruise.map((c) => c.entered)).toEqual([
      { value: 100, unit: "km/h" },
      { value: 113, unit: "km/h" },
      { value: 62.5, unit: "mph" },
    ]);
    // A link carries mph to 4 decimals (62.1371): still 100 km/h as typed.
    const fromLink = computeComparison({ ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, cruiseSpeedsMph: [62.1371, 70.215] } });
    expect(fromLink.gearing.cruise.map((c) => c.entered)).toEqual([
      { value: 100, unit: "km/h" },
      { value: 113, unit: "km/h" },
    ]);
    // The engine speed is still the one at the stored speed.
    expect(x.gearing.cruise[0]?.currentRpm).toBeCloseTo(((100 / 1.609344) * 3.73 * 336.135) / (802.8 / 25.4), 6);
  });

  it("the speedometer warning reads in the reader's unit and says which percentage is which", () => {
    const w = r.warnings.find((x) => x.kind === "speedometer");
    expect(w?.titleBySystem?.metric).toBe(
      "Speedometer reads 14.6 % low: at an indicated 100 km/h you are actually going 117.1 km/h (actual speed is 17.1 % above the speedometer)",
    );
    expect(w?.titleBySystem?.imperial).toBe(
      "Speedometer reads 14.6 % low: at an indicated 60 mph you are actually going 70.2 mph (actual speed is 17.1 % above the speedometer)",
    );
  });

  it("a smaller tire: the speedometer reads high, actual speed below it", () => {
    // 245/70R17 on the same wheel: D = 431.8 + 2 × 0.70 × 245 = 774.8 mm; r = 774.8 / 802.8 = 0.96512.
    const s = computeComparison(withPlanned({ tire: "245/70R17", wheelWidthIn: 7.5, position: { mode: "offset", offsetMm: 25 } }));
    expect(s.speedometer.ratio).toBeCloseTo(774.8 / 802.8, 9);
    // actual 3.49 % below indicated; speedometer reads 28 / 774.8 = 3.61 % high (negative "low").
    expect(s.speedometer.trueAbovePct).toBeCloseTo(-3.488, 3);
    expect(s.speedometer.readsLowPct).toBeCloseTo(-3.614, 3);
    expect(s.warnings.find((x) => x.kind === "speedometer")?.titleBySystem?.metric).toBe(
      "Speedometer reads 3.6 % high: at an indicated 100 km/h you are actually going 96.5 km/h (actual speed is 3.5 % below the speedometer)",
    );
  });
});
