/**
 * Comparison of a current and a planned setup: clearance, poke, scrub, track, speedometer, gearing.
 *
 * - diameter change ΔD = D_planned − D_current; ground clearance under the axle changes by ΔD/2.
 * - inner clearance change = inner swing (current) − inner swing (planned): positive = more room.
 * - outer poke change = outer swing (planned) − outer swing (current).
 * - wheel-plane shift outboard s = effective offset (current) − effective offset (planned);
 *   track width per axle changes by 2s.
 * - scrub radius change (zero camber) = s − Δr · tan(KPI), Δr = ΔD/2: a taller tire lowers the
 *   ground line, where the inclined steering axis meets it further outboard (common geometry,
 *   no source). KPI defaults to 0°, i.e. no vehicle value is assumed: pass the vehicle's figure.
 * - speedometer (calibrated on the current tire): actual = indicated × D_planned / D_current.
 * - gearing: effective ratio with the planned tire = axle × D_current / D_planned; ratio to
 *   restore the current engine speed = axle × D_planned / D_current; suggested = nearest of the
 *   common ring-and-pinion ratios.
 * - engine speed RPM = mph · axle · transmission · 336.135 / D(in) (handbook formula;
 *   336.135 ≈ 63 360 in/mile ÷ 60 min/h ÷ π). Tire slip and loaded radius are ignored.
 * - brake torque ratio = r_planned / r_current: the same stop needs the same force at the ground,
 *   and torque = force × radius (Newton). The radius is the one used throughout this comparison,
 *   half the nominal overall diameter (ISO 4000-1 D = d + 2H, or the flotation D); the loaded
 *   radius and the extra torque to slow a heavier wheel are not in this ratio.
 * - rotating mass per corner (when wheel and tire masses are given): the change in kg, and the
 *   moment of inertia by an approximation (no source): the tire a uniform annulus from the bead
 *   seat radius r_b = d/2 to the tread radius R, I = ½·m·(r_b² + R²); the wheel a thin ring at
 *   r_b, I = m·r_b² (an upper bound: real wheels carry part of their mass in the centre).
 *   Equivalent translating mass I / R² (rolling without slip): what the spin adds to the mass the
 *   brakes and engine must slow and speed up.
 */
import { FitmentInputError, requireNumber, requireObject } from "./errors";
import { type SetupGeometry, type SetupInput, setupGeometry } from "./geometry";
import { MM_PER_IN } from "./units";

/** Handbook constant of the RPM formula. */
export const RPM_CONSTANT = 336.135;
/** Common ring-and-pinion ratios (common practice, no source). */
export const COMMON_AXLE_RATIOS: readonly number[] = Object.freeze([
  2.73, 3.08, 3.21, 3.42, 3.55, 3.73, 3.92, 4.1, 4.3, 4.56, 4.88, 5.13, 5.29, 5.38, 5.71, 6.17, 6.5, 7.17,
]);
/** Default speeds of the speedometer and RPM tables, mph. */
export const DEFAULT_SPEEDS_MPH: readonly number[] = Object.freeze([45, 55, 60, 65, 70, 75]);
// Private unfrozen copies for the hot path: V8 reads elements of frozen arrays markedly slower.
// They are never handed out, so nothing outside can change them.
const RATIOS_HOT: readonly number[] = COMMON_AXLE_RATIOS.slice();
const SPEEDS_HOT: readonly number[] = DEFAULT_SPEEDS_MPH.slice();
/** Default axle ratio when none is given (a typical factory ratio; common practice, no source). */
export const DEFAULT_AXLE_RATIO = 3.73;
/** Default transmission ratio: top gear direct (1.0). */
export const DEFAULT_TRANSMISSION_RATIO = 1.0;
/** Default kingpin inclination: 0° (no vehicle value assumed). */
export const DEFAULT_KPI_DEG = 0;

/** Mass of one wheel and one tire, kg. */
export interface CornerMass {
  wheelKg: number;
  tireKg: number;
}

