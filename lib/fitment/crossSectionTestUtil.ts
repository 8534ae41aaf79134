/**
 * Vehicle parts for the cross-section's tests (engine, drawing, component): measured with the
 * demo's stock setup, each with the prediction the test gives it.
 */
import type { ClearanceDirection, ClearanceStatus, SuspensionState } from "./clearance";
import type { PartInput } from "./crossSection";

/** 265/70R17 on 17x8 +25, as the engine takes it: the setup the parts were measured with. */
export const STOCK_SETUP = { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };

/**
 * A part measured `distanceMm` from the stock setup's tire, and the gap predicted with the planned one.
 *
 * @example
 * stockPart("Flare", "outboard", "ride-height", 20, -38.2, "contact").measuredWith; // STOCK_SETUP
 */
export function stockPart(
  label: string,
  direction: ClearanceDirection,
  state: SuspensionState,
  distanceMm: number,
  predictedMm: number,
  status: ClearanceStatus,
): PartInput {
  return { label, direction, state, distanceMm, measuredWith: STOCK_SETUP, predictedMm, status };
}
