import { describe, expect, it } from "vitest";
import { type SetupComparison, type SetupInput, compareSetups, predictClearance } from "@/lib/fitment";
import { type AssessContext, assessChange, diameterChange } from "./assessChange";
import { FINDING_KINDS, type Finding, type FindingKind, LEVEL_LABEL, LEVEL_TONE, findingsOf } from "./vocabulary";

/*
 * The thresholds each finding should start at, written here from the rules of thumb themselves
 * (every one common practice, no source), not read from thresholds.ts: a threshold moved there
 * without its rule fails here.
 */
const SPEEDO_WARN_PCT = 3; // actual speed more than 3 % off the indicated one
const SCRUB_WARN_MM = 25.4; // scrub radius growing by more than 1 in = 25.4 mm
const REGEAR_WARN_PCT = 5; // restoring ratio 5 % or more from the axle ratio
const OUTER_REACH_WARN_MM = 25; // more than 25 mm further outboard
const INNER_REACH_WARN_MM = 10; // more than 10 mm further inboard: a caution, not only a note
const DIAMETER_CHANGE_WARN_MM = 50; // diameter changing by more than about 2 in (50 mm)
const ALIGNMENT_DIAMETER_MM = 25.4; // diameter changing by 1 in = 25.4 mm or more: align
const ALIGNMENT_SHIFT_MM = 12.7; // wheel plane moving 1/2 in = 12.7 mm or more per side: align