/** Options of {@link compareSetups}. */
export interface CompareOptions {
  kingpinInclinationDeg?: number;
  axleRatio?: number;
  transmissionRatio?: number;
  speedsMph?: readonly number[];
  commonRatios?: readonly number[];
  /** Wheel and tire masses of each setup; gives `rotatingMass` in the result. */
  rotatingMass?: { current: CornerMass; planned: CornerMass };
}

/** Accepted masses of one wheel and one tire, kg. */
export const CORNER_MASS_LIMITS_KG = Object.freeze({ wheel: { min: 0, max: 150 }, tire: { min: 1, max: 200 } });

/** Change of rotating mass per corner (see the module comment for the approximation). */
export interface RotatingMassComparison {
  /** Wheel + tire, kg. */
  currentKg: number;
  plannedKg: number;
  changeKg: number;
  /** Moment of inertia about the axle, kg·m² (approximation). */
  currentInertiaKgM2: number;
  plannedInertiaKgM2: number;
  inertiaRatio: number;
  /** I / R²: mass the spin adds to the vehicle's when slowing or speeding up, kg. */
  currentEquivalentMassKg: number;
  plannedEquivalentMassKg: number;
  /** How the inertia was estimated. */
  approximation: string;
}

/** A setup given as input, or its already computed geometry. */
export type SetupLike = SetupInput | SetupGeometry;

/** Result of {@link compareSetups}. */
export interface SetupComparison {
  current: SetupGeometry;
  planned: SetupGeometry;
  diameterChangeMm: number;
  groundClearanceChangeMm: number;
  innerClearanceChangeMm: number;
  outerPokeChangeMm: number;
  scrubRadiusChangeMm: number;
  trackWidthChangeMm: number;
  speedometer: { ratio: number; rows: { indicatedMph: number; actualMph: number }[] };
  /** Brake torque the same stop needs with the planned tire ÷ with the current one (radius ratio). */
  brakeTorqueRatio: number;
  /** Null unless `options.rotatingMass` is given. */
  rotatingMass: RotatingMassComparison | null;
  gearing: {
    axleRatio: number;
    transmissionRatio: number;
    effectiveRatio: number;
    ratioToRestore: number;
    suggestedRatio: number;
    rpmAt: { mph: number; currentRpm: number; plannedRpm: number; regearedRpm: number }[];
  };
  kingpinInclinationDeg: number;
}

/**
 * Engine speed at a road speed: RPM = mph · axle · transmission · 336.135 / D(in).
 *
 * @example
 * engineRpm(50, 6.66, 1, 37.5); // ≈ 2985
 */
export function engineRpm(mph: number, axleRatio: number, transmissionRatio: number, tireDiameterIn: number): number {
  requireNumber("mph", mph, 0, 250, "60", "mph");
  requireNumber("axleRatio", axleRatio, 1, 10, "4.10");
  requireNumber("transmissionRatio", transmissionRatio, 0.3, 10, "1.0");
  requireNumber("tireDiameterIn", tireDiameterIn, 10, 80, "35", "in");
  return (mph * axleRatio * transmissionRatio * RPM_CONSTANT) / tireDiameterIn;
}

/**
 * Crawl ratio: the overall reduction from the engine to the wheels in first gear and low range,
 * first gear × transfer-case low × axle ratio (the usual off-road handbook definition; common
 * practice, no written source named). Higher crawls slower and climbs with less throttle.
 *
 * @example
 * crawlRatio(4.03, 2.72, 3.73); // ≈ 40.89 (40.888…)
 */
export function crawlRatio(firstGearRatio: number, transferLowRatio: number, axleRatio: number): number {
  requireNumber("firstGearRatio", firstGearRatio, 1, 10, "4.03");
  requireNumber("transferLowRatio", transferLowRatio, 1, 10, "2.72");
  requireNumber("axleRatio", axleRatio, 1, 10, "4.10");
  return firstGearRatio * transferLowRatio * axleRatio;
}

/**
 * The crawl ratio a taller (or shorter) tire makes the drivetrain act like: the wheel covers
 * more ground per turn, so the reduction at the ground shrinks by the ratio of overall
 * diameters, crawl × D_current / D_planned (same derivation as the effective axle ratio;
 * common practice, no written source named).
 *
 * @example
 * effectiveCrawlRatio(40.89, 802.8, 939.8); // ≈ 34.93 (a 265/70R17 → 37 in tire)
 */
