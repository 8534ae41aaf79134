/**
 * Predicted clearances: a gap measured on the vehicle with one setup, carried over to another.
 *
 * Each measured point has a direction (from the tire toward what it might hit) and the gap in
 * mm. For a planned setup the gap changes by (common practice, no source — the same swing and
 * radius figures as `compareSetups`):
 *
 * - **inboard** (frame rail, control arm, leaf spring): by the inner clearance change,
 *   inner swing (measured) − inner swing (planned);
 * - **outboard** (fender lip, flare edge): by minus the poke change,
 *   −(outer swing (planned) − outer swing (measured));
 * - **upward** (fender, liner at full stuff): by minus the radius change, −ΔD/2;
 * - **fore-aft at full lock** (bumper, body mount, firewall): by minus the radius change, −ΔD/2.
 *
 * Assumptions: the gap is measured along the direction of change; suspension travel, steering
 * stops and ride height stay as they were when measured; the radius change applies whole to
 * upward and fore/aft points (conservative for points that meet the shoulder at an angle); the
 * tread is taken as the section width on the rim (tire shoulders and lugs differ by make).
 *
 * Each predicted gap is classed against a margin: **contact** at 0 mm or less, **tight** below
 * the margin, **clear** otherwise. Default margin 1/2 in = 12.7 mm (common practice, no source).
 */
import { type SetupComparison, type SetupLike, compareSetups } from "./compare";
import { FitmentInputError, requireNumber } from "./errors";
import { type SetupGeometry, setupGeometry } from "./geometry";

/** Which way the measured gap points, from the tire toward the part it might touch. */
export type ClearanceDirection = "inboard" | "outboard" | "upward" | "fore-aft";
/** The directions, in display order. */
export const CLEARANCE_DIRECTIONS: readonly ClearanceDirection[] = Object.freeze(["inboard", "outboard", "upward", "fore-aft"]);
/** How a predicted gap compares with the margin. */
export type ClearanceStatus = "clear" | "tight" | "contact";
/** Default margin, mm: 1/2 in (common practice, no source). */
export const DEFAULT_CLEARANCE_MARGIN_MM = 12.7;
/** Accepted margins, mm. */
export const CLEARANCE_MARGIN_LIMITS_MM = { min: 0, max: 100 } as const;
/** Accepted measured gaps, mm (a gap is never negative: a touching point is 0). */
export const CLEARANCE_DISTANCE_LIMITS_MM = { min: 0, max: 1000 } as const;

/** A gap measured on the vehicle, and the setup fitted when it was measured. */
export interface MeasuredClearance {
  direction: ClearanceDirection;
  distanceMm: number;
  measuredWith: SetupLike;
}

/** Result of {@link predictClearance}. */
export interface ClearancePrediction {
  direction: ClearanceDirection;
  measuredMm: number;
  /** Change of the gap, mm: positive = more room. */
  changeMm: number;
  predictedMm: number;
  status: ClearanceStatus;
  marginMm: number;
  /** Material to gain (trim, lift, wheel change) to get back to the margin, mm; 0 when clear. */
  shortfallMm: number;
}

function checkDirection(direction: unknown): ClearanceDirection {
  if (!CLEARANCE_DIRECTIONS.includes(direction as ClearanceDirection)) {
    throw new FitmentInputError(
      "direction",
      `direction must be one of ${CLEARANCE_DIRECTIONS.join(", ")}, got ${JSON.stringify(direction)} (e.g. "inboard")`,
      direction,
    );
  }
  return direction as ClearanceDirection;
}

function checkMargin(marginMm: unknown): number {
  return requireNumber("marginMm", marginMm, CLEARANCE_MARGIN_LIMITS_MM.min, CLEARANCE_MARGIN_LIMITS_MM.max, "12.7", "mm");
}

const zero = (x: number): number => (x === 0 ? 0 : x);

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
    throw new FitmentInputError("predictedMm", `predictedMm must be a finite number of mm, got ${String(predictedMm)} (e.g. 8)`, predictedMm);
  }
  const m = checkMargin(marginMm);
  if (predictedMm <= 0) return "contact";
  return predictedMm < m ? "tight" : "clear";
}

/**
 * How much a gap in `direction` changes between the two setups of a comparison (+ = more room).
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

/**
 * Predicts one measured gap with a planned setup.
 *
 * @example
 * predictClearance(
 *   { direction: "fore-aft", distanceMm: 25, measuredWith: { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } } },
 *   { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } },
 * ); // { predictedMm: -10, status: "contact", shortfallMm: 22.7, … }
 */
export function predictClearance(point: MeasuredClearance, planned: SetupLike, options: { marginMm?: number } = {}): ClearancePrediction {
  if (point === null || typeof point !== "object") {
    throw new FitmentInputError("point", 'point must be an object like { direction: "inboard", distanceMm: 30, measuredWith: {…} }', point);
  }
  const direction = checkDirection(point.direction);
  const measured = requireNumber("distanceMm", point.distanceMm, CLEARANCE_DISTANCE_LIMITS_MM.min, CLEARANCE_DISTANCE_LIMITS_MM.max, "30", "mm");
  const margin = checkMargin(options.marginMm ?? DEFAULT_CLEARANCE_MARGIN_MM);
  const change = clearanceChangeMm(direction, compareSetups(point.measuredWith, planned));
  const predicted = zero(measured + change);
  return {
    direction,
    measuredMm: measured,
    changeMm: change,
    predictedMm: predicted,
    status: classifyClearance(predicted, margin),
    marginMm: margin,
    shortfallMm: zero(Math.max(0, margin - predicted)),
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
  options: { marginMm?: number } = {},
): ClearancePrediction[] {
  if (!Array.isArray(points) || points.length > 500) {
    throw new FitmentInputError("points", "points must be a list of at most 500 measured clearances", points);
  }
  const pla = (planned as SetupGeometry).innerSwingMm !== undefined ? (planned as SetupGeometry) : setupGeometry(planned as Parameters<typeof setupGeometry>[0]);
  return points.map((p) => predictClearance(p, pla, options));
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
 * The limits the measured points put on any setup, keeping `marginMm` at each: for an inboard
 * point the measured setup's inner swing + gap − margin (the least over all inboard points);
 * outboard likewise with the outer swing; upward and fore/aft: 2 × (radius + gap − margin).
 * Null where no point of that kind was measured.
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
    const g = (p.measuredWith as SetupGeometry).innerSwingMm !== undefined ? (p.measuredWith as SetupGeometry) : setupGeometry(p.measuredWith as Parameters<typeof setupGeometry>[0]);
    if (direction === "inboard") inner = Math.min(inner ?? Infinity, g.innerSwingMm + gap - margin);
    else if (direction === "outboard") outer = Math.min(outer ?? Infinity, g.outerSwingMm + gap - margin);
    else diameter = Math.min(diameter ?? Infinity, 2 * (g.overallRadiusMm + gap - margin));
  }
  return { maxInnerSwingMm: inner, maxOuterSwingMm: outer, maxDiameterMm: diameter };
}
