/**
 * The workspace's field labels, one list for the screen, its messages and the link note, so a
 * message names a field exactly as the screen labels it. A label states the field's unit; where
 * the unit follows the display choice (cruise speeds, fender line) the label does too. A setup's
 * fields are labelled by lib/setup/fields.ts, the same on every screen.
 */
import { SETUP_FIELD_LABEL, type SetupFieldPath } from "@/lib/setup/fields";
import type { DisplayPrefs } from "./format";

export const SIDE_LABEL = { current: "Current setup", planned: "Planned setup" } as const;

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