export function effectiveCrawlRatio(crawl: number, currentDiameterMm: number, plannedDiameterMm: number): number {
  requireNumber("crawl", crawl, 1, 1000, "40");
  requireNumber("currentDiameterMm", currentDiameterMm, 250, 2000, "802.8", "mm");
  requireNumber("plannedDiameterMm", plannedDiameterMm, 250, 2000, "939.8", "mm");
  return (crawl * currentDiameterMm) / plannedDiameterMm;
}

function isGeometry(s: SetupLike): s is SetupGeometry {
  return typeof (s as SetupGeometry).innerSwingMm === "number" && typeof (s as SetupGeometry).tire === "object";
}

function checkList(field: string, list: unknown, min: number, max: number, example: string): readonly number[] {
  if (!Array.isArray(list) || list.length === 0 || list.length > 100) {
    throw new FitmentInputError(field, `${field} must be a list of 1–100 numbers (e.g. ${example})`, list);
  }
  for (let i = 0; i < list.length; i++) requireNumber(`${field}[${i}]`, list[i], min, max, example);
  return list as readonly number[];
}

const zero = (x: number): number => (x === 0 ? 0 : x);

const ROTATING_APPROXIMATION =
  "approximation, no source: tire a uniform annulus from the bead seat to the tread, I = ½·m·(r_b² + R²); wheel a thin ring at the bead seat, I = m·r_b² (an upper bound)";

function cornerMass(field: string, value: unknown): CornerMass {
  const v = requireObject(field, value as Partial<CornerMass>, "{ wheelKg: 20, tireKg: 36 } (one wheel and one tire)");
  const L = CORNER_MASS_LIMITS_KG;
  return {
    wheelKg: requireNumber(`${field}.wheelKg`, v.wheelKg, L.wheel.min, L.wheel.max, "20", "kg"),
    tireKg: requireNumber(`${field}.tireKg`, v.tireKg, L.tire.min, L.tire.max, "36", "kg"),
  };
}

/** Moment of inertia of one wheel and tire, kg·m² (approximation: see the module comment). */
function cornerInertia(m: CornerMass, g: SetupGeometry): number {
  const rb = (g.tire.rimDiameterIn * MM_PER_IN) / 2000;
  const R = g.overallRadiusMm / 1000;
  return 0.5 * m.tireKg * (rb * rb + R * R) + m.wheelKg * rb * rb;
}

function compareRotating(option: CompareOptions["rotatingMass"], cur: SetupGeometry, pla: SetupGeometry): RotatingMassComparison | null {
  if (option === undefined) return null;
  requireObject("rotatingMass", option, "{ current: { wheelKg: 12, tireKg: 22 }, planned: { wheelKg: 20, tireKg: 36 } }");
  const mc = cornerMass("rotatingMass.current", option.current);
  const mp = cornerMass("rotatingMass.planned", option.planned);
  const ic = cornerInertia(mc, cur);
  const ip = cornerInertia(mp, pla);
  const rc = cur.overallRadiusMm / 1000;
  const rp = pla.overallRadiusMm / 1000;
  const currentKg = mc.wheelKg + mc.tireKg;
  const plannedKg = mp.wheelKg + mp.tireKg;
  return {
    currentKg,
    plannedKg,
    changeKg: zero(plannedKg - currentKg),
    currentInertiaKgM2: ic,
    plannedInertiaKgM2: ip,
    inertiaRatio: ip / ic,
    currentEquivalentMassKg: ic / (rc * rc),
    plannedEquivalentMassKg: ip / (rp * rp),
    approximation: ROTATING_APPROXIMATION,
  };
}

