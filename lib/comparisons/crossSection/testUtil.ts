/**
 * The cross-section's setups as the workspace holds them, for the drawing's, the component's and
 * the browser's tests: those of lib/fitment/crossSection.test.ts, worked there by hand.
 */
import type { Setup } from "@/lib/setup/model";

/** A setup placed by its offset, as the workspace holds it. */
const byOffset = (tire: string, wheelDiameterIn: number, wheelWidthIn: number, offsetMm: number, spacerMm = 0): Setup => ({
  tire,
  wheelDiameterIn,
  wheelWidthIn,
  position: { mode: "offset", offsetMm },
  spacerMm,
});

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
