/**
 * Predicted clearances: a gap measured on the vehicle with one setup, carried over to another.
 *
 * ## The model (plane geometry; common practice, no source, unless marked)
 *
 * The tire is a solid of revolution about the axle with a **rectangular cross-section**: radius
 * R = D/2 (ISO 4000-1: D = d + 2H), reaching `innerSwingMm` inboard and `outerSwingMm` outboard of
 * the hub mounting face (section width on the actual rim, UN R30 §6.1.1.1 K = 0.4; see
 * geometry.ts). Shoulders are square: the tread is taken the full section width (real shoulders
 * are rounder, and lugs differ by make). A tire swap does not move the axle relative to the body
 * (springs, bump stops and steering stops are unchanged), so every part stays where it was and the
 * tire's surfaces move around it. Each measured gap locates its part relative to the measured
 * tire; the planned gap is the distance from that place to the planned tire. Per direction and
 * suspension state:
 *
 * - **upward** (fender, liner), any state: the tread rises by the radius change,
 *   gap − (R′ − R). At full stuff the gap was measured at the bump stop, so the travel is in the
 *   measurement and a swap leaves it unchanged; steering turns the tire about a (near) vertical
 *   axis, which changes no heights. Basis `"radius"`.
 * - **inboard / outboard**, ride height and full stuff (frame, control arm, spring; fender lip,
 *   flare): with the part's height given, the part sits beside the sidewall (|z| ≤ R) or above the
 *   tread corner, and the planned gap is its exact distance to the planned cross-section
 *   (`"reach"` / `"corner"`): beside the sidewall the gap moves by the reach change only — offset
 *   (or backspacing) plus half the section change — while a part over the corner also sees the
 *   tread rise. Without the height, the part may be anywhere beside the sidewall or on the arc of
 *   radius = gap around the shoulder corner up to 45° above horizontal (any steeper and it would
 *   have been recorded as an upward point), and the prediction takes the **worst** of these
 *   places (`"shoulder"`): a taller tire's corner rises toward a fender lip or an upper control arm
 *   that overhangs it.
 * - **fore/aft** with the wheel straight (ride height, full stuff): without a height, the gap is
 *   the shortest distance to the tread along the radius toward the part, which moves by exactly
 *   −(R′ − R) whatever the part's angle (`"radial"`); with the height z given, the gap is taken
 *   level at that height, where the tread's leading edge is √(R² − z²) ahead of the axle, so the
 *   gap moves by −(√(R′² − z²) − √(R² − z²)) — more than the radius change off hub height
 *   (`"chord"`).
 * - **full lock** (bumper corner, frame at lock, sway bar): the tire turns about the steering
 *   axis, here a vertical line `steeringAxisInboardMm` (d) inboard of the hub face at the wheel
 *   centre (see {@link steeringAxisInboardMm}). In plan view at the part's height z (default hub
 *   height) the tread is a rectangle 2·√(R² − z²) long, and each of its corners sweeps a circle
 *   about the axis: the outer corners at √(R² − z² + (outer + d)²), the inner at
 *   √(R² − z² + (inner − d)²). The gap changes by minus the change of that sweep radius — the
 *   inner corner for an inboard part (`"sweep-inner"`), the outer for an outboard part
 *   (`"sweep-outer"`), the farther of the two for a fore/aft part (`"sweep-farthest"`). Upward at
 *   lock: `"radius"` as above. Milliken & Milliken, *Race Car Vehicle Dynamics* ch. 19 (steering
 *   axis, kingpin inclination, scrub) for the axis terms — from memory; the sweep itself is plain
 *   plane geometry (a point turning about an axis keeps its distance to it).
 *
 * ## Limits (say them wherever the figures are shown)
 *
 * - The sweep radius is the corner's farthest reach at any steering angle; at the real lock angle
 *   the part may meet a point nearer the axis, so full-lock figures lean conservative.
 * - Caster and kingpin inclination tilt the steering axis; it is taken vertical at the wheel
 *   centre. Suspension travel at lock (turning over a bump) is not modelled.
 * - The part's height is not recorded by the garage, so hub height is assumed for full-lock and
 *   fore/aft points (where a part higher or lower closes faster) and the worst place on the
 *   shoulder for lateral points.
 * - Shoulders are square, sidewalls flat; lugs, bulge under load and tire growth with speed are
 *   ignored; the loaded radius is taken as the unloaded one.
 *
 * Each predicted gap is classed against a margin: **contact** at 0 mm or less, **tight** below
 * the margin, **clear** otherwise. Default margin 1/2 in = 12.7 mm (common practice, no source).
 */
