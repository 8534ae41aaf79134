/**
 * A vehicle's measured points carried over to a planned setup, through the engine
 * (lib/fitment/clearance.ts). Shared by the vehicle page, the install checklist, the finder and
 * the workspace's garage panel; zod-free so the workspace can load it lazily.
 */
import {
  type ClearanceLimits,
  type ClearancePrediction,
  type MeasuredClearance,
  clearanceLimits,
  predictClearances,
  steeringAxisInboardMm,
} from "@/lib/fitment";
import { type Setup, toEngineSetup } from "@/lib/setup/model";

type Point = {
  direction: MeasuredClearance["direction"];
  distanceMm: number;
  measuredSetup: Setup;
  /** Where the suspension and steering were; missing = ride height. */
  suspensionState?: MeasuredClearance["state"];
  label?: string;
};

/** What the steering axis is placed from: the vehicle's current setup and kingpin inclination. */
export type SteeringSource = { currentSetup: Setup; kingpinInclinationDeg: number | null };

/**
 * The steering axis at the wheel centre, mm inboard of the hub face: through the current tire's
 * contact patch centre (the garage records no scrub radius, so zero scrub is assumed) and leaning
 * by the vehicle's kingpin inclination (0° when not recorded).
 */
export function steeringAxisOf(vehicle: SteeringSource): number {
  return steeringAxisInboardMm(toEngineSetup(vehicle.currentSetup), { kingpinInclinationDeg: vehicle.kingpinInclinationDeg ?? undefined });
}

/** The points as the engine takes them, with their state and label. */
export function measuredPoints(points: readonly Point[]): MeasuredClearance[] {
  return points.map((c) => ({
    direction: c.direction,
    state: c.suspensionState ?? "ride-height",
    distanceMm: c.distanceMm,
    measuredWith: toEngineSetup(c.measuredSetup),
    ...(c.label === undefined ? {} : { label: c.label }),
  }));
}

/**
 * Every point's prediction with `planned`, in the same order. Pass the vehicle so full-lock
 * points turn about its steering axis; without it, the axis runs through each point's measured
 * tire centre line at 0° kingpin inclination.
 */
export function predictPoints(points: readonly Point[], planned: Setup, marginMm: number, vehicle?: SteeringSource): ClearancePrediction[] {
  return predictClearances(measuredPoints(points), toEngineSetup(planned), {
    marginMm,
    ...(vehicle === undefined ? {} : { steeringAxisInboardMm: steeringAxisOf(vehicle) }),
  });
}

/**
 * Where the measured parts are, from the hub face (margin 0): the nearest inboard part and the
 * nearest outboard part (the fender lip), as the workspace draws them. A drawing aid: whether a
 * setup fits is what {@link predictPoints} says.
 */
export function measuredLimits(points: readonly Point[], marginMm = 0): ClearanceLimits {
  return clearanceLimits(measuredPoints(points), { marginMm });
}
