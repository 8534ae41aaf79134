/**
 * The light part of the clearance model (clearance.ts): its vocabulary, accepted ranges, a
 * setup's envelope and where the steering axis passes. The cross-section drawing needs only
 * these; it imports them from here so a page that draws does not download the predictions.
 * clearance.ts re-exports everything, so other code keeps importing from there.
 */
import type { SetupLike } from "./compare";
import { requireNumber } from "./errors";
import { type SetupGeometry, setupGeometry } from "./geometry";

/** Which way the measured gap points, from the tire toward the part it might touch. */
export type ClearanceDirection = "inboard" | "outboard" | "upward" | "fore-aft";
/** The directions, in display order. */
export const CLEARANCE_DIRECTIONS: readonly ClearanceDirection[] = Object.freeze(["inboard", "outboard", "upward", "fore-aft"]);
/** Where the suspension and steering were when the gap was measured. */
export type SuspensionState = "ride-height" | "full-stuff" | "full-lock";
/** The suspension states, in display order. */
export const SUSPENSION_STATES: readonly SuspensionState[] = Object.freeze(["ride-height", "full-stuff", "full-lock"]);
/** How a predicted gap compares with the margin. */
export type ClearanceStatus = "clear" | "tight" | "contact";
/**
 * Which geometry a prediction used (see the module comment): the radius change, the lateral reach
 * beside the sidewall, the diagonal to the tread corner, the worst place on the shoulder, the
 * radial or level (chord) fore/aft gap, or a corner's sweep about the steering axis.
 */
export type ClearanceBasis =
  "radius" | "reach" | "corner" | "shoulder" | "radial" | "chord" | "sweep-inner" | "sweep-outer" | "sweep-farthest";
/** Default margin, mm: 1/2 in (common practice, no source). */
export const DEFAULT_CLEARANCE_MARGIN_MM = 12.7;
/** Accepted margins, mm. */
export const CLEARANCE_MARGIN_LIMITS_MM = { min: 0, max: 100 } as const;
/** Accepted measured gaps, mm (a gap is never negative: a touching point is 0). */
export const CLEARANCE_DISTANCE_LIMITS_MM = { min: 0, max: 1000 } as const;
/** Accepted heights of a part relative to the wheel centre, mm. */
export const CLEARANCE_HEIGHT_LIMITS_MM = { min: -1000, max: 1000 } as const;
/** Accepted steering-axis positions, mm inboard of the hub face (negative = outboard). */
export const STEERING_AXIS_LIMITS_MM = { min: -300, max: 500 } as const;
/** Accepted scrub radii at the ground, mm. */
export const SCRUB_RADIUS_LIMITS_MM = { min: -250, max: 250 } as const;

/** The part of a setup the predictions use: radius and reach either side of the hub face, mm. */
export interface ClearanceEnvelope {
  radiusMm: number;
  innerSwingMm: number;
  outerSwingMm: number;
}

export const zero = (x: number): number => (x === 0 ? 0 : x);

export function geometryOf(s: SetupLike): SetupGeometry {
  return typeof (s as SetupGeometry).innerSwingMm === "number" && typeof (s as SetupGeometry).tire === "object"
    ? (s as SetupGeometry)
    : setupGeometry(s as Parameters<typeof setupGeometry>[0]);
}

/**
 * Radius and reach of a setup, as the predictions use them.
 *
 * @example
 * clearanceEnvelope({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } });
 * // { radiusMm: 401.4, innerSwingMm: 157.5, outerSwingMm: 107.5 }
 */
export function clearanceEnvelope(setup: SetupLike): ClearanceEnvelope {
  const g = geometryOf(setup);
  return { radiusMm: g.overallRadiusMm, innerSwingMm: g.innerSwingMm, outerSwingMm: g.outerSwingMm };
}

/**
 * Where the steering axis passes the wheel centre's height, mm inboard of the hub mounting face:
 * d = e + scrub + R·tan(KPI). The axis meets the ground `scrubRadiusMm` inboard of the tire's
 * centre line (positive scrub), the centre line sits e (the effective offset) inboard of the hub
 * face, and an axis leaning inboard by the kingpin inclination rises R to the wheel centre
 * (Milliken & Milliken, *Race Car Vehicle Dynamics* ch. 19 — from memory; the rest is plane
 * geometry). Unknown scrub is taken as zero: an assumption, not a property of trucks.
 *
 * @example
 * steeringAxisInboardMm({ tire: "LT285/70R17", wheel: { diameterIn: 17, widthIn: 8.5, offsetMm: 18 } }, { kingpinInclinationDeg: 12 });
 * // 106.3  (18 + 415.4 × tan 12°)
 */
export function steeringAxisInboardMm(setup: SetupLike, options: { kingpinInclinationDeg?: number; scrubRadiusMm?: number } = {}): number {
  const g = geometryOf(setup);
  const kpi =
    options.kingpinInclinationDeg === undefined
      ? 0
      : requireNumber("kingpinInclinationDeg", options.kingpinInclinationDeg, 0, 30, "8", "°");
  const scrub =
    options.scrubRadiusMm === undefined
      ? 0
      : requireNumber("scrubRadiusMm", options.scrubRadiusMm, SCRUB_RADIUS_LIMITS_MM.min, SCRUB_RADIUS_LIMITS_MM.max, "20", "mm");
  return zero(g.effectiveOffsetMm + scrub + (kpi === 0 ? 0 : g.overallRadiusMm * Math.tan((kpi * Math.PI) / 180)));
}
