/**
 * The workspace's trail angles: approach, departure and ramp breakover with the current tires
 * (as measured) and with the planned tires and a lift, from the engine (lib/fitment:
 * approachAngleDeg, departureAngleDeg, breakoverAngleDeg, raiseBodyPoint; SAE J1100 definitions).
 * Each angle stands alone: a body point the engine refuses puts its message beside that field and
 * leaves only that angle out.
 */
import {
  type CornerInput,
  FitmentInputError,
  TRAIL_ANGLE_LIMITS_MM,
  approachAngleDeg,
  breakoverAngleDeg,
  departureAngleDeg,
  raiseBodyPoint,
} from "@/lib/fitment";
import type { MeasureSpec } from "./measureEntry";

export type TrailField = "frontHeight" | "frontAhead" | "rearHeight" | "rearBehind" | "wheelbase" | "midHeight" | "lift";
export type TrailLabels = Record<TrailField, string>;

export interface TrailInput {
  currentDiameterMm: number;
  plannedDiameterMm: number;
  /** All measured on the vehicle with the current tires, mm; null = not entered (that angle is skipped). */
  frontHeightMm: number | null;
  frontAheadMm: number | null;
  rearHeightMm: number | null;
  rearBehindMm: number | null;
  wheelbaseMm: number | null;
  midHeightMm: number | null;
  /** Suspension lift, mm (raises every body point measured here). */
  liftMm: number;
}

export interface TrailAngle {
  kind: "approach" | "departure" | "breakover";
  currentDeg: number;
  plannedDeg: number;
}

/** The angles' names on every screen. */
export const TRAIL_ANGLE_NAME: Readonly<Record<TrailAngle["kind"], string>> = {
  approach: "Approach",
  departure: "Departure",
  breakover: "Ramp breakover",
};

const ENGINE_FIELD: Record<string, "height" | "offset" | "lift"> = {
  cornerHeightMm: "height",
  cornerOffsetMm: "offset",
  clearanceMm: "height",
  heightMm: "height",
  liftMm: "lift",
};

/** A measured trail field (all but the lift), read from `TrailInput` as `<field>Mm`. */
type BodyField = Exclude<TrailField, "lift">;

/** Approach and departure take the same corner: a height, and a distance from the axle. */
const corner =
  (angleDeg: (input: CornerInput) => number) =>
  (tireDiameterMm: number, heightMm: number, offsetMm: number): number =>
    angleDeg({ tireDiameterMm, cornerHeightMm: heightMm, cornerOffsetMm: offsetMm });

/**
 * Each angle, in the order of the screen: the fields of its body point (its height, and its
 * distance from the axle or the wheelbase) and the engine's function of the tire's diameter.
 */
const TRAIL_ANGLES: readonly {
  kind: TrailAngle["kind"];
  height: BodyField;
  offset: BodyField;
  angleDeg: (tireDiameterMm: number, heightMm: number, offsetMm: number) => number;
}[] = [
  { kind: "approach", height: "frontHeight", offset: "frontAhead", angleDeg: corner(approachAngleDeg) },
  { kind: "departure", height: "rearHeight", offset: "rearBehind", angleDeg: corner(departureAngleDeg) },
  {
    kind: "breakover",
    height: "midHeight",
    offset: "wheelbase",
    angleDeg: (tireDiameterMm, clearanceMm, wheelbaseMm) => breakoverAngleDeg({ tireDiameterMm, wheelbaseMm, clearanceMm }),
  },
];

/**
 * @example
 * planTrail({ currentDiameterMm: 802.8, plannedDiameterMm: 939.8, frontHeightMm: 600, frontAheadMm: 900, ... liftMm: 50 }, labels).angles[0];
 * // { kind: "approach", currentDeg: ≈ 38, plannedDeg: larger }
 */
export function planTrail(input: TrailInput, labels: TrailLabels): { angles: TrailAngle[]; errors: Partial<Record<TrailField, string>> } {
  const errors: Partial<Record<TrailField, string>> = {};
  const angles: TrailAngle[] = [];
  const raise = (h: number) =>
    raiseBodyPoint({
      heightMm: h,
      currentTireDiameterMm: input.currentDiameterMm,
      plannedTireDiameterMm: input.plannedDiameterMm,
      liftMm: input.liftMm,
    });
  for (const { kind, height, offset, angleDeg } of TRAIL_ANGLES) {
    const h = input[`${height}Mm`];
    const o = input[`${offset}Mm`];
    // A body point not entered: that angle is skipped.
    if (h === null || o === null) continue;
    try {
      angles.push({
        kind,
        currentDeg: angleDeg(input.currentDiameterMm, h, o),
        plannedDeg: angleDeg(input.plannedDiameterMm, raise(h), o),
      });
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      const which = ENGINE_FIELD[e.field] ?? "height";
      const key = which === "lift" ? "lift" : which === "height" ? height : offset;
      errors[key] ??= `${labels[key]}: ${e.message}`;
    }
  }
  return { angles, errors };
}

const L = TRAIL_ANGLE_LIMITS_MM;
/** The trail fields with their bounds (the engine's) and examples (also the garage's body-point form). */
export const TRAIL_SPEC: Readonly<Record<TrailField, MeasureSpec>> = {
  frontHeight: { quantity: "length", ...L.height, example: { imperial: "24", metric: "600" } },
  frontAhead: { quantity: "length", ...L.offset, example: { imperial: "35", metric: "900" } },
  rearHeight: { quantity: "length", ...L.height, example: { imperial: "26", metric: "650" } },
  rearBehind: { quantity: "length", ...L.offset, example: { imperial: "40", metric: "1000" } },
  wheelbase: { quantity: "length", ...L.wheelbase, example: { imperial: "118", metric: "3000" } },
  midHeight: { quantity: "length", ...L.height, example: { imperial: "11", metric: "280" } },
  lift: { quantity: "length", ...L.lift, example: { imperial: "2.5", metric: "65" } },
};
