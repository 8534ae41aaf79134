/**
 * One function from a valid comparison input to everything the comparison screens show: per
 * setup figures, the headline changes, the speedometer and engine-speed tables, and warnings.
 * Every number comes from the engine (lib/fitment); this module only picks, pairs and judges.
 * Speed rows come once per unit system at round speeds of that unit (see speedometer.ts).
 *
 * Warning thresholds (each a documented choice, see the constants below):
 * - rim width: outside the engine's range suited to the section width (measuring rim ± 1 in,
 *   common practice, no source);
 * - poke: the tire's outer reach past the fender line the user measured (their figure);
 * - scrub: an increase of more than 25 mm (1 in) (common practice, no source);
 * - speedometer: actual speed more than 3 % off the indicated one (common practice, no source);
 * - regear: the ratio that restores the engine speed differs from the axle ratio by 5 % or more
 *   and a different common ratio is nearer (common practice, no source).
 */
import {
  DEFAULT_FLANGE_IN,
  KM_PER_MILE,
  backspacingFromOffset,
  compareSetups,
  crawlRatio,
  effectiveCrawlRatio,
  kgToLb,
  loadIndexKg,
  loadRangeInfo,
  plyRating,
  setupGeometry,
  speedSymbolKmh,
  tireDimensions,
  type SetupComparison,
  type SetupGeometry,
} from "@/lib/fitment";
import { type Setup, toEngineSetup } from "@/lib/setup/model";
import type { ComparisonInput } from "./model";
import {
  type EnteredSpeed,
  type SpeedSystem,
  type SpeedUnit,
  HEADLINE_SPEED,
  REFERENCE_SPEEDS,
  SPEED_UNIT,
  enteredSpeed,
  readingPhrase,
  speedometerPercents,
  toMph,
  trueSpeedPhrase,
} from "./speedometer";

/** Actual speed off the indicated one by more than this earns a warning, percent (common practice, no source). */
export const SPEEDO_WARN_PCT = 3;
/** Scrub radius increase that earns a warning, mm (1 in; common practice, no source). */
export const SCRUB_WARN_MM = 25.4;
/** Difference between the restoring ratio and the axle ratio that advises a regear, percent (common practice, no source). */
export const REGEAR_WARN_PCT = 5;
/** Indicated and actual speed, both in the unit of the system they belong to. */
export interface SpeedRow {
  indicated: number;
  actual: number;
}

/** Engine speeds at a road speed given in the unit of the system it belongs to. */
export interface RpmRow {
  speed: number;
  currentRpm: number;
  plannedRpm: number;
  regearedRpm: number;
}

/** Engine speeds at a cruise speed the user entered: stored mph and the figure as typed. */
export interface CruiseRow {
  mph: number;
  entered: EnteredSpeed;
  currentRpm: number;
  plannedRpm: number;
  regearedRpm: number;
}

/**
 * Crawl ratios (first gear × transfer-case low × axle), when both gear ratios are entered: on the
 * current axle ratio and on the suggested one, each as it is and as the planned tire makes it act
 * (× D_current / D_planned).
 */
export interface CrawlFigures {
  firstGearRatio: number;
  transferLowRatio: number;
  /** With the current axle ratio, on the current tire. */
  ratio: number;
  /** With the current axle ratio, as the planned tire makes it act. */
  onPlannedTire: number;
  /** Change from `ratio` to `onPlannedTire`, percent; negative = the taller tire lowers it. */
  changePct: number;
  /** With the suggested (regeared) axle ratio. */
  regeared: number;
  /** With the suggested axle ratio, as the planned tire makes it act. */
  regearedOnPlannedTire: number;
}

/** Figures of one setup, as the detail table shows them. */
export interface SetupFigures {
  /** The tire size as typed (trimmed) and the engine's normalized designation. */
  tireTyped: string;
  tireText: string;
  system: "metric" | "flotation" | "numeric";
  wheelDiameterIn: number;
  wheelWidthIn: number;
  offsetMm: number;
  spacerMm: number;
  effectiveOffsetMm: number;
  backspacingBeadSeatIn: number;
  backspacingFlangeIn: number;
  flangeAllowanceIn: number;
  sectionWidthMm: number;
  sidewallMm: number;
  overallDiameterMm: number;
  circumferenceMm: number;
  revsPerMile: number;
  revsPerKm: number;
  rimWidthMm: number;
  innerSwingMm: number;
  outerSwingMm: number;
  beadSeatInboardMm: number;
  beadSeatOutboardMm: number;
  measuringRimWidthIn: number;
  rimWidthMinIn: number;
  rimWidthMaxIn: number;
  rimWidthSuitable: boolean;
  load: { index: number; kg: number; lb: number; dualIndex: number | null; dualKg: number | null; dualLb: number | null } | null;
  speed: { symbol: string; kmh: number; mph: number } | null;
  loadRange: { letter: string; plyRating: number; maxPressurePsi: number | null; maxPressureKpa: number | null; source: string } | null;
}

