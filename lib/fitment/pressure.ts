/**
 * Pressure conversion for the converter page, through convert-units (the reference library the
 * tests hold the engine's own psi factor against). Kept apart from lib/fitment/index.ts so that
 * only the pages that convert pressures download convert-units.
 */
import convert from "convert-units";

/** Pressure units accepted by {@link convertPressure}. */
export type PressureUnit = "psi" | "kPa" | "bar";

/**
 * Converts a pressure between psi, kPa and bar through convert-units.
 * @example convertPressure(50, "psi", "kPa"); // ≈ 344.7
 */
export function convertPressure(value: number, from: PressureUnit, to: PressureUnit): number {
  if (from === to) return value;
  return convert(value).from(from).to(to);
}
