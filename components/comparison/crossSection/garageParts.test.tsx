import { describe, expect, it } from "vitest";
import type { Setup } from "@/lib/setup/model";
import { predictPoints } from "@/lib/garage/predict";
import { SETUP_A } from "@/lib/comparisons/crossSection/testUtil";
import { drawnParts } from "./garageParts";

// 4.5 in of backspacing to the flange on an 8 in wheel: (4.5 − 0.5 − 4) × 25.4 = 0 mm offset (offset.ts, common practice, no source).
const measured: Setup = {
  tire: "265/70R17",
  wheelDiameterIn: 17,
  wheelWidthIn: 8,
  position: { mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 },
  spacerMm: 0,
};
/** 35x12.50R17 on 17x9 −12 (lib/fitment/crossSection.test.ts). */
const planned = SETUP_A;

describe("drawnParts", () => {
  it("pairs each measured point with its prediction, in order, with the setup as the engine takes it", () => {
    const points = [
      {
        label: "Frame rail",
        direction: "inboard" as const,
        distanceMm: 31.75,
        suspensionState: "ride-height" as const,
        measuredSetup: measured,
      },
      { label: "Flare", direction: "outboard" as const, distanceMm: 20, measuredSetup: measured },
    ];
    const predictions = predictPoints(points, planned, 12.7);
    const parts = drawnParts(points, predictions);
    expect(parts.map((p) => [p.label, p.state, p.status, p.predictedMm])).toEqual(
      predictions.map((p, i) => [points[i]!.label, "ride-height", p.status, p.predictedMm]),
    );
    expect(parts[0]!.measuredWith).toEqual({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 0 }, spacerMm: 0 });
  });

  it("leaves out a point without a prediction rather than pairing it with another's", () => {
    const p = { label: "Liner", direction: "upward" as const, distanceMm: 40, measuredSetup: measured };
    expect(drawnParts([p], [])).toEqual([]);
  });
});