import type { SetupComparison, SetupLike } from "./compare";
import { FitmentInputError, requireNumber } from "./errors";
import {
  CLEARANCE_DIRECTIONS,
  SUSPENSION_STATES,
  DEFAULT_CLEARANCE_MARGIN_MM,
  CLEARANCE_MARGIN_LIMITS_MM,
  CLEARANCE_DISTANCE_LIMITS_MM,
  CLEARANCE_HEIGHT_LIMITS_MM,
  STEERING_AXIS_LIMITS_MM,
  clearanceEnvelope,
  geometryOf,
  zero,
  type ClearanceDirection,
  type SuspensionState,
  type ClearanceStatus,
  type ClearanceBasis,
  type ClearanceEnvelope,
} from "./clearanceGeometry";
// The vocabulary, ranges, envelope and steering axis live in clearanceGeometry.ts (light enough for
// the drawing's first load); this module is still where the rest of the app imports them from.
export * from "./clearanceGeometry";

/** Steepest angle above horizontal at which a lateral part may sit over the shoulder corner. */
const SHOULDER_ARC_RAD = Math.PI / 4;

/** A gap measured on the vehicle, and the setup fitted when it was measured. */
export interface MeasuredClearance {
  direction: ClearanceDirection;
  distanceMm: number;
  measuredWith: SetupLike;
  /** Suspension and steering when measured; default `"ride-height"`. */
  state?: SuspensionState;
  /**
   * Height of the part above (+) or below (−) the wheel centre, mm, where known. Used by lateral,
   * fore/aft and full-lock points (not upward ones); left out, see the module comment.
   */
  heightMm?: number;
  /** A name for the point (e.g. "Bumper corner"), passed back in finder exclusions. */
  label?: string;
}

/** Options of the predictions. */
export interface ClearanceOptions {
  /** Margin to class against, mm (default 12.7). */
  marginMm?: number;
  /**
   * Steering axis at the wheel centre, mm inboard of the hub face (see
   * {@link steeringAxisInboardMm}). Default: through each point's measured tire centre line
   * (zero scrub, 0° kingpin inclination).
   */
  steeringAxisInboardMm?: number;
}

/** Result of {@link predictClearance}. */
export interface ClearancePrediction {
  direction: ClearanceDirection;
  state: SuspensionState;
  measuredMm: number;
  /** Change of the gap, mm (predicted − measured): positive = more room. */
  changeMm: number;
  predictedMm: number;
  status: ClearanceStatus;
  marginMm: number;
  /** Material to gain (trim, lift, wheel change) to get back to the margin, mm; 0 when clear. */
  shortfallMm: number;
  /** Which geometry decided the figure. */
  basis: ClearanceBasis;
}

/**
 * A measured point checked and reduced to plain numbers once, so that many planned setups (the
 * finder) can be predicted cheaply by {@link predictPreparedMm}. Structured-clone safe.
 */
export interface PreparedClearance {
  direction: ClearanceDirection;
  state: SuspensionState;
  gapMm: number;
  heightMm: number | null;
  label: string | null;
  basis: ClearanceBasis;
  measured: ClearanceEnvelope;
  axisMm: number;
  /** Full-lock points: the measured tire's sweep radius about the steering axis (else 0). */
  measuredSweepMm: number;
}

/** One of a fixed list of words, else FitmentInputError naming the field, the list and an example. */
function checkChoice<T extends string>(choices: readonly T[], value: unknown, field: string, example: T): T {
  if (!choices.includes(value as T)) {
    throw new FitmentInputError(
      field,
      `${field} must be one of ${choices.join(", ")}, got ${JSON.stringify(value)} (e.g. "${example}")`,
      value,
    );
  }
  return value as T;
}