export type WarningKind = "rim-width" | "poke" | "scrub" | "speedometer" | "regear" | "inner-reach" | "spacer";

/** A warning the numbers call for, with its reason and where its threshold comes from. */
export interface ComparisonWarning {
  kind: WarningKind;
  /** "caution" for things to act on, "note" for things to check. */
  level: "caution" | "note";
  /** Which setup it concerns, when only one. */
  setup: "current" | "planned" | null;
  /** Short statement; `{len}` stands for `lengthMm` in the reader's units (see format.ts `warningTitle`). */
  title: string;
  /** The statement per unit system, where it quotes speeds (format.ts `warningTitle` picks one); else null. */
  titleBySystem: Record<SpeedSystem, string> | null;
  lengthMm: number | null;
  why: string;
  basis: string;
}

/** Everything the comparison screens show. */
export interface ComparisonResult {
  input: ComparisonInput;
  current: SetupFigures;
  planned: SetupFigures;
  changes: {
    diameterMm: number;
    groundClearanceMm: number;
    innerClearanceMm: number;
    outerPokeMm: number;
    scrubRadiusMm: number;
    trackWidthMm: number;
  };
  speedometer: {
    /** D_planned / D_current: actual speed = indicated × ratio. */
    ratio: number;
    /** How far actual speed is above the indicated speed, % of the indicated: (ratio − 1) × 100; negative = below. */
    trueAbovePct: number;
    /** How far the speedometer reads below actual speed, % of the actual: (1 − 1/ratio) × 100; negative = reads high. */
    readsLowPct: number;
    /** The headline speed and the chart rows, at round speeds of each unit system. */
    bySystem: Record<SpeedSystem, { unit: SpeedUnit; headline: SpeedRow; rows: SpeedRow[] }>;
  };
  gearing: {
    axleRatio: number;
    transmissionRatio: number;
    effectiveRatio: number;
    ratioToRestore: number;
    suggestedRatio: number;
    /** null unless both the first-gear and the transfer-case low ratios are entered. */
    crawl: CrawlFigures | null;
    cruise: CruiseRow[];
    /** The chart rows, at round speeds of each unit system. */
    bySystem: Record<SpeedSystem, { unit: SpeedUnit; rows: RpmRow[] }>;
  };
  /** The kingpin inclination entered, or null when none was (the engine then uses 0°). */
  kingpinInclinationDeg: number | null;
  fenderLineMm: number | null;
  /** Tire reach past the fender line (planned, current), mm; null without a fender line. */
  pokePastFenderMm: { current: number; planned: number } | null;
  warnings: ComparisonWarning[];
  /** The engine's raw comparison, for pictures that need more (geometry of both setups). */
  engine: SetupComparison;
}

/** The length placeholder of warning titles; `warningTitle` in format.ts fills it in the user's units. */
export const LENGTH_TOKEN = "{len}";

