/**
 * Trail angles: approach, departure and ramp breakover, by the SAE J1100 definitions (from
 * memory of the standard's wording, not re-read):
 * - approach (departure) angle: the angle between the ground and the line tangent to the front
 *   (rear) tire that touches the lowest point of the front (rear) overhang;
 * - ramp breakover angle: from the two lines tangent to the front and rear tires that meet at the
 *   lowest point of the underbody midway between the axles. Those lines make an obtuse angle at
 *   that point, opening downward like a ridge the vehicle straddles; the breakover angle is its
 *   **supplement**, 180° − that angle, which equals the sum of the two lines' slopes. It is the
 *   figure spec sheets give — larger is better, about 20–30° for an off-road truck.
 *
 * Model (plane geometry, side view): the tire is a circle of radius R = D/2 resting on the ground
 * (contact at the bottom of the circle), its centre R above the ground. A body point lies d ahead
 * of (approach) or behind (departure) the axle centre, horizontally, at height h above the
 * ground. The tangent line from the point that passes under the tire's front makes with the
 * ground the angle
 *   **θ = atan2(h − R, d) + asin(R / ρ)**, ρ = √(d² + (h − R)²)  (needs ρ > R: outside the tire).
 * Breakover uses the same with d = wheelbase / 2 and h = the clearance midway, for each axle:
 *   **breakover = 2 · θ(L/2, c)** (same tire front and rear).
 * SAE J1100 takes the tire's static loaded radius; given the nominal diameter the angles come out
 * slightly larger than on the loaded vehicle.
 *
 * Heights are measured on the vehicle with its current tires. With a taller tire every body point
 * rises by the radius change ΔD/2, and with a lift by the lift's height: {@link raiseBodyPoint}.
 * A body point on or inside the tire's circle is an error (the tire would reach it).
 */
import { BodyPointError, FitmentInputError, requireNumber, requireObject } from "./errors";

/** Accepted ranges, mm. */
export const TRAIL_ANGLE_LIMITS_MM = Object.freeze({
  tireDiameter: { min: 300, max: 2000 },
  height: { min: 1, max: 3000 },
  offset: { min: 1, max: 5000 },
  wheelbase: { min: 1000, max: 10000 },
  lift: { min: -300, max: 600 },
});

const DEG = 180 / Math.PI;

/** Input of {@link approachAngleDeg} (also the departure angle: the rear corner and rear tire). */
export interface CornerInput {
  /** Tire diameter, mm (twice the static loaded radius when known; see the module comment). */
  tireDiameterMm: number;
  /** Height of the lowest point of the overhang above the ground, mm. */
  cornerHeightMm: number;
  /** Horizontal distance of that point ahead of (behind) the axle centre, mm. */
  cornerOffsetMm: number;
}

/** Input of {@link breakoverAngleDeg}. */
export interface BreakoverInput {
  /** Tire diameter, mm (same front and rear). */
  tireDiameterMm: number;
  /** Distance between the axle centres, mm. */
  wheelbaseMm: number;
  /** Height of the lowest underbody point midway between the axles above the ground, mm. */
  clearanceMm: number;
}

/** Input of {@link raiseBodyPoint}. */
export interface RaiseInput {
  /** Height measured on the vehicle with the current tires, mm. */
  heightMm: number;
  currentTireDiameterMm: number;
  plannedTireDiameterMm: number;
  /**
   * What raises this point besides the tires, mm (negative lowers): a suspension lift raises
   * frame and body points; a body lift only body points; neither raises a point on the axle
   * (a differential housing), for which pass 0. Default 0.
   */
  liftMm?: number;
}

/**
 * Half the tire diameter of an angle's input, mm, once the input is known to be an object
 * (`example`: a whole valid input, `diameterExample` its tire diameter, for the messages).
 */
function tireRadius(input: { tireDiameterMm: number }, example: string, diameterExample: string): number {
  requireObject("input", input, example);
  const L = TRAIL_ANGLE_LIMITS_MM.tireDiameter;
  return requireNumber("tireDiameterMm", input.tireDiameterMm, L.min, L.max, diameterExample, "mm") / 2;
}

/**
 * Slope angle (degrees) of the line from (d, h) tangent under the front of the circle of radius r
 * resting on the ground; the point must lie outside the circle (else a BodyPointError on `field`).
 */
function tangentAngleDeg(r: number, d: number, h: number, field: string, what: string): number {
  checkOutside(r, d, h, field, what);
  return (Math.atan2(h - r, d) + Math.asin(r / Math.hypot(d, h - r))) * DEG;
}

function checkOutside(r: number, d: number, h: number, field: string, what: string): void {
  if (Math.hypot(d, h - r) <= r) {
    throw new BodyPointError(
      field,
      `${what} (${Math.round(d)} mm from the axle, ${Math.round(h)} mm high) is inside the tire's circle of radius ${Math.round(r)} mm: the tire would reach it — check the measurement, or the tire does not fit (e.g. a point 900 mm ahead at 600 mm)`,
      h,
      r,
    );
  }
}