function checkDirection(direction: unknown, field = "direction"): ClearanceDirection {
  return checkChoice(CLEARANCE_DIRECTIONS, direction, field, "inboard");
}

function checkState(state: unknown, field = "state"): SuspensionState {
  if (state === undefined) return "ride-height";
  return checkChoice(SUSPENSION_STATES, state, field, "full-lock");
}

function checkMargin(marginMm: unknown, field = "marginMm"): number {
  return requireNumber(field, marginMm, CLEARANCE_MARGIN_LIMITS_MM.min, CLEARANCE_MARGIN_LIMITS_MM.max, "12.7", "mm");
}

/**
 * Classes a predicted gap: contact at ≤ 0 mm, tight below the margin, clear otherwise.
 *
 * @example
 * classifyClearance(-3, 12.7);  // "contact"
 * classifyClearance(5, 12.7);   // "tight"
 * classifyClearance(12.7, 12.7); // "clear"
 */
export function classifyClearance(predictedMm: number, marginMm: number = DEFAULT_CLEARANCE_MARGIN_MM): ClearanceStatus {
  if (typeof predictedMm !== "number" || !Number.isFinite(predictedMm)) {
    throw new FitmentInputError(
      "predictedMm",
      `predictedMm must be a finite number of mm, got ${String(predictedMm)} (e.g. 8)`,
      predictedMm,
    );
  }
  const m = checkMargin(marginMm);
  if (predictedMm <= 0) return "contact";
  return predictedMm < m ? "tight" : "clear";
}

/**
 * The first-order change of a gap along its direction, for a part at hub height beside, above or
 * ahead of the tire with the wheel straight (+ = more room): inner reach change, −poke change,
 * −ΔR. A quick figure for a comparison; {@link predictClearance} applies the full geometry (state,
 * height, shoulder, steering sweep) and is what the product shows.
 *
 * @example
 * const c = compareSetups(
 *   { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } },
 *   { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } },
 * );
 * clearanceChangeMm("upward", c);  // -35 (radius grows 35 mm)
 * clearanceChangeMm("inboard", c); // ≈ 14.54 (the tire moves outboard)
 */
export function clearanceChangeMm(direction: ClearanceDirection, comparison: SetupComparison): number {
  const d = checkDirection(direction);
  switch (d) {
    case "inboard":
      return comparison.innerClearanceChangeMm;
    case "outboard":
      return zero(-comparison.outerPokeChangeMm);
    case "upward":
    case "fore-aft":
      return zero(-comparison.groundClearanceChangeMm);
  }
}

function basisOf(direction: ClearanceDirection, state: SuspensionState, heightMm: number | null, radiusMm: number): ClearanceBasis {
  if (direction === "upward") return "radius";
  if (state === "full-lock") return direction === "inboard" ? "sweep-inner" : direction === "outboard" ? "sweep-outer" : "sweep-farthest";
  if (direction === "fore-aft") return heightMm === null ? "radial" : "chord";
  if (heightMm === null) return "shoulder";
  return Math.abs(heightMm) > radiusMm ? "corner" : "reach";
}

/**
 * Checks one measured point and reduces it to numbers (see {@link PreparedClearance}). `field`
 * prefixes the names in error messages (e.g. `"clearancePoints[2]"`).
 *
 * @example
 * prepareClearance({ direction: "fore-aft", state: "full-lock", distanceMm: 38.1, measuredWith: { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } } });
 * // { basis: "sweep-farthest", axisMm: 25, gapMm: 38.1, … }
 */