function figures(s: Setup, g: SetupGeometry): SetupFigures {
  const t = g.tire;
  const dims = tireDimensions(t, { rimWidthIn: s.wheelWidthIn });
  const flange = s.position.mode === "backspacing" ? s.position.flangeIn : DEFAULT_FLANGE_IN;
  // Backspacing of the wheel itself (a spacer moves the wheel, not its backspacing).
  const bsBead = backspacingFromOffset({ widthIn: s.wheelWidthIn, offsetMm: g.wheel.offsetMm, measuredFrom: "bead-seat" });
  const bsFlange = backspacingFromOffset({ widthIn: s.wheelWidthIn, offsetMm: g.wheel.offsetMm, measuredFrom: "flange", flangeIn: flange });
  const load =
    t.loadIndex === null
      ? null
      : (() => {
          const kg = loadIndexKg(t.loadIndex);
          const dualKg = t.dualLoadIndex === null ? null : loadIndexKg(t.dualLoadIndex);
          return { index: t.loadIndex, kg, lb: kgToLb(kg), dualIndex: t.dualLoadIndex, dualKg, dualLb: dualKg === null ? null : kgToLb(dualKg) };
        })();
  const speed = t.speedSymbol === null ? null : (() => {
    const kmh = speedSymbolKmh(t.speedSymbol);
    return { symbol: t.speedSymbol, kmh, mph: kmh / KM_PER_MILE };
  })();
  let loadRange: SetupFigures["loadRange"] = null;
  if (t.loadRange !== null) {
    if (t.system === "numeric") {
      loadRange = { letter: t.loadRange, plyRating: plyRating(t.loadRange), maxPressurePsi: null, maxPressureKpa: null, source: "no figure held for numeric sizes" };
    } else {
      const info = loadRangeInfo(t.loadRange, t.system);
      loadRange = { letter: info.loadRange, plyRating: info.plyRating, maxPressurePsi: info.maxPressurePsi, maxPressureKpa: info.maxPressureKpa, source: info.source };
    }
  }
  return {
    tireTyped: s.tire.trim(),
    tireText: t.text,
    system: t.system,
    wheelDiameterIn: g.wheel.diameterIn,
    wheelWidthIn: g.wheel.widthIn,
    offsetMm: g.wheel.offsetMm,
    spacerMm: g.spacerMm,
    effectiveOffsetMm: g.effectiveOffsetMm,
    backspacingBeadSeatIn: bsBead,
    backspacingFlangeIn: bsFlange,
    flangeAllowanceIn: flange,
    sectionWidthMm: g.sectionWidthMm,
    sidewallMm: g.sidewallMm,
    overallDiameterMm: g.overallDiameterMm,
    circumferenceMm: g.circumferenceMm,
    revsPerMile: g.revsPerMile,
    revsPerKm: dims.revsPerKm,
    rimWidthMm: g.rimWidthMm,
    innerSwingMm: g.innerSwingMm,
    outerSwingMm: g.outerSwingMm,
    beadSeatInboardMm: g.beadSeatInboardMm,
    beadSeatOutboardMm: g.beadSeatOutboardMm,
    measuringRimWidthIn: g.measuringRimWidthIn,
    rimWidthMinIn: g.rimWidthMinIn,
    rimWidthMaxIn: g.rimWidthMaxIn,
    rimWidthSuitable: g.rimWidthSuitable,
    load,
    speed,
    loadRange,
  };
}

function crawlOf(first: number | null, low: number | null, axle: number, suggested: number, dCurrentMm: number, dPlannedMm: number): CrawlFigures | null {
  // Saved comparisons from before these fields existed carry neither (undefined): not entered.
  if (first == null || low == null) return null;
  const ratio = crawlRatio(first, low, axle);
  const regeared = crawlRatio(first, low, suggested);
  const onPlannedTire = effectiveCrawlRatio(ratio, dCurrentMm, dPlannedMm);
  return {
    firstGearRatio: first,
    transferLowRatio: low,
    ratio,
    onPlannedTire,
    changePct: (onPlannedTire / ratio - 1) * 100,
    regeared,
    regearedOnPlannedTire: effectiveCrawlRatio(regeared, dCurrentMm, dPlannedMm),
  };
}

function geometryOf(s: Setup): SetupGeometry {
  return setupGeometry(toEngineSetup(s));
}

