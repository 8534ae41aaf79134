/**
 * Test helpers for setups (lib/setup's tests, the comparison's and the garage's): a setup placed
 * by its offset, and the message a form schema gave for one field.
 */
import type { Position, Setup } from "./model";

/**
 * A setup as the forms and links hold it, with no spacer unless one is given.
 *
 * @example
 * setupAt("35x12.50R15LT", 15, 10, { mode: "backspacing", backspacingIn: 3.75, reference: "flange", flangeIn: 0.5 }).spacerMm; // 0
 */
export const setupAt = (tire: string, wheelDiameterIn: number, wheelWidthIn: number, position: Position, spacerMm = 0): Setup => ({
  tire,
  wheelDiameterIn,
  wheelWidthIn,
  position,
  spacerMm,
});

/**
 * A setup placed by its offset.
 *
 * @example
 * setupByOffset("35x12.50R17LT", 17, 9, -12).position; // { mode: "offset", offsetMm: -12 }
 */
export const setupByOffset = (tire: string, wheelDiameterIn: number, wheelWidthIn: number, offsetMm: number, spacerMm = 0): Setup =>
  setupAt(tire, wheelDiameterIn, wheelWidthIn, { mode: "offset", offsetMm }, spacerMm);

/** What a zod `safeParse` returns, as far as the field messages go. */
type ParseResult = { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } };

/**
 * The message of the issue at `path` (dot-separated), or undefined.
 *
 * @example
 * issueAt(setupSchema.safeParse({ ...setup, spacerMm: "1-1/2" }), "spacerMm"); // "Spacer (mm, optional): “1-1/2” is a fraction, …"
 */
export const issueAt = (r: ParseResult, path: string): string | undefined =>
  r.error?.issues.find((i) => i.path.join(".") === path)?.message;