export function prepareClearance(
  point: MeasuredClearance,
  options: { steeringAxisInboardMm?: number } = {},
  field = "",
): PreparedClearance {
  const f = (name: string) => (field ? `${field}.${name}` : name);
  if (point === null || typeof point !== "object") {
    throw new FitmentInputError(
      field || "point",
      'point must be an object like { direction: "inboard", distanceMm: 30, measuredWith: {…} }',
      point,
    );
  }
  const direction = checkDirection(point.direction, f("direction"));
  const state = checkState(point.state, f("state"));
  const gap = requireNumber(
    f("distanceMm"),
    point.distanceMm,
    CLEARANCE_DISTANCE_LIMITS_MM.min,
    CLEARANCE_DISTANCE_LIMITS_MM.max,
    "30",
    "mm",
  );
  const g = geometryOf(point.measuredWith);
  const measured: ClearanceEnvelope = { radiusMm: g.overallRadiusMm, innerSwingMm: g.innerSwingMm, outerSwingMm: g.outerSwingMm };
  const height =
    point.heightMm === undefined || direction === "upward"
      ? null
      : requireNumber(f("heightMm"), point.heightMm, CLEARANCE_HEIGHT_LIMITS_MM.min, CLEARANCE_HEIGHT_LIMITS_MM.max, "300", "mm");
  if (height !== null) {
    const h = Math.abs(height);
    const lateral = direction === "inboard" || direction === "outboard";
    if ((!lateral || state === "full-lock") && h >= measured.radiusMm) {
      throw new FitmentInputError(
        f("heightMm"),
        `${f("heightMm")} ${height} mm is not within the measured tire's radius ${measured.radiusMm} mm: a part beyond the tread's top is an upward point`,
        height,
      );
    }
    if (lateral && state !== "full-lock" && h - measured.radiusMm > gap) {
      throw new FitmentInputError(
        f("heightMm"),
        `${f("heightMm")} ${height} mm puts the part ${h - measured.radiusMm} mm above the tread, more than the ${gap} mm gap: record it as an upward point`,
        height,
      );
    }
  }
  const axis =
    options.steeringAxisInboardMm === undefined
      ? g.effectiveOffsetMm
      : requireNumber(
          "steeringAxisInboardMm",
          options.steeringAxisInboardMm,
          STEERING_AXIS_LIMITS_MM.min,
          STEERING_AXIS_LIMITS_MM.max,
          "100",
          "mm",
        );
  const basis = basisOf(direction, state, height, measured.radiusMm);
  const lock = basis === "sweep-inner" || basis === "sweep-outer" || basis === "sweep-farthest";
  return {
    direction,
    state,
    gapMm: gap,
    heightMm: height,
    label: typeof point.label === "string" ? point.label : null,
    basis,
    measured,
    axisMm: axis,
    measuredSweepMm: lock ? sweepMm(basis, halfLength(measured.radiusMm, height ?? 0), measured, axis) : 0,
  };
}

/** Signed distance from a point (y out from the face, z up) to the quarter-plane y ≤ a, z ≤ b. */
function signedToCorner(y: number, z: number, a: number, b: number): number {
  const dy = y - a;
  const dz = z - b;
  if (dy <= 0 && dz <= 0) return -Math.min(-dy, -dz);
  if (dy > 0 && dz > 0) return Math.sqrt(dy * dy + dz * dz);
  return dy > 0 ? dy : dz;
}

/** The signed distance of the part at angle φ on the shoulder arc; Infinity outside 0 … 45°. */
function onArc(phi: number, g: number, a: number, b: number): number {
  if (!(phi >= 0 && phi <= SHOULDER_ARC_RAD)) return Infinity;
  const c = Math.cos(phi);
  const s = Math.sin(phi);
  const y = g * c;
  const z = g * s;
  // Law of cosines where both offsets are positive: exactly g when the corner does not move.
  if (y > a && z > b) return Math.sqrt(Math.max(0, g * g + a * a + b * b - 2 * g * (a * c + b * s)));
  return signedToCorner(y, z, a, b);
}

/**
 * Worst (least) signed distance from a part on the arc of radius g about the measured shoulder
 * corner, at 0 … 45° above horizontal, or beside the sidewall below it, to the planned
 * cross-section, whose corner is (a, b) from the measured one (a: reach change toward the part,
 * b: radius change). Exact: the minimum of this continuous piecewise-smooth function lies at an
 * end, a piece boundary (g cos φ = a, g sin φ = b) or a stationary point (along the corner's
 * direction outside; where both escapes are equal inside), and all of those are evaluated.
 */
