/**
 * Typed input errors for the fitment engine.
 *
 * Policy: every public function validates its input and throws a {@link FitmentInputError}
 * (or a subclass) whose message says which field is wrong, why, and shows an accepted example.
 * Nothing is clamped silently and no output is ever NaN or Infinity.
 */

/**
 * Base class of every input error thrown by `lib/fitment`.
 *
 * @example
 * try { offsetFromBackspacing({ widthIn: 0, backspacingIn: 4, measuredFrom: "bead-seat" }); }
 * catch (e) { if (e instanceof FitmentInputError) console.log(e.field); } // "widthIn"
 */
export class FitmentInputError extends Error {
  /** The input field (dotted path) that is wrong, e.g. `"wheel.widthIn"`. */
  readonly field: string;
  /** The offending value as received. */
  readonly value: unknown;

  constructor(field: string, message: string, value?: unknown) {
    super(message);
    this.name = "FitmentInputError";
    this.field = field;
    this.value = value;
  }
}

/**
 * Thrown by `parseTireSize` (and everything that accepts a tire size as text) when the text is
 * not a tire size designation the engine understands. `message` names the size ('Tire size
 * "285/70/17": …'); `reason` is the same without that name, for a screen that puts its own field
 * label first, so the field is not named twice.
 *
 * @example
 * try { parseTireSize("265/7R17"); } catch (e) { console.log(e instanceof TireSizeError); } // true
 * try { parseTireSize("285/70/17"); } catch (e) { console.log((e as TireSizeError).reason); }
 * // "not a recognised tire size designation; did you mean 285/70R17? (accepted forms: …)"
 */
export class TireSizeError extends FitmentInputError {
  readonly reason: string;
  constructor(message: string, value?: unknown, field = "tire", reason = message) {
    super(field, message, value);
    this.name = "TireSizeError";
    this.reason = reason;
  }
}

/**
 * Thrown when a figure is beyond what the tire allows rather than mistyped: a load above the
 * tire's maximum (`unit` "kg") or a pressure above its sidewall maximum (`unit` "kPa"). The
 * message says why and gives an accepted example; `limit` is the tire's figure.
 *
 * @example
 * try { pressureForLoad("LT265/75R16 123/120S LRE", 1600); }
 * catch (e) { if (e instanceof TireLimitError) console.log(e.limit, e.unit); } // 1550 "kg"
 */
export class TireLimitError extends FitmentInputError {
  /** The tire's maximum the value exceeds. */
  readonly limit: number;
  readonly unit: "kg" | "kPa";

  constructor(field: string, message: string, value: unknown, limit: number, unit: "kg" | "kPa") {
    super(field, message, value);
    this.name = "TireLimitError";
    this.limit = limit;
    this.unit = unit;
  }
}

/**
 * Thrown by the trail-angle functions when a body point is on or inside the tire's circle (the
 * tire would reach it) or sits over the tire (it limits no angle). `tireRadiusMm` is the radius
 * used.
 *
 * @example
 * try { approachAngleDeg({ tireDiameterMm: 800, cornerHeightMm: 500, cornerOffsetMm: 300 }); }
 * catch (e) { if (e instanceof BodyPointError) console.log(e.field); } // "cornerHeightMm"
 */
export class BodyPointError extends FitmentInputError {
  readonly tireRadiusMm: number;

  constructor(field: string, message: string, value: unknown, tireRadiusMm: number) {
    super(field, message, value);
    this.name = "BodyPointError";
    this.tireRadiusMm = tireRadiusMm;
  }
}

/** Formats a received value for an error message. */
function show(value: unknown): string {
  if (typeof value === "string") return JSON.stringify(value.length > 60 ? value.slice(0, 60) + "…" : value);
  if (typeof value === "number") return String(value);
  if (value === null) return "null";
  return typeof value;
}

/**
 * Checks that `value` is a finite number within `[min, max]`; returns it or throws a
 * {@link FitmentInputError} naming the field, the accepted range and an example.
 *
 * @example
 * requireNumber("wheel.widthIn", 9.5, 3, 20, "9.5"); // 9.5
 * requireNumber("wheel.widthIn", 0, 3, 20, "9.5");   // throws FitmentInputError
 */
export function requireNumber(field: string, value: unknown, min: number, max: number, example: string, unit = ""): number {
  const u = unit ? ` ${unit}` : "";
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new FitmentInputError(field, `${field} must be a finite number${u}, got ${show(value)} (e.g. ${example})`, value);
  }
  if (value < min || value > max) {
    throw new FitmentInputError(field, `${field} must be between ${min} and ${max}${u}, got ${value} (e.g. ${example})`, value);
  }
  return value;
}

/**
 * Like {@link requireNumber} but also requires an integer.
 *
 * @example
 * requireInteger("boltCount", 8, 3, 64, "8"); // 8
 */
export function requireInteger(field: string, value: unknown, min: number, max: number, example: string): number {
  requireNumber(field, value, min, max, example);
  if (!Number.isInteger(value)) {
    throw new FitmentInputError(field, `${field} must be a whole number, got ${show(value)} (e.g. ${example})`, value);
  }
  return value as number;
}

/**
 * Checks that `value` is an object (the input of a function taking named fields); returns it or
 * throws a {@link FitmentInputError} naming the field with an example of the expected shape.
 *
 * @example
 * requireObject("input", { tireDiameterMm: 800 }, "{ tireDiameterMm: 800 }"); // the object
 * requireObject("input", null, "{ tireDiameterMm: 800 }");                    // throws
 */
export function requireObject<T extends object>(field: string, value: T, example: string): T {
  if (value === null || typeof value !== "object") {
    throw new FitmentInputError(field, `${field} must be an object such as ${example}, got ${show(value)}`, value);
  }
  return value;
}
