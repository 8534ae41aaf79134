/**
 * The workspace's field labels, one list for the screen, its messages and the link note, so a
 * message names a field exactly as the screen labels it. A label states the field's unit; where
 * the unit follows the display choice (cruise speeds, fender line) the label does too.
 */
import type { DisplayPrefs } from "./format";

export const SIDE_LABEL = { current: "Current setup", planned: "Planned setup" } as const;

/** Setup fields by their input path. */
export const SETUP_FIELD_LABEL = {
  tire: "Tire size",
  wheelDiameterIn: "Wheel diameter (in)",
  wheelWidthIn: "Wheel width (in)",
  "position.offsetMm": "Offset (mm)",
  "position.backspacingIn": "Backspacing (in)",
  "position.reference": "Measured to",
  "position.flangeIn": "Flange allowance (in)",
  spacerMm: "Spacer (mm, optional)",
} as const;
export type SetupFieldPath = keyof typeof SETUP_FIELD_LABEL;

/** Vehicle fields by their input path, without the unit where the unit follows the display choice. */
export const VEHICLE_FIELD_BASE = {
  kingpinInclinationDeg: "Kingpin inclination (°)",
  axleRatio: "Axle ratio",
  transmissionRatio: "Top-gear ratio",
  cruiseSpeedsMph: "Cruise speeds",
  fenderLineMm: "Fender line from hub face",
  firstGearRatio: "First-gear ratio (optional)",
  transferLowRatio: "Transfer-case low ratio (optional)",
} as const;
export type VehicleFieldPath = keyof typeof VEHICLE_FIELD_BASE;

/** The unit the cruise speeds are typed in. */
export const speedUnit = (prefs: DisplayPrefs): "mph" | "km/h" => (prefs.units === "metric" ? "km/h" : "mph");
/** The unit the fender line is typed in. */
export const fenderUnit = (prefs: DisplayPrefs): "in" | "mm" => (prefs.units === "metric" ? "mm" : "in");

/**
 * A vehicle field's label as the screen shows it for this display choice.
 *
 * @example
 * vehicleFieldLabel("cruiseSpeedsMph", { units: "metric", lengths: "decimal" }); // "Cruise speeds (km/h)"
 * vehicleFieldLabel("fenderLineMm", { units: "imperial", lengths: "fraction" }); // "Fender line from hub face (in)"
 */
export function vehicleFieldLabel(path: VehicleFieldPath, prefs: DisplayPrefs): string {
  if (path === "cruiseSpeedsMph") return `${VEHICLE_FIELD_BASE.cruiseSpeedsMph} (${speedUnit(prefs)})`;
  if (path === "fenderLineMm") return `${VEHICLE_FIELD_BASE.fenderLineMm} (${fenderUnit(prefs)})`;
  return VEHICLE_FIELD_BASE[path];
}

/**
 * The label of a comparison input path as the screen shows it, or null for a path that is no
 * field. `withSide` puts the setup's panel in front, for a message shown away from the field.
 *
 * @example
 * inputFieldLabel("planned.position.offsetMm", prefs); // "Offset (mm)"
 * inputFieldLabel("current.wheelWidthIn", prefs, { withSide: true }); // "Current setup · Wheel width (in)"
 * inputFieldLabel("vehicle.cruiseSpeedsMph.1", { units: "metric", lengths: "decimal" }); // "Cruise speeds (km/h)"
 */
export function inputFieldLabel(key: string, prefs: DisplayPrefs, opts: { withSide?: boolean } = {}): string | null {
  const [head, ...rest] = key.split(".");
  if (head === "vehicle") {
    const field = rest[0] ?? "";
    return field in VEHICLE_FIELD_BASE ? vehicleFieldLabel(field as VehicleFieldPath, prefs) : null;
  }
  if (head !== "current" && head !== "planned") return null;
  const path = rest.join(".");
  if (!(path in SETUP_FIELD_LABEL)) return null;
  const label = SETUP_FIELD_LABEL[path as SetupFieldPath];
  return opts.withSide ? `${SIDE_LABEL[head]} · ${label}` : label;
}

/**
 * A bound as a message states it in another unit: rounded inward (a minimum up, a maximum down)
 * so that a figure typed at the stated bound is accepted.
 *
 * @example
 * boundText(500 / 25.4, "max", 2); // "19.68"
 * boundText(5 * 1.609344, "min", 1); // "8.1"
 */
export function boundText(v: number, side: "min" | "max", decimals: number): string {
  const f = 10 ** decimals;
  const r = (side === "min" ? Math.ceil(v * f - 1e-9) : Math.floor(v * f + 1e-9)) / f;
  return String(r === 0 ? 0 : r);
}

/** Examples each setup field accepts (used in its messages and hints). */
export const SETUP_FIELD_EXAMPLE = {
  tire: "265/70R17",
  wheelDiameterIn: "17",
  wheelWidthIn: "9 or 8-1/2",
  "position.offsetMm": "-12 or 25 (minus for a wheel that sits further out)",
  "position.backspacingIn": "4-3/4, 4¾ or 4.75",
  "position.flangeIn": "1/2 or 0.5",
  spacerMm: "25 (leave empty for none)",
} as const;

/**
 * The messages of a length field: each names the field as labelled (`label`), gives an example
 * the field accepts and states bounds in the field's own unit. Shared by the workspace's form
 * reading (draft.ts) and the zod fields of the garage forms and handlers (lib/setup/schema.ts).
 *
 * @example
 * lengthMessages("Spacer (mm, optional)", "mm", "25").fraction("1-1/2");
 * // "Spacer (mm, optional): “1-1/2” is a fraction, which is read only in inches — write “1-1/2 in”, or mm as a decimal, e.g. 25."
 */
export function lengthMessages(label: string, unit: "in" | "mm", example: string) {
  return {
    empty: `${label}: enter ${unit === "in" ? "inches" : "mm"}, e.g. ${example}.`,
    unreadable: unit === "in" ? `${label}: not a length in inches, e.g. ${example}.` : `${label}: not a length in mm, e.g. ${example}; inches need their unit (1 in).`,
    fraction: (typed: string) => `${label}: “${typed.trim()}” is a fraction, which is read only in inches — write “${typed.trim()} in”, or mm as a decimal, e.g. ${example}.`,
    bounds: (min: string, max: string) => `${label}: must be between ${min} and ${max} ${unit}, e.g. ${example}.`,
  };
}