/**
 * Approach angle (or departure angle, with the rear corner and rear tire), degrees, per SAE J1100:
 * the angle to the ground of the line tangent to the tire through the lowest point of the
 * overhang. θ = atan2(h − R, d) + asin(R / √(d² + (h − R)²)).
 * Throws {@link BodyPointError} when the point is inside the tire's circle, or sits over the
 * tire (θ > 90°: the tire meets any slope first, the point sets no angle).
 *
 * Sources: SAE J1100 (definitions, from memory); plane geometry of a tangent from a point to a circle.
 *
 * @example
 * approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 600, cornerOffsetMm: 900 }); // ≈ 38.24
 */
export function approachAngleDeg(input: CornerInput): number {
  const r = tireRadius(input, "{ tireDiameterMm: 800, cornerHeightMm: 600, cornerOffsetMm: 900 }", "800");
  const L = TRAIL_ANGLE_LIMITS_MM;
  const h = requireNumber("cornerHeightMm", input.cornerHeightMm, L.height.min, L.height.max, "600", "mm");
  const d = requireNumber("cornerOffsetMm", input.cornerOffsetMm, L.offset.min, L.offset.max, "900", "mm");
  const deg = tangentAngleDeg(r, d, h, "cornerHeightMm", "the body point");
  if (deg > 90) {
    throw new BodyPointError(
      "cornerOffsetMm",
      `the body point ${Math.round(d)} mm from the axle at ${Math.round(h)} mm sits over the tire, so it does not limit the angle: measure the lowest point of the overhang beyond the tire (e.g. 900 mm ahead at 600 mm)`,
      d,
      r,
    );
  }
  return deg;
}

/**
 * Departure angle, degrees: {@link approachAngleDeg} with the rear overhang's lowest point
 * (offset measured behind the rear axle) and the rear tire (SAE J1100, from memory).
 *
 * @example
 * departureAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 600, cornerOffsetMm: 900 }); // ≈ 38.24
 */
export function departureAngleDeg(input: CornerInput): number {
  return approachAngleDeg(input);
}

/**
 * Ramp breakover angle, degrees, per SAE J1100 as spec sheets give it: the supplement of the
 * angle between the two lines tangent to the front and rear tires that meet at the lowest point
 * midway between the axles — 2 · θ(L/2, c) with θ as in {@link approachAngleDeg}. Larger is
 * better. Throws {@link BodyPointError} when that point is inside a tire's circle.
 *
 * Sources: SAE J1100 (definition, from memory); plane geometry of a tangent from a point to a circle.
 *
 * @example
 * breakoverAngleDeg({ tireDiameterMm: 838.2, wheelbaseMm: 2450, clearanceMm: 280 }); // ≈ 26.79 (a 33 in tire)
 */
export function breakoverAngleDeg(input: BreakoverInput): number {
  const r = tireRadius(input, "{ tireDiameterMm: 838.2, wheelbaseMm: 2450, clearanceMm: 280 }", "838.2");
  const L = TRAIL_ANGLE_LIMITS_MM;
  const wheelbase = requireNumber("wheelbaseMm", input.wheelbaseMm, L.wheelbase.min, L.wheelbase.max, "2450", "mm");
  const c = requireNumber("clearanceMm", input.clearanceMm, L.height.min, L.height.max, "280", "mm");
  const deg = 2 * tangentAngleDeg(r, wheelbase / 2, c, "clearanceMm", "the lowest point midway");
  if (deg >= 180) {
    throw new BodyPointError(
      "clearanceMm",
      `clearanceMm ${Math.round(c)} mm puts the lowest point midway over the tires' reach (wheelbase ${Math.round(wheelbase)} mm): it does not limit breakover — check the measurement (e.g. 280)`,
      c,
      r,
    );
  }
  return deg;
}

/**
 * Height of a body point with the planned tire and a lift: h + (D_planned − D_current)/2 + lift.
 * The axle centre rises by the radius change, and with it everything the springs carry; the lift
 * adds its own height to what it raises (see {@link RaiseInput.liftMm}). Throws
 * {@link FitmentInputError} when the result is not above the ground.
 *
 * Sources: plane geometry (the axle centre sits one radius above the ground); common practice, no source.
 *
 * @example
 * raiseBodyPoint({ heightMm: 600, currentTireDiameterMm: 800, plannedTireDiameterMm: 889, liftMm: 50 }); // 694.5
 */
export function raiseBodyPoint(input: RaiseInput): number {
  requireObject("input", input, "{ heightMm: 600, currentTireDiameterMm: 800, plannedTireDiameterMm: 889, liftMm: 50 }");
  const L = TRAIL_ANGLE_LIMITS_MM;
  const h = requireNumber("heightMm", input.heightMm, L.height.min, L.height.max, "600", "mm");
  const dc = requireNumber("currentTireDiameterMm", input.currentTireDiameterMm, L.tireDiameter.min, L.tireDiameter.max, "800", "mm");
  const dp = requireNumber("plannedTireDiameterMm", input.plannedTireDiameterMm, L.tireDiameter.min, L.tireDiameter.max, "889", "mm");
  const lift = input.liftMm === undefined ? 0 : requireNumber("liftMm", input.liftMm, L.lift.min, L.lift.max, "50", "mm");
  const raised = h + (dp - dc) / 2 + lift;
  if (raised < L.height.min) {
    throw new FitmentInputError(
      "liftMm",
      `the point ends ${Math.round(raised)} mm above the ground with this tire and lift; it must stay above the ground (e.g. liftMm 0)`,
      lift,
    );
  }
  return raised;
}