const SAME: SetupInput = { tire: "265/70R17 113T", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
/** The same setup on both sides: nothing changes, so only the standing load note is found. */
const BASE = compareSetups(SAME, SAME);
const changed = (patch: Partial<SetupComparison>): SetupComparison => ({ ...BASE, ...patch });
const gearing = (axleRatio: number, ratioToRestore: number, suggestedRatio: number) =>
  changed({ gearing: { ...BASE.gearing, axleRatio, ratioToRestore, suggestedRatio } });
const withPlanned = (planned: Partial<SetupInput>) => compareSetups(SAME, { ...SAME, ...planned });
const of = (kind: FindingKind, c: SetupComparison, context: AssessContext = {}): Finding[] =>
  assessChange(c, context).filter((f) => f.kind === kind);

/**
 * One case per kind: where the rule stops short of a finding, where it starts, and the source of
 * its threshold (the test fails to compile when a kind has no case).
 */
interface Case {
  source: RegExp;
  none: () => Finding[];
  found: () => Finding[];
}

/** A case on one change figure of the comparison: no finding at `noneAt`, one at `foundAt`. */
const onFigure = (
  kind: FindingKind,
  figure: "outerPokeChangeMm" | "scrubRadiusChangeMm" | "innerClearanceChangeMm" | "diameterChangeMm",
  noneAt: number,
  foundAt: number,
  source = /common practice, no source/,
): Case => ({
  source,
  none: () => of(kind, changed({ [figure]: noneAt })),
  found: () => of(kind, changed({ [figure]: foundAt })),
});

/** The clearance case: a fender measured `distanceMm` above the same setup, against a 12.7 mm margin. */
const fenderAt = (distanceMm: number) => () =>
  of("clearance", BASE, {
    points: [
      {
        id: "p",
        label: "Fender",
        prediction: predictClearance({ direction: "upward", distanceMm, measuredWith: SAME }, SAME, { marginMm: 12.7 }),
      },
    ],
  });

const CASES: Record<Exclude<FindingKind, "load">, Case> = {
  // Measuring rim of 265/70: 265 × 0.75 / 25.4 = 7.82 → 8 in (factor 0.75 for a 70 series, from
  // memory of the UN R30/ETRTO rule); ± 1 in (common practice, no source) gives 7–9 in. Rims come
  // in half inches.
  "rim-width": {
    source: /common practice, no source/,
    none: () => of("rim-width", withPlanned({ wheel: { ...SAME.wheel, widthIn: 9 } })),
    found: () => of("rim-width", withPlanned({ wheel: { ...SAME.wheel, widthIn: 9.5 } })),
  },
  // Past the fender line the user measured (their figure): at the line is not past it.
  poke: {
    source: /fender-line measurement/,
    none: () => of("poke", BASE, { fenderLineMm: BASE.planned.outerSwingMm }),
    found: () => of("poke", BASE, { fenderLineMm: BASE.planned.outerSwingMm - 0.1 }),
  },
  "outer-reach": onFigure("outer-reach", "outerPokeChangeMm", OUTER_REACH_WARN_MM, OUTER_REACH_WARN_MM + 0.1),
  scrub: onFigure("scrub", "scrubRadiusChangeMm", SCRUB_WARN_MM, SCRUB_WARN_MM + 0.1),
  // 3 % itself has no exact binary value ((1.03 − 1) × 100 = 3.0000000000000027): either side of it.
  speedometer: {
    source: /common practice, no source/,
    none: () => of("speedometer", changed({ speedometer: { ...BASE.speedometer, ratio: 1 + (SPEEDO_WARN_PCT - 0.01) / 100 } })),
    found: () => of("speedometer", changed({ speedometer: { ...BASE.speedometer, ratio: 1 + (SPEEDO_WARN_PCT + 0.01) / 100 } })),
  },
  // 4.20 restores a 4.00 axle: (4.2 / 4 − 1) × 100 = 5 %; 4.19 is 4.75 %.
  regear: {
    source: /common practice, no source/,
    none: () => of("regear", gearing(4, 4.19, 4.1)),
    found: () => of("regear", gearing(4, 4.2, 4.1)),
  },
  // Any reach further inboard is a note; the caution threshold has its own case below.
  "inner-reach": onFigure("inner-reach", "innerClearanceChangeMm", 0, -0.1, /engine/),
  diameter: onFigure("diameter", "diameterChangeMm", DIAMETER_CHANGE_WARN_MM, DIAMETER_CHANGE_WARN_MM + 0.1),
  alignment: onFigure("alignment", "diameterChangeMm", ALIGNMENT_DIAMETER_MM - 0.1, ALIGNMENT_DIAMETER_MM),
  spacer: {
    source: /common practice, no source/i,
    none: () => of("spacer", withPlanned({ spacerMm: 0 })),
    found: () => of("spacer", withPlanned({ spacerMm: 0.5 })),
  },
  // The vehicle's margin (its default 1/2 in = 12.7 mm is common practice, no source): an upward
  // gap measured with the same setup is predicted unchanged; at the margin it is clear.
  clearance: { source: /margin you set/, none: fenderAt(12.7), found: fenderAt(12.6) },
};

describe("assessChange: each kind at and just past its threshold", () => {
  it("the same setup on both sides: only the load note", () => {
    expect(assessChange(BASE, {}).map((f) => f.kind)).toEqual(["load"]);
  });

  for (const [kind, c] of Object.entries(CASES)) {
    it(`${kind}: none at the threshold, found just past it, with its source in the basis`, () => {
      expect(c.none()).toEqual([]);
      const found = c.found();
      expect(found.length).toBeGreaterThan(0);
      for (const f of found) expect(f.basis).toMatch(c.source);
    });
  }

  it("every kind has a case (load has no threshold: it is always read)", () => {
    expect([...Object.keys(CASES), "load"].sort()).toEqual([...FINDING_KINDS].sort());
  });
});

describe("assessChange: levels and figures", () => {
  it("rim width: the planned wheel is a caution, the current one a note; 7–9 in for 265/70R17", () => {
    const both = compareSetups({ ...SAME, wheel: { ...SAME.wheel, widthIn: 6.5 } }, { ...SAME, wheel: { ...SAME.wheel, widthIn: 9.5 } });
    const found = findingsOf(assessChange(both, {}), "rim-width");
    expect(found.map((f) => [f.setup, f.level])).toEqual([
      ["current", "note"],
      ["planned", "caution"],
    ]);
    expect(found[0]!.figures).toMatchObject({ widthIn: 6.5, minIn: 7, maxIn: 9, measuringRimIn: 8 });
    expect(found[1]!.figures).toMatchObject({ widthIn: 9.5, minIn: 7, maxIn: 9, measuringRimIn: 8 });
  });

  it("poke: how far past the line, the planned tire first", () => {
    const found = findingsOf(assessChange(BASE, { fenderLineMm: BASE.planned.outerSwingMm - 10 }), "poke");
    expect(found.map((f) => [f.setup, f.level])).toEqual([
      ["planned", "caution"],
      ["current", "note"],
    ]);
    expect(found[0]!.figures.pastMm).toBeCloseTo(10, 9);
  });

  it(`inner reach: a note up to ${INNER_REACH_WARN_MM} mm, a caution past it (common practice, no source)`, () => {
    expect(of("inner-reach", changed({ innerClearanceChangeMm: -INNER_REACH_WARN_MM }))[0]?.level).toBe("note");
    const past = of("inner-reach", changed({ innerClearanceChangeMm: -(INNER_REACH_WARN_MM + 0.1) }))[0];
    expect(past?.level).toBe("caution");
    expect(past?.basis).toMatch(/common practice, no source/);
  });

  it(`speedometer: a shorter tire too, ${SPEEDO_WARN_PCT} % either way`, () => {
    const [f] = findingsOf(assessChange(changed({ speedometer: { ...BASE.speedometer, ratio: 0.96 } }), {}), "speedometer");
    expect(f?.figures.trueAbovePct).toBeCloseTo(-4, 9);
  });

  it(`regear: from ${REGEAR_WARN_PCT} % either way, only when a different common ratio is nearer`, () => {
    expect(of("regear", gearing(4, 3.8, 3.73))[0]?.level).toBe("caution"); // (3.8 / 4 − 1) = −5 %
    expect(of("regear", gearing(4, 4.3, 4))).toEqual([]);
  });

  it("regear on the engine's figures: 265/70R17 → 315/70R17 on a 3.73 axle needs 4.10 (common practice, no source)", () => {
    // 265/70R17: D = 431.8 + 2 × 185.5 = 802.8 mm; 315/70R17: 431.8 + 2 × 220.5 = 872.8 mm (ISO 4000-1).
    const c = compareSetups(SAME, { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } }, { axleRatio: 3.73 });
    const [f] = findingsOf(assessChange(c, {}), "regear");
    // Restoring: 3.73 × 872.8 / 802.8 = 4.0553, 8.7 % above 3.73; the nearest common ratio is 4.10.
    expect(f?.figures.ratioToRestore).toBeCloseTo((3.73 * 872.8) / 802.8, 9);
    expect(f?.figures.gapPct).toBeCloseTo((872.8 / 802.8 - 1) * 100, 9);
    expect(f?.figures.suggestedRatio).toBe(4.1);
  });

  it(`diameter: more than ${DIAMETER_CHANGE_WARN_MM} mm either way; the figure alone gives the same finding`, () => {
    expect(of("diameter", changed({ diameterChangeMm: -(DIAMETER_CHANGE_WARN_MM + 0.1) }))[0]?.level).toBe("caution");
    expect(diameterChange(DIAMETER_CHANGE_WARN_MM)).toBeNull();
    expect(diameterChange(70)).toEqual(of("diameter", changed({ diameterChangeMm: 70 }))[0]);
  });

  it(`alignment: from ${ALIGNMENT_SHIFT_MM} mm of wheel-plane shift per side (half the track change; common practice, no source)`, () => {
    expect(of("alignment", changed({ trackWidthChangeMm: 2 * ALIGNMENT_SHIFT_MM - 0.1 }))).toEqual([]);
    const [f] = findingsOf(assessChange(changed({ trackWidthChangeMm: -2 * ALIGNMENT_SHIFT_MM }), {}), "alignment");
    expect(f?.figures.shiftPerSideMm).toBeCloseTo(-ALIGNMENT_SHIFT_MM, 9);
  });

  it("clearance: tight below the margin is a note, contact at 0 mm a caution, with the point's figures", () => {
    const point = (distanceMm: number) => ({
      id: "p1",
      label: "Bump stop",
      prediction: predictClearance({ direction: "upward", distanceMm, measuredWith: SAME }, SAME, { marginMm: 12.7 }),
    });
    const [tight] = findingsOf(assessChange(BASE, { points: [point(5)] }), "clearance");
    expect(tight?.level).toBe("note");
    expect(tight?.figures).toMatchObject({ pointId: "p1", label: "Bump stop", status: "tight", predictedMm: 5, marginMm: 12.7 });
    expect(tight?.figures.shortfallMm).toBeCloseTo(7.7, 9);
    expect(findingsOf(assessChange(BASE, { points: [point(0)] }), "clearance")[0]?.level).toBe("caution");
  });

  it("load: the planned tire's load index per ISO 4000-1 and its load range's pressure (TRA practice, from memory)", () => {
    const c = compareSetups(SAME, { tire: "37x12.50R17LT 124Q LRD", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } });
    const [f] = findingsOf(assessChange(c, {}), "load");
    // ISO 4000-1: LI 124 = 1600 kg. Load range D flotation: 50 psi (from memory, TRA practice); 1 psi = 6.894757 kPa (NIST SP 811).
    expect(f?.figures).toMatchObject({ index: 124, kg: 1600, loadRange: "D", maxPressurePsi: 50 });
    expect(f?.figures.maxPressureKpa).toBeCloseTo(50 * 6.894757, 3);
    expect(f?.basis).toMatch(/ISO 4000-1/);
    const bare = findingsOf(assessChange(compareSetups(SAME, { ...SAME, tire: "265/70R17" }), {}), "load")[0];
    expect(bare?.figures).toEqual({ index: null, kg: null, loadRange: null, maxPressurePsi: null, maxPressureKpa: null });
  });

  it("the findings come in the order of FINDING_KINDS", () => {
    const c = compareSetups(SAME, { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 }, spacerMm: 10 });
    const kinds = assessChange(c, { fenderLineMm: 100 }).map((f) => f.kind);
    expect(kinds.map((k) => FINDING_KINDS.indexOf(k))).toEqual([...kinds.map((k) => FINDING_KINDS.indexOf(k))].sort((a, b) => a - b));
  });
});

describe("levels: one label and one tone each", () => {
  it("a caution reads Caution in the tight colours, a note Note in the steel ones", () => {
    expect([LEVEL_LABEL.caution, LEVEL_TONE.caution, LEVEL_LABEL.note, LEVEL_TONE.note]).toEqual(["Caution", "tight", "Note", "steel"]);
  });
});
