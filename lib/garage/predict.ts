/**
 * A vehicle's measured points carried over to a planned setup, through the engine
 * (lib/fitment/clearance.ts). Shared by the vehicle page, the install checklist, the finder and
 * the workspace's garage panel; zod-free so the workspace can load it lazily.
 */
import { type ClearanceLimits, type ClearancePrediction, type MeasuredClearance, clearanceLimits, predictClearances } from "@/lib/fitment";
import { type SetupInputValues, toEngineSetup } from "@/lib/comparison/model";

type Point = { direction: MeasuredClearance["direction"]; distanceMm: number; measuredSetup: SetupInputValues };

/** The points as the engine takes them. */
export function measuredPoints(points: readonly Point[]): MeasuredClearance[] {
  return points.map((c) => ({ direction: c.direction, distanceMm: c.distanceMm, measuredWith: toEngineSetup(c.measuredSetup) }));
}

/** Every point's prediction with `planned`, in the same order. */
export function predictPoints(points: readonly Point[], planned: SetupInputValues, marginMm: number): ClearancePrediction[] {
  return predictClearances(measuredPoints(points), toEngineSetup(planned), { marginMm });
}

/**
 * Where the measured parts are, from the hub face (margin 0): the nearest inboard part and the
 * nearest outboard part (the fender lip), as the workspace draws them.
 */
export function measuredLimits(points: readonly Point[], marginMm = 0): ClearanceLimits {
  return clearanceLimits(measuredPoints(points), { marginMm });
}
