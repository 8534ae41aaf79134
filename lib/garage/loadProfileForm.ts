/**
 * The load profile form's texts read into a profile (kPa, kg, mm) in the screen's unit system,
 * with the messages of both the reader (lib/comparisons/measureEntry: a figure in another unit
 * than the label's is refused with the conversion spelled out) and the profile's own checks.
 */
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type MeasureEntry, readMeasure } from "@/lib/comparisons/measureEntry";
import type { VehicleKind } from "@/lib/fitment";
import {
  type CurrentTire,
  type LoadProfile,
  MEASURE_KEYS,
  type MeasureKey,
  PROFILE_SPEC,
  type ProfileErrors,
  checkLoadProfile,
  profileLabels,
} from "@/lib/garage/loadProfile";

export interface ProfileTexts {
  entries: Record<MeasureKey, MeasureEntry>;
  placardTire: string;
  vehicleKind: VehicleKind;
}

/**
 * @example
 * readProfileForm({ entries: { placardFrontKpa: typed("35"), … }, placardTire: "265/70R17 113T", vehicleKind: "light-truck" }, IMPERIAL, current);
 * // { profile: { units: "imperial", placardFrontKpa: 241.3…, … }, errors: {} }
 */
export function readProfileForm(
  texts: ProfileTexts,
  prefs: DisplayPrefs,
  current: CurrentTire,
): { profile: LoadProfile | null; errors: ProfileErrors } {
  const labels = profileLabels(prefs.units);
  const errors: ProfileErrors = {};
  const profile = { units: prefs.units, vehicleKind: texts.vehicleKind, placardTire: texts.placardTire.trim() || null } as LoadProfile;
  for (const k of MEASURE_KEYS) {
    const r = readMeasure(texts.entries[k], PROFILE_SPEC[k], prefs, labels[k]);
    if ("error" in r) errors[k] = r.error;
    profile[k] = "value" in r ? r.value : null;
  }
  if (Object.keys(errors).length > 0) return { profile: null, errors };
  const checked = checkLoadProfile(profile, current);
  return Object.keys(checked).length > 0 ? { profile: null, errors: checked } : { profile, errors };
}