function shoulderWorst(g: number, a: number, b: number): number {
  let worst = g - a;
  if (g === 0) return Math.min(worst, signedToCorner(0, 0, a, b));
  worst = Math.min(worst, onArc(0, g, a, b), onArc(SHOULDER_ARC_RAD, g, a, b), onArc(Math.atan2(b, a), g, a, b));
  if (Math.abs(a) <= g) worst = Math.min(worst, onArc(Math.acos(a / g), g, a, b));
  if (Math.abs(b) <= g) worst = Math.min(worst, onArc(Math.asin(b / g), g, a, b));
  const s = (b - a) / (g * Math.SQRT2);
  if (Math.abs(s) <= 1) worst = Math.min(worst, onArc(Math.PI / 4 + Math.asin(s), g, a, b));
  return worst;
}

/** Half-length of the tread in plan view at height z (0 where the tire does not reach z). */
const halfLength = (r: number, z: number): number => (Math.abs(z) < r ? Math.sqrt(r * r - z * z) : 0);

/** Sweep radius about the steering axis of the corner a full-lock point faces. */
function sweepMm(basis: ClearanceBasis, l: number, e: ClearanceEnvelope, axis: number): number {
  const li = e.innerSwingMm - axis;
  const lo = e.outerSwingMm + axis;
  const inner = Math.sqrt(l * l + li * li);
  const outer = Math.sqrt(l * l + lo * lo);
  return basis === "sweep-inner" ? inner : basis === "sweep-outer" ? outer : Math.max(inner, outer);
}

/**
 * The predicted gap of a prepared point with a planned envelope, mm (negative = interference).
 * The one place the geometry is computed: {@link predictClearance} and the finder both call it.
 *
 * @example
 * const p = prepareClearance({ direction: "upward", distanceMm: 50.8, measuredWith: { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } } });
 * predictPreparedMm(p, { radiusMm: 444.5, innerSwingMm: 141.67, outerSwingMm: 165.67 }); // 7.7 (50.8 − 43.1)
 */
export function predictPreparedMm(p: PreparedClearance, planned: ClearanceEnvelope): number {
  const m = p.measured;
  const g = p.gapMm;
  const z = p.heightMm ?? 0;
  switch (p.basis) {
    case "radius":
    case "radial":
      return zero(g - (planned.radiusMm - m.radiusMm));
    case "chord": {
      const ahead = halfLength(m.radiusMm, z) + g;
      return zero(
        Math.abs(z) < planned.radiusMm ? ahead - halfLength(planned.radiusMm, z) : Math.sqrt(ahead * ahead + z * z) - planned.radiusMm,
      );
    }
    case "sweep-inner":
    case "sweep-outer":
    case "sweep-farthest":
      return zero(g - (sweepMm(p.basis, halfLength(planned.radiusMm, z), planned, p.axisMm) - p.measuredSweepMm));
    case "reach":
    case "corner":
    case "shoulder": {
      const inboard = p.direction === "inboard";
      const reachM = inboard ? m.innerSwingMm : m.outerSwingMm;
      const reachP = inboard ? planned.innerSwingMm : planned.outerSwingMm;
      if (p.basis === "shoulder") return zero(shoulderWorst(g, reachP - reachM, planned.radiusMm - m.radiusMm));
      // The part's place (y outward from the hub face toward it, h above the centre), then its
      // signed distance to the planned section (reach × radius).
      const h = Math.abs(z);
      const y = h <= m.radiusMm ? reachM + g : reachM + Math.sqrt(Math.max(0, g * g - (h - m.radiusMm) ** 2));
      return zero(signedToCorner(y, h, reachP, planned.radiusMm));
    }
  }
}

/**
 * Predicts one measured gap with a planned setup.
 *
 * @example
 * const cur = { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
 * predictClearance({ direction: "fore-aft", distanceMm: 25, measuredWith: cur }, { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } });
 * // { predictedMm: -10, status: "contact", shortfallMm: 22.7, basis: "radial", … }
 * predictClearance({ direction: "fore-aft", state: "full-lock", heightMm: 300, distanceMm: 38.1, measuredWith: cur }, { tire: "35x12.50R17LT", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } });
 * // { changeMm: -81.6, basis: "sweep-farthest", … }  (outer corner sweep 297.8 → 379.4 mm)
 */
