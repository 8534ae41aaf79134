/**
 * Offset and backspacing.
 *
 * Conventions (common practice, no source):
 * - Rim width W is nominal, between the bead seats.
 * - Offset is the distance from the rim centreline to the hub mounting face, positive when the
 *   mounting face is outboard of the centreline.
 * - Backspacing is the distance from the mounting face to the inboard edge of the rim. Measured
 *   to the inboard bead seat it is W/2 + offset; measured to the edge of the inboard flange it
 *   also includes the flange allowance f (0.5 in by default): W/2 + offset + f.
 *
 * Example (common practice, no source): a 9.5 in wide wheel with 3.5 in of backspacing measured
 * from the bead seat has offset 3.5 − 4.75 = −1.25 in (−31.75 mm), with 3.5 in of rim inboard of
 * the mounting face and 6 in outboard.
 */
import { FitmentInputError, requireNumber } from "./errors";
import { RIM_WIDTH_LIMITS_IN } from "./dimensions";
import { MM_PER_IN } from "./units";

/** Where a backspacing figure is measured to. */
export type BackspacingReference = "flange" | "bead-seat";

/** Default flange allowance, inches (common practice, no source). */
export const DEFAULT_FLANGE_IN = 0.5;
/** Flange allowances accepted, inches (a flange lip beyond 2 in is a typing error; common practice, no source). */
export const FLANGE_ALLOWANCE_LIMITS_IN = { min: 0, max: 2 } as const;
/**
 * How far the mounting face may sit beyond either bead seat, mm (3 in; common practice, no
 * source). An offset beyond W/2 + this margin is rejected as a typing error.
 */
export const OFFSET_MARGIN_MM = 76.2;

/**
 * Validates a wheel width (inches) and returns it.
 *
 * @example
 * checkWheelWidthIn(9.5); // 9.5
 */
export function checkWheelWidthIn(widthIn: unknown, field = "widthIn"): number {
  return requireNumber(field, widthIn, RIM_WIDTH_LIMITS_IN.min, RIM_WIDTH_LIMITS_IN.max, "9.5", "in");
}

/**
 * Validates an offset (mm) against a wheel width: |offset| ≤ W/2 + {@link OFFSET_MARGIN_MM}.
 *
 * @example
 * checkOffsetMm(-31.75, 9.5); // -31.75
 * checkOffsetMm(300, 9.5);    // throws FitmentInputError
 */
export function checkOffsetMm(offsetMm: unknown, widthIn: number, field = "offsetMm"): number {
  if (typeof offsetMm !== "number" || !Number.isFinite(offsetMm)) {
    throw new FitmentInputError(field, `${field} must be a finite number of mm, got ${String(offsetMm)} (e.g. -12)`, offsetMm);
  }
  const limit = (widthIn * MM_PER_IN) / 2 + OFFSET_MARGIN_MM;
  if (Math.abs(offsetMm) > limit) {
    throw new FitmentInputError(
      field,
      `${field} ${offsetMm} mm puts the mounting face more than ${OFFSET_MARGIN_MM} mm beyond the bead seat of a ${widthIn} in wide wheel (allowed ±${limit.toFixed(1)} mm, e.g. -12)`,
      offsetMm,
    );
  }
  return offsetMm;
}

function checkFlange(flangeIn: unknown): number {
  return requireNumber("flangeIn", flangeIn, FLANGE_ALLOWANCE_LIMITS_IN.min, FLANGE_ALLOWANCE_LIMITS_IN.max, "0.5", "in");
}

function checkReference(measuredFrom: unknown): BackspacingReference {
  if (measuredFrom !== "flange" && measuredFrom !== "bead-seat") {
    throw new FitmentInputError(
      "measuredFrom",
      `measuredFrom must be "flange" or "bead-seat", got ${JSON.stringify(measuredFrom)} (say where the backspacing was measured to)`,
      measuredFrom,
    );
  }
  return measuredFrom;
}

/** What both conversions are told about the wheel: its width and where its backspacing is measured to. */
interface WheelBasis {
  widthIn: number;
  measuredFrom: BackspacingReference;
  flangeIn?: number;
}

/** Checks the wheel's width, then the reference, then the flange allowance (default 0.5 in), in that order. */
function checkBasis(input: WheelBasis): { width: number; ref: BackspacingReference; flange: number } {
  const width = checkWheelWidthIn(input.widthIn);
  const ref = checkReference(input.measuredFrom);
  const flange = checkFlange(input.flangeIn ?? DEFAULT_FLANGE_IN);
  return { width, ref, flange };
}

/**
 * Offset (mm) from backspacing (inches).
 *
 * @example
 * offsetFromBackspacing({ widthIn: 9.5, backspacingIn: 3.5, measuredFrom: "bead-seat" }); // -31.75
 * offsetFromBackspacing({ widthIn: 9.5, backspacingIn: 4, measuredFrom: "flange" });      // -31.75
 */
export function offsetFromBackspacing(input: WheelBasis & { backspacingIn: number }): number {
  const { width, ref, flange } = checkBasis(input);
  const bs = requireNumber("backspacingIn", input.backspacingIn, -10, 30, "4.5", "in");
  const beadSeatBs = ref === "flange" ? bs - flange : bs;
  const offset = (beadSeatBs - width / 2) * MM_PER_IN;
  if (Math.abs(offset) > (width * MM_PER_IN) / 2 + OFFSET_MARGIN_MM) {
    throw new FitmentInputError(
      "backspacingIn",
      `backspacingIn ${bs} in on a ${width} in wide wheel gives offset ${offset.toFixed(1)} mm, beyond ${OFFSET_MARGIN_MM} mm past a bead seat (e.g. 4.5)`,
      bs,
    );
  }
  return offset === 0 ? 0 : offset;
}

/**
 * Backspacing (inches) from offset (mm).
 *
 * @example
 * backspacingFromOffset({ widthIn: 9.5, offsetMm: -31.75, measuredFrom: "bead-seat" }); // 3.5
 * backspacingFromOffset({ widthIn: 9.5, offsetMm: -31.75, measuredFrom: "flange" });    // 4
 */
export function backspacingFromOffset(input: WheelBasis & { offsetMm: number }): number {
  const { width, ref, flange } = checkBasis(input);
  const offset = checkOffsetMm(input.offsetMm, width);
  return width / 2 + offset / MM_PER_IN + (ref === "flange" ? flange : 0);
}
