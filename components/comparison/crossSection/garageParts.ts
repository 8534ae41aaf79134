/**
 * A garage vehicle's measured points as the cross-section draws them: each with the setup it was
 * measured with (as the engine takes it) and its prediction for the planned setup, in the same
 * order (lib/garage/predict.ts `predictPoints` returns them in the points' order).
 */
import { type Setup, toEngineSetup } from "@/lib/setup/model";
import type { ClearancePrediction } from "@/lib/fitment";
import type { PartInput } from "@/lib/fitment/crossSection";

export interface GaragePoint {
  label: string;
  direction: PartInput["direction"];
  distanceMm: number;
  suspensionState?: PartInput["state"];
  measuredSetup: Setup;
}

/**
 * @example
 * drawnParts([{ label: "Frame rail", direction: "inboard", distanceMm: 31.75, suspensionState: "ride-height", measuredSetup }], [prediction]);
 * // [{ label: "Frame rail", direction: "inboard", state: "ride-height", distanceMm: 31.75, measuredWith: { tire, wheel, spacerMm }, predictedMm, status }]
 */
export function drawnParts(points: readonly GaragePoint[], predictions: readonly ClearancePrediction[]): PartInput[] {
  return points.flatMap((p, i) => {
    const pr = predictions[i];
    if (!pr) return [];
    return [
      {
        label: p.label,
        direction: p.direction,
        state: p.suspensionState ?? "ride-height",
        distanceMm: p.distanceMm,
        measuredWith: toEngineSetup(p.measuredSetup),
        predictedMm: pr.predictedMm,
        status: pr.status,
      },
    ];
  });
}