export function predictClearance(point: MeasuredClearance, planned: SetupLike, options: ClearanceOptions = {}): ClearancePrediction {
  const margin = checkMargin(options.marginMm ?? DEFAULT_CLEARANCE_MARGIN_MM);
  const p = prepareClearance(point, options);
  return predictionOf(p, clearanceEnvelope(planned), margin);
}

function predictionOf(p: PreparedClearance, planned: ClearanceEnvelope, margin: number): ClearancePrediction {
  const predicted = predictPreparedMm(p, planned);
  return {
    direction: p.direction,
    state: p.state,
    measuredMm: p.gapMm,
    changeMm: zero(predicted - p.gapMm),
    predictedMm: predicted,
    status: classifyClearance(predicted, margin),
    marginMm: margin,
    shortfallMm: zero(Math.max(0, margin - predicted)),
    basis: p.basis,
  };
}

/**
 * Predicts every measured gap with a planned setup (same order as given).
 *
 * @example
 * const cur = { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
 * const planned = { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } };
 * predictClearances([{ direction: "upward", distanceMm: 40, measuredWith: cur }], planned).map((p) => p.status); // ["tight"] (40 − 35 = 5 mm)
 */
export function predictClearances(
  points: readonly MeasuredClearance[],
  planned: SetupLike,
  options: ClearanceOptions = {},
): ClearancePrediction[] {
  if (!Array.isArray(points) || points.length > 500) {
    throw new FitmentInputError("points", "points must be a list of at most 500 measured clearances", points);
  }
  const margin = checkMargin(options.marginMm ?? DEFAULT_CLEARANCE_MARGIN_MM);
  const env = clearanceEnvelope(planned);
  return points.map((pt) => predictionOf(prepareClearance(pt, options), env, margin));
}

/** Result of {@link clearanceLimits}: what the measured points allow, mm from the hub face. */
export interface ClearanceLimits {
  /** Most a tire may reach inboard of the mounting face and keep the margin at every inboard point. */
  maxInnerSwingMm: number | null;
  /** Most a tire may reach outboard of the mounting face and keep the margin at every outboard point. */
  maxOuterSwingMm: number | null;
  /** Largest overall diameter that keeps the margin at every upward and fore/aft point. */
  maxDiameterMm: number | null;
}

/**
 * First-order bounds the measured points put on any setup, keeping `marginMm` at each, for
 * drawing the parts on a cross-section: for an inboard point the measured setup's inner swing +
 * gap − margin (the least over all inboard points); outboard likewise with the outer swing;
 * upward and fore/aft: 2 × (radius + gap − margin). Null where no point of that kind was
 * measured. They take each part beside or above the tire at hub height with the wheel straight;
 * whether a setup fits is decided by {@link predictClearance} (the finder applies it directly).
 *
 * @example
 * clearanceLimits([{ direction: "inboard", distanceMm: 30, measuredWith: { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } } }]);
 * // { maxInnerSwingMm: 174.8, maxOuterSwingMm: null, maxDiameterMm: null }  (157.5 + 30 − 12.7)
 */
export function clearanceLimits(points: readonly MeasuredClearance[], options: { marginMm?: number } = {}): ClearanceLimits {
  if (!Array.isArray(points) || points.length > 500) {
    throw new FitmentInputError("points", "points must be a list of at most 500 measured clearances", points);
  }
  const margin = checkMargin(options.marginMm ?? DEFAULT_CLEARANCE_MARGIN_MM);
  let inner: number | null = null;
  let outer: number | null = null;
  let diameter: number | null = null;
  for (const p of points) {
    const direction = checkDirection(p.direction);
    const gap = requireNumber("distanceMm", p.distanceMm, CLEARANCE_DISTANCE_LIMITS_MM.min, CLEARANCE_DISTANCE_LIMITS_MM.max, "30", "mm");
    const g = geometryOf(p.measuredWith);
    if (direction === "inboard") inner = Math.min(inner ?? Infinity, g.innerSwingMm + gap - margin);
    else if (direction === "outboard") outer = Math.min(outer ?? Infinity, g.outerSwingMm + gap - margin);
    else diameter = Math.min(diameter ?? Infinity, 2 * (g.overallRadiusMm + gap - margin));
  }
  return { maxInnerSwingMm: inner, maxOuterSwingMm: outer, maxDiameterMm: diameter };
}
