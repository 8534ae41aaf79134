/**
 * The cross-section's setups as the workspace holds them, for the drawing's, the component's and
 * the browser's tests: those of lib/fitment/crossSection.test.ts, worked there by hand.
 */
import type { PartInput } from "@/lib/fitment/crossSection";
import type { Setup } from "@/lib/setup/model";
import { setupByOffset as byOffset } from "@/lib/setup/testUtil";
import type { DrawnLimits } from "./drawing";

/** 35x12.50R17 on 17x9, offset −12 mm. */
export const SETUP_A = byOffset("35x12.50R17", 17, 9, -12);
/** 285/75R16 on 16x8, offset 0, on a 38 mm spacer. */
export const SETUP_B = byOffset("285/75R16", 16, 8, 0, 38);
/**
 * 33x12.50R15 on 15x10, entered as 3.25 in of backspacing to the bead seat:
 * (3.25 − 5) × 25.4 = −44.45 mm offset (offset.ts, common practice, no source).
 */
export const SETUP_C: Setup = {
  tire: "33x12.50R15",
  wheelDiameterIn: 15,
  wheelWidthIn: 10,
  position: { mode: "backspacing", backspacingIn: 3.25, reference: "bead-seat", flangeIn: 0.5 },
  spacerMm: 0,
};

/**
 * A garage vehicle's limits with its measured `parts`: the inner limit 187.5 mm inboard of the hub
 * face and the fender lip 127.5 mm outboard, where a part 30 mm inboard and one 20 mm outboard of
 * the stock tire put them (its swings 157.5 + 30 and 107.5 + 20 mm, lib/fitment/crossSection.test.ts).
 */
export const garageLimits = (...parts: PartInput[]): DrawnLimits => ({ innerMm: 187.5, outerMm: 127.5, parts });
