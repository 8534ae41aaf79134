/**
 * The workspace's trail angles: approach, departure and ramp breakover with the current tires
 * (as measured) and with the planned tires and a lift, from the engine (lib/fitment:
 * approachAngleDeg, departureAngleDeg, breakoverAngleDeg, raiseBodyPoint; SAE J1100 definitions).
 * Each angle stands alone: a body point the engine refuses puts its message beside that field and
 * leaves only that angle out.
 */
import {
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
  const run = (
    kind: TrailAngle["kind"],
    fields: { height: TrailField; offset: TrailField },
    f: (diameter: number, height: number) => number,
    h: number,
  ) => {
    try {
      angles.push({ kind, currentDeg: f(input.currentDiameterMm, h), plannedDeg: f(input.plannedDiameterMm, raise(h)) });
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      const which = ENGINE_FIELD[e.field] ?? "height";
      const key = which === "lift" ? "lift" : fields[which];
      errors[key] ??= `${labels[key]}: ${e.message}`;
    }
  };
  const { frontHeightMm: fh, frontAheadMm: fa, rearHeightMm: rh, rearBehindMm: rb, wheelbaseMm: wb, midHeightMm: mh } = input;
  if (fh !== null && fa !== null)
    run(
      "approach",
      { height: "frontHeight", offset: "frontAhead" },
      (d, h) => approachAngleDeg({ tireDiameterMm: d, cornerHeightMm: h, cornerOffsetMm: fa }),
      fh,
    );
  if (rh !== null && rb !== null)
    run(
      "departure",
      { height: "rearHeight", offset: "rearBehind" },
      (d, h) => departureAngleDeg({ tireDiameterMm: d, cornerHeightMm: h, cornerOffsetMm: rb }),
      rh,
    );
  if (wb !== null && mh !== null)
    run(
      "breakover",
      { height: "midHeight", offset: "wheelbase" },
      (d, h) => breakoverAngleDeg({ tireDiameterMm: d, wheelbaseMm: wb, clearanceMm: h }),
      mh,
    );
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