function warningsOf(r: Omit<ComparisonResult, "warnings">): ComparisonWarning[] {
  const out: ComparisonWarning[] = [];
  for (const side of ["current", "planned"] as const) {
    const f = r[side];
    if (!f.rimWidthSuitable) {
      const narrow = f.wheelWidthIn < f.rimWidthMinIn;
      out.push({
        kind: "rim-width",
        level: side === "planned" ? "caution" : "note",
        setup: side,
        title: `${side === "planned" ? "Planned" : "Current"} wheel width ${f.wheelWidthIn} in is outside the usual ${f.rimWidthMinIn}–${f.rimWidthMaxIn} in for ${f.tireText}`,
        lengthMm: null,
        titleBySystem: null,
        why: narrow
          ? "On a rim that narrow the tread crowns and the sidewall rolls under load and in corners; the bead is pinched at an angle it was not made for. Check the tire maker's approved rim widths."
          : "On a rim that wide the sidewall is stretched straight, the bead and rim edge are exposed to rocks, and the bead can unseat at low pressure. Check the tire maker's approved rim widths.",
        basis: `Measuring rim ${f.measuringRimWidthIn} in ± 1 in (measuring rim factor from memory of the UN R30/ETRTO rule; the ± 1 in band is common practice, no source).`,
      });
    }
  }
  if (r.pokePastFenderMm !== null) {
    for (const side of ["planned", "current"] as const) {
      const past = r.pokePastFenderMm[side];
      if (past > 0) {
        out.push({
          kind: "poke",
          level: side === "planned" ? "caution" : "note",
          setup: side,
          title: `${side === "planned" ? "Planned" : "Current"} tire reaches ${LENGTH_TOKEN} past the fender line you entered`,
          lengthMm: past,
          titleBySystem: null,
          why: "Tread outside the fender throws stones, mud and water at the body and at other road users, and many places require the tread to be covered. Check the rules where you drive; flares or a different offset bring it back in.",
          basis: "Your fender-line measurement compared with the tire's outer reach from the hub face (the engine's outer swing).",
        });
      }
    }
  }
  const scrub = r.changes.scrubRadiusMm;
  if (scrub > SCRUB_WARN_MM) {
    out.push({
      kind: "scrub",
      level: "caution",
      setup: null,
      title: `Scrub radius grows by ${LENGTH_TOKEN}`,
      lengthMm: scrub,
      titleBySystem: null,
      why:
        "The contact patch moves further from the steering axis: heavier steering, more kickback over bumps and under braking, and more load on wheel bearings, ball joints and the steering box." +
        (r.kingpinInclinationDeg === null ? " Kingpin inclination is not entered, so this is the wheel-plane shift alone." : ""),
      basis: `More than ${SCRUB_WARN_MM} mm (1 in) of increase (common practice, no source).`,
    });
  }
  const sp = r.speedometer;
  const err = sp.trueAbovePct;
  if (Math.abs(err) > SPEEDO_WARN_PCT) {
    const titleOf = (system: SpeedSystem) => {
      const { unit, headline: h } = sp.bySystem[system];
      return `Speedometer ${readingPhrase(sp.ratio)}: at an indicated ${h.indicated} ${unit} you are actually going ${h.actual.toFixed(1)} ${unit} (${trueSpeedPhrase(sp.ratio)})`;
    };
    const titleBySystem = { imperial: titleOf("imperial"), metric: titleOf("metric") };
    out.push({
      kind: "speedometer",
      level: "caution",
      setup: null,
      title: titleBySystem.imperial,
      titleBySystem,
      lengthMm: null,
      why:
        err > 0
          ? "The taller tire covers more ground per turn than the speedometer was set for, so it reads low — you are faster than it shows — and the odometer under-counts. Recalibrate it for the new tire."
          : "The shorter tire covers less ground per turn, so the speedometer reads high and the odometer over-counts. Recalibrate it for the new tire.",
      basis: `Actual speed more than ${SPEEDO_WARN_PCT} % off the indicated one (common practice, no source); both percentages come from the ratio of overall diameters (unloaded).`,
    });
  }
  const g = r.gearing;
  const gap = (g.ratioToRestore / g.axleRatio - 1) * 100;
  if (Math.abs(gap) >= REGEAR_WARN_PCT && g.suggestedRatio !== g.axleRatio) {
    out.push({
      kind: "regear",
      level: "caution",
      setup: null,
      title: `Regear advised: ${g.suggestedRatio.toFixed(2)} comes closest to the engine speeds of ${g.axleRatio.toFixed(2)} on the current tire`,
      lengthMm: null,
      titleBySystem: null,
      why:
        gap > 0
          ? `The taller tire acts like a ${g.effectiveRatio.toFixed(2)} axle: the engine turns slower at the same speed, pulls weaker in top gear and on grades, an automatic hunts between gears and runs hotter.`
          : `The shorter tire acts like a ${g.effectiveRatio.toFixed(2)} axle: the engine turns faster at every road speed.`,
      basis: `Restoring ratio ${g.ratioToRestore.toFixed(2)} is ${Math.abs(gap).toFixed(1)} % from the axle ratio; advised from ${REGEAR_WARN_PCT} % (common practice, no source). Suggested = nearest common ratio.`,
    });
  }
  if (r.changes.innerClearanceMm < 0) {
    out.push({
      kind: "inner-reach",
      level: "note",
      setup: "planned",
      title: `Planned tire reaches ${LENGTH_TOKEN} further inboard`,
      lengthMm: -r.changes.innerClearanceMm,
      titleBySystem: null,
      why: "Check the room to the control arms, leaf springs, frame and sway bar at full lock and full droop and compression.",
      basis: "Inner swing from the hub face, current minus planned (engine).",
    });
  }
  for (const side of ["current", "planned"] as const) {
    if (r[side].spacerMm > 0) {
      out.push({
        kind: "spacer",
        level: "note",
        setup: side,
        title: `${side === "planned" ? "Planned" : "Current"} setup uses a ${LENGTH_TOKEN} spacer`,
        lengthMm: r[side].spacerMm,
        titleBySystem: null,
        why: "Use hub-centric spacers rated for the vehicle, follow the spacer maker's fitting instructions and torque, and re-check the nuts after the first run. Spacers also add leverage on the wheel bearings.",
        basis: "Common practice, no source; the spacer and wheel makers' instructions win.",
      });
    }
  }
  return out;
}