/**
 * Compares a current and a planned setup (tire + wheel + optional spacer).
 * Accepts raw inputs or precomputed {@link SetupGeometry} objects.
 *
 * @example
 * const c = compareSetups(
 *   { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } },
 *   { tire: "35x12.50R17LT", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } },
 *   { axleRatio: 3.73 },
 * );
 * c.diameterChangeMm;        // 86.2
 * c.gearing.suggestedRatio;  // 4.1
 * c.brakeTorqueRatio;        // 889 / 802.8 ≈ 1.107
 * // the same two setups with the mass of one wheel and one tire each:
 * // { rotatingMass: { current: { wheelKg: 12, tireKg: 22 }, planned: { wheelKg: 20, tireKg: 36 } } }
 * // → rotatingMass.changeKg 22, inertiaRatio ≈ 1.87
 */
export function compareSetups(current: SetupLike, planned: SetupLike, options: CompareOptions = {}): SetupComparison {
  const cur = isGeometry(current) ? current : setupGeometry(current);
  const pla = isGeometry(planned) ? planned : setupGeometry(planned);
  const kpi =
    options.kingpinInclinationDeg === undefined
      ? DEFAULT_KPI_DEG
      : requireNumber("kingpinInclinationDeg", options.kingpinInclinationDeg, 0, 30, "8", "°");
  const axle = options.axleRatio === undefined ? DEFAULT_AXLE_RATIO : requireNumber("axleRatio", options.axleRatio, 1, 10, "4.10");
  const trans =
    options.transmissionRatio === undefined
      ? DEFAULT_TRANSMISSION_RATIO
      : requireNumber("transmissionRatio", options.transmissionRatio, 0.3, 10, "1.0");
  const speeds = options.speedsMph === undefined ? SPEEDS_HOT : checkList("speedsMph", options.speedsMph, 0, 250, "[55, 65]");
  const ratios = options.commonRatios === undefined ? RATIOS_HOT : checkList("commonRatios", options.commonRatios, 1, 10, "[3.73, 4.10]");

  const dCur = cur.overallDiameterMm;
  const dPla = pla.overallDiameterMm;
  const dD = dPla - dCur;
  const shift = cur.effectiveOffsetMm - pla.effectiveOffsetMm;
  const scrub = kpi === 0 ? shift : shift - (dD / 2) * Math.tan((kpi * Math.PI) / 180);
  const ratio = dPla / dCur;

  const speedRows: { indicatedMph: number; actualMph: number }[] = [];
  const rpmRows: { mph: number; currentRpm: number; plannedRpm: number; regearedRpm: number }[] = [];
  const restore = axle * ratio;
  let suggested = ratios[0] as number;
  let best = Math.abs(suggested - restore);
  for (let i = 1; i < ratios.length; i++) {
    const r = ratios[i] as number;
    const d = Math.abs(r - restore);
    if (d < best) {
      best = d;
      suggested = r;
    }
  }
  const k = trans * RPM_CONSTANT * MM_PER_IN;
  const kCur = (axle * k) / dCur;
  const kPla = (axle * k) / dPla;
  const kReg = (suggested * k) / dPla;
  for (let i = 0; i < speeds.length; i++) {
    const mph = speeds[i] as number;
    speedRows.push({ indicatedMph: mph, actualMph: mph * ratio });
    rpmRows.push({ mph, currentRpm: mph * kCur, plannedRpm: mph * kPla, regearedRpm: mph * kReg });
  }
  return {
    current: cur,
    planned: pla,
    diameterChangeMm: zero(dD),
    groundClearanceChangeMm: zero(dD / 2),
    innerClearanceChangeMm: zero(cur.innerSwingMm - pla.innerSwingMm),
    outerPokeChangeMm: zero(pla.outerSwingMm - cur.outerSwingMm),
    scrubRadiusChangeMm: zero(scrub),
    trackWidthChangeMm: zero(2 * shift),
    speedometer: { ratio, rows: speedRows },
    brakeTorqueRatio: ratio,
    rotatingMass: compareRotating(options.rotatingMass, cur, pla),
    gearing: {
      axleRatio: axle,
      transmissionRatio: trans,
      effectiveRatio: axle / ratio,
      ratioToRestore: restore,
      suggestedRatio: suggested,
      rpmAt: rpmRows,
    },
    kingpinInclinationDeg: kpi,
  };
}
