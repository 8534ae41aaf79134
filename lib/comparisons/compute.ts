/**
 * One function from a valid comparison input to everything the comparison screens show: per
 * setup figures, the headline changes, the speedometer and engine-speed tables, and warnings.
 * Every number comes from the engine (lib/fitment); this module only picks and pairs. Judging
 * the change is assessChange's (assess/assessChange.ts, thresholds in assess/thresholds.ts); the
 * workspace's words for its findings are in warnings.ts.
 * Speed rows come once per unit system at round speeds of that unit (see speedometer.ts).
 */
import { DEFAULT_FLANGE_IN, backspacingFromOffset } from "@/lib/fitment/offset";
import { KM_PER_MILE, kgToLb } from "@/lib/fitment/units";
import { compareSetups, crawlRatio, effectiveCrawlRatio, type SetupComparison } from "@/lib/fitment/compare";
import { loadIndexKg, speedSymbolKmh } from "@/lib/fitment/loadSpeed";
import { loadRangeInfo, plyRating } from "@/lib/fitment/loadRange";
import { setupGeometry, type SetupGeometry } from "@/lib/fitment/geometry";
import { tireDimensions, type TireDimensions } from "@/lib/fitment/dimensions";
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
  speedometerPercents,
  toMph,
} from "./speedometer";
import { assessChange } from "./assess/assessChange";
import { type ComparisonWarning, workspaceWarnings } from "./warnings";

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

/**
 * Figures of one setup, as the detail table shows them; the tire's own dimensions (section width
 * to revolutions per km, and the measuring rim) are the engine's, for the rim the setup has.
 */
export interface SetupFigures extends Omit<TireDimensions, "rimWidthIn"> {
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
  rimWidthMm: number;
  innerSwingMm: number;
  outerSwingMm: number;
  beadSeatInboardMm: number;
  beadSeatOutboardMm: number;
  rimWidthMinIn: number;
  rimWidthMaxIn: number;
  rimWidthSuitable: boolean;
  load: { index: number; kg: number; lb: number; dualIndex: number | null; dualKg: number | null; dualLb: number | null } | null;
  speed: { symbol: string; kmh: number; mph: number } | null;
  loadRange: { letter: string; plyRating: number; maxPressurePsi: number | null; maxPressureKpa: number | null; source: string } | null;
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
  /** The engine's ratios (its per-speed rows are regrouped below). */
  gearing: Omit<SetupComparison["gearing"], "rpmAt"> & {
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
          return {
            index: t.loadIndex,
            kg,
            lb: kgToLb(kg),
            dualIndex: t.dualLoadIndex,
            dualKg,
            dualLb: dualKg === null ? null : kgToLb(dualKg),
          };
        })();
  const speed =
    t.speedSymbol === null
      ? null
      : (() => {
          const kmh = speedSymbolKmh(t.speedSymbol);
          return { symbol: t.speedSymbol, kmh, mph: kmh / KM_PER_MILE };
        })();
  let loadRange: SetupFigures["loadRange"] = null;
  if (t.loadRange !== null) {
    if (t.system === "numeric") {
      loadRange = {
        letter: t.loadRange,
        plyRating: plyRating(t.loadRange),
        maxPressurePsi: null,
        maxPressureKpa: null,
        source: "no figure held for numeric sizes",
      };
    } else {
      const info = loadRangeInfo(t.loadRange, t.system);
      loadRange = {
        letter: info.loadRange,
        plyRating: info.plyRating,
        maxPressurePsi: info.maxPressurePsi,
        maxPressureKpa: info.maxPressureKpa,
        source: info.source,
      };
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

function crawlOf(
  first: number | null,
  low: number | null,
  axle: number,
  suggested: number,
  dCurrentMm: number,
  dPlannedMm: number,
): CrawlFigures | null {
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
  const engineSpeeds = [
    ...REFERENCE_SPEEDS.imperial.map((x) => toMph(x, "imperial")),
    ...REFERENCE_SPEEDS.metric.map((x) => toMph(x, "metric")),
  ];
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
  const gearingOf = (system: SpeedSystem) => ({
    unit: SPEED_UNIT[system],
    rows: REFERENCE_SPEEDS[system].map((speed, i) => ({ speed, ...rpmAt(offset[system] + i) })),
  });
  // Actual = indicated × ratio in the same unit: nothing converted between the systems.
  const speedOf = (system: SpeedSystem) => {
    const h = HEADLINE_SPEED[system];
    return {
      unit: SPEED_UNIT[system],
      headline: { indicated: h, actual: h * ratio },
      rows: REFERENCE_SPEEDS[system].map((x) => ({ indicated: x, actual: x * ratio })),
    };
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
      crawl: crawlOf(
        v.firstGearRatio,
        v.transferLowRatio,
        c.gearing.axleRatio,
        c.gearing.suggestedRatio,
        current.overallDiameterMm,
        planned.overallDiameterMm,
      ),
      cruise,
      bySystem: { imperial: gearingOf("imperial"), metric: gearingOf("metric") },
    },
    kingpinInclinationDeg: v.kingpinInclinationDeg,
    fenderLineMm: v.fenderLineMm,
    pokePastFenderMm:
      v.fenderLineMm === null ? null : { current: current.outerSwingMm - v.fenderLineMm, planned: planned.outerSwingMm - v.fenderLineMm },
    engine: c,
  };
  return { ...base, warnings: workspaceWarnings(assessChange(c, { fenderLineMm: v.fenderLineMm }), base) };
}