/**
 * Computes every figure of a comparison from a valid input (see `comparisonInputSchema`).
 * Throws FitmentInputError only when given an input the schema rejects.
 *
 * @example
 * const r = computeComparison(DEFAULT_INPUT);
 * r.changes.diameterMm; // 137 (37 in = 939.8 mm vs 802.8 mm)
 */
export function computeComparison(input: ComparisonInput): ComparisonResult {
  const cur = geometryOf(input.current);
  const pla = geometryOf(input.planned);
  const v = input.vehicle;
  // One engine call for every speed: the imperial rows, the metric rows (converted to mph for
  // the engine only), then the cruise speeds as stored. Rows are read back by position.
  const offset: Record<SpeedSystem, number> = { imperial: 0, metric: REFERENCE_SPEEDS.imperial.length };
  const engineSpeeds = [...REFERENCE_SPEEDS.imperial.map((x) => toMph(x, "imperial")), ...REFERENCE_SPEEDS.metric.map((x) => toMph(x, "metric"))];
  const c = compareSetups(cur, pla, {
    kingpinInclinationDeg: v.kingpinInclinationDeg ?? undefined,
    axleRatio: v.axleRatio,
    transmissionRatio: v.transmissionRatio,
    speedsMph: [...engineSpeeds, ...v.cruiseSpeedsMph],
  });
  const ratio = c.speedometer.ratio;
  const rpmAt = (i: number) => {
    const e = c.gearing.rpmAt[i]!;
    return { currentRpm: e.currentRpm, plannedRpm: e.plannedRpm, regearedRpm: e.regearedRpm };
  };
  const gearingOf = (system: SpeedSystem) => ({ unit: SPEED_UNIT[system], rows: REFERENCE_SPEEDS[system].map((speed, i) => ({ speed, ...rpmAt(offset[system] + i) })) });
  // Actual = indicated × ratio in the same unit: nothing converted between the systems.
  const speedOf = (system: SpeedSystem) => {
    const h = HEADLINE_SPEED[system];
    return { unit: SPEED_UNIT[system], headline: { indicated: h, actual: h * ratio }, rows: REFERENCE_SPEEDS[system].map((x) => ({ indicated: x, actual: x * ratio })) };
  };
  const cruise: CruiseRow[] = v.cruiseSpeedsMph.map((mph, i) => ({ mph, entered: enteredSpeed(mph), ...rpmAt(engineSpeeds.length + i) }));
  const current = figures(input.current, cur);
  const planned = figures(input.planned, pla);
  const base: Omit<ComparisonResult, "warnings"> = {
    input,
    current,
    planned,
    changes: {
      diameterMm: c.diameterChangeMm,
      groundClearanceMm: c.groundClearanceChangeMm,
      innerClearanceMm: c.innerClearanceChangeMm,
      outerPokeMm: c.outerPokeChangeMm,
      scrubRadiusMm: c.scrubRadiusChangeMm,
      trackWidthMm: c.trackWidthChangeMm,
    },
    speedometer: { ratio, ...speedometerPercents(ratio), bySystem: { imperial: speedOf("imperial"), metric: speedOf("metric") } },
    gearing: {
      axleRatio: c.gearing.axleRatio,
      transmissionRatio: c.gearing.transmissionRatio,
      effectiveRatio: c.gearing.effectiveRatio,
      ratioToRestore: c.gearing.ratioToRestore,
      suggestedRatio: c.gearing.suggestedRatio,
      crawl: crawlOf(v.firstGearRatio, v.transferLowRatio, c.gearing.axleRatio, c.gearing.suggestedRatio, current.overallDiameterMm, planned.overallDiameterMm),
      cruise,
      bySystem: { imperial: gearingOf("imperial"), metric: gearingOf("metric") },
    },
    kingpinInclinationDeg: v.kingpinInclinationDeg,
    fenderLineMm: v.fenderLineMm,
    pokePastFenderMm: v.fenderLineMm === null ? null : { current: current.outerSwingMm - v.fenderLineMm, planned: planned.outerSwingMm - v.fenderLineMm },
    engine: c,
  };
  return { ...base, warnings: warningsOf(base) };
}
