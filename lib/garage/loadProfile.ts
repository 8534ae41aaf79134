/**
 * A garage vehicle's load profile: the door placard (the size printed there, cold pressures,
 * axle ratings), the axle weights from a scale ticket and the body points measured with the
 * current tires. Stored in SI (kPa, kg, mm); typed and shown in the inch/metric choice through
 * lib/comparisons/measureEntry, so a figure someone inflates by is converted, never relabelled.
 *
 * Checks are the workspace's own (lib/comparisons/loadPlan and trailPlan over the engine): the
 * placard tire must carry the axle loads entered and the placard pressure must be within what that
 * tire allows; a body point must be outside the current tire's circle. Groups are kept whole: a
 * placard size without its pressures, or a corner height without its distance from the axle,
 * computes nothing, so it is refused rather than half-stored.
 */
import { LOAD_FIELD_BOUNDS, LOAD_SPEC, type LoadLabels, planLoad } from "@/lib/comparisons/loadPlan";
import { type DisplayPrefs } from "@/lib/comparisons/format";
import { type MeasureSpec, type Quantity, entryFromValue, measureUnit, readMeasure } from "@/lib/comparisons/measureEntry";
import { TRAIL_SPEC, type TrailField, type TrailLabels, planTrail } from "@/lib/comparisons/trailPlan";
import type { VehicleKind } from "@/lib/fitment";

export type Units = DisplayPrefs["units"];

/** The measured figures, each with its SI unit in its name. */
export const MEASURE_KEYS = [
  "placardFrontKpa",
  "placardRearKpa",
  "frontGawrKg",
  "rearGawrKg",
  "frontAxleKg",
  "rearAxleKg",
  "frontCornerHeightMm",
  "frontCornerAheadMm",
  "rearCornerHeightMm",
  "rearCornerBehindMm",
  "midHeightMm",
  "wheelbaseMm",
] as const;
export type MeasureKey = (typeof MEASURE_KEYS)[number];
export type ProfileField = MeasureKey | "placardTire";

/** What the vehicle keeps (the API's shape; also the body of a save, with `units` the screen's choice). */
export type LoadProfile = {
  units: Units;
  vehicleKind: VehicleKind;
  placardTire: string | null;
} & Record<MeasureKey, number | null>;

export type ProfileErrors = Partial<Record<ProfileField, string>>;

const QUANTITY: Record<MeasureKey, Quantity> = {
  placardFrontKpa: "pressure",
  placardRearKpa: "pressure",
  frontGawrKg: "load",
  rearGawrKg: "load",
  frontAxleKg: "load",
  rearAxleKg: "load",
  frontCornerHeightMm: "length",
  frontCornerAheadMm: "length",
  rearCornerHeightMm: "length",
  rearCornerBehindMm: "length",
  midHeightMm: "length",
  wheelbaseMm: "length",
};
export const PROFILE_QUANTITIES: Readonly<Record<MeasureKey, Quantity>> = QUANTITY;

const L = LOAD_SPEC;
const T = TRAIL_SPEC;
/** Bounds and examples: the workspace's own fields' (lib/comparisons/loadPlan, trailPlan). */
export const PROFILE_SPEC: Readonly<Record<MeasureKey, MeasureSpec>> = {
  placardFrontKpa: L.placardFront,
  placardRearKpa: L.placardRear,
  frontGawrKg: L.frontAxle,
  rearGawrKg: L.rearAxle,
  frontAxleKg: L.frontAxle,
  rearAxleKg: L.rearAxle,
  frontCornerHeightMm: T.frontHeight,
  frontCornerAheadMm: T.frontAhead,
  rearCornerHeightMm: T.rearHeight,
  rearCornerBehindMm: T.rearBehind,
  midHeightMm: T.midHeight,
  wheelbaseMm: T.wheelbase,
};

const BASE_LABEL: Record<MeasureKey, string> = {
  placardFrontKpa: "Placard cold pressure, front",
  placardRearKpa: "Placard cold pressure, rear",
  frontGawrKg: "Front axle rating, GAWR",
  rearGawrKg: "Rear axle rating, GAWR",
  frontAxleKg: "Front axle weight, scale ticket",
  rearAxleKg: "Rear axle weight, scale ticket",
  frontCornerHeightMm: "Front corner height",
  frontCornerAheadMm: "Front corner ahead of the front axle",
  rearCornerHeightMm: "Rear corner height",
  rearCornerBehindMm: "Rear corner behind the rear axle",
  midHeightMm: "Lowest point midway, height",
  wheelbaseMm: "Wheelbase",
};

const prefsOf = (units: Units): DisplayPrefs => ({ units, lengths: "decimal" });

/** The form's labels in a unit system; every message names its field by this same text. */
export function profileLabels(units: Units): Record<ProfileField, string> {
  const prefs = prefsOf(units);
  const out = { placardTire: "Tire size on the placard" } as Record<ProfileField, string>;
  for (const k of MEASURE_KEYS) out[k] = `${BASE_LABEL[k]} (${measureUnit(QUANTITY[k], prefs)})`;
  return out;
}

/** Pairs (and the placard's three) that compute only together. */
const GROUPS: { keys: ProfileField[]; why: string }[] = [
  { keys: ["placardTire", "placardFrontKpa", "placardRearKpa"], why: "the placard's size and both cold pressures go together" },
  { keys: ["frontAxleKg", "rearAxleKg"], why: "a scale ticket gives both axles" },
  { keys: ["frontCornerHeightMm", "frontCornerAheadMm"], why: "the approach angle needs the height and the distance ahead of the axle" },
  { keys: ["rearCornerHeightMm", "rearCornerBehindMm"], why: "the departure angle needs the height and the distance behind the axle" },
  { keys: ["midHeightMm", "wheelbaseMm"], why: "the breakover angle needs the lowest point midway and the wheelbase" },
];

const given = (p: LoadProfile, k: ProfileField) => (k === "placardTire" ? (p.placardTire ?? "").trim() !== "" : p[k] !== null);

/** What the current tire is: the body points are measured with it. */
export interface CurrentTire {
  text: string;
  diameterMm: number;
}

/** The placard tire's checks: pressure within its maximum, each axle's half within its maximum load. */
function checkPlacard(p: LoadProfile, labels: Record<ProfileField, string>, errors: ProfileErrors): void {
  const tire = p.placardTire!.trim();
  // Each set of axle figures entered is checked in turn; with none, only the pressures are (the
  // smallest axle load the fields accept stands in, and its own messages are not reported).
  const sets = [
    { front: "frontAxleKg", rear: "rearAxleKg" },
    { front: "frontGawrKg", rear: "rearGawrKg" },
  ] as const;
  const runs = sets.filter((s) => p[s.front] !== null || p[s.rear] !== null);
  for (const s of runs.length ? runs : [null]) {
    const l: LoadLabels = {
      placardTire: labels.placardTire,
      placardFront: labels.placardFrontKpa,
      placardRear: labels.placardRearKpa,
      frontAxle: s ? labels[s.front] : "",
      rearAxle: s ? labels[s.rear] : "",
      plannedTire: labels.placardTire,
      plannedMaxLoad: labels.placardTire,
      plannedMaxPressure: labels.placardTire,
    };
    const { errors: e } = planLoad(
      {
        placardTire: tire,
        plannedTire: tire,
        vehicle: p.vehicleKind,
        placardFrontKpa: p.placardFrontKpa!,
        placardRearKpa: p.placardRearKpa!,
        frontAxleKg: (s && p[s.front]) ?? LOAD_FIELD_BOUNDS.axleKg.min,
        rearAxleKg: (s && p[s.rear]) ?? LOAD_FIELD_BOUNDS.axleKg.min,
      },
      l,
      prefsOf(p.units),
    );
    if (e.placardTire) errors.placardTire ??= e.placardTire;
    if (e.placardFront) errors.placardFrontKpa ??= e.placardFront;
    if (e.placardRear) errors.placardRearKpa ??= e.placardRear;
    if (s && e.frontAxle && p[s.front] !== null) errors[s.front] ??= e.frontAxle;
    if (s && e.rearAxle && p[s.rear] !== null) errors[s.rear] ??= e.rearAxle;
  }
}

const TRAIL_KEY: Record<TrailField, MeasureKey | null> = {
  frontHeight: "frontCornerHeightMm",
  frontAhead: "frontCornerAheadMm",
  rearHeight: "rearCornerHeightMm",
  rearBehind: "rearCornerBehindMm",
  wheelbase: "wheelbaseMm",
  midHeight: "midHeightMm",
  lift: null,
};

/** Trail labels built from the profile's labels (the lift is not a stored figure). */
export function trailLabelsOf(labels: Record<ProfileField, string>): TrailLabels {
  const out = { lift: "Lift" } as TrailLabels;
  for (const [t, k] of Object.entries(TRAIL_KEY)) if (k) out[t as TrailField] = labels[k];
  return out;
}

/** Every body point must be outside the current tire's circle (the engine's check, SAE J1100 geometry). */
function checkBodyPoints(p: LoadProfile, current: CurrentTire, labels: Record<ProfileField, string>, errors: ProfileErrors): void {
  const { errors: e } = planTrail(
    {
      currentDiameterMm: current.diameterMm,
      plannedDiameterMm: current.diameterMm,
      frontHeightMm: p.frontCornerHeightMm,
      frontAheadMm: p.frontCornerAheadMm,
      rearHeightMm: p.rearCornerHeightMm,
      rearBehindMm: p.rearCornerBehindMm,
      wheelbaseMm: p.wheelbaseMm,
      midHeightMm: p.midHeightMm,
      liftMm: 0,
    },
    trailLabelsOf(labels),
  );
  for (const [t, m] of Object.entries(e)) {
    const k = TRAIL_KEY[t as TrailField];
    if (k && m) errors[k] ??= `${m.replace(/\.?$/, "")} (measured with the current tire, ${current.text}).`;
  }
}

/**
 * The field messages for a profile, in the unit system it was entered in; empty when it may be
 * stored. The same function runs in the form and in the route handler.
 *
 * @example
 * checkLoadProfile({ ...profile, placardFrontKpa: 400 }, { text: "265/70R17 113T", diameterMm: 802 });
 * // { placardFrontKpa: "Placard cold pressure, front (psi): 400 kPa (58 psi) is above the highest pressure 265/70R17 113T allows, …" }
 */
export function checkLoadProfile(p: LoadProfile, current: CurrentTire): ProfileErrors {
  const labels = profileLabels(p.units);
  const prefs = prefsOf(p.units);
  const errors: ProfileErrors = {};
  for (const k of MEASURE_KEYS) {
    const v = p[k];
    if (v === null) continue;
    // The stored value read back through the field's own reader: the bounds are stated in the field's unit.
    const r = readMeasure(entryFromValue(v, QUANTITY[k], prefs), PROFILE_SPEC[k], prefs, labels[k]);
    if ("error" in r) errors[k] = r.error;
  }
  if (p.placardTire !== null && p.placardTire.length > 80) errors.placardTire = `${labels.placardTire}: use at most 80 characters.`;
  for (const g of GROUPS) {
    const present = g.keys.filter((k) => given(p, k));
    if (present.length === 0 || present.length === g.keys.length) continue;
    for (const k of g.keys.filter((k) => !given(p, k))) errors[k] ??= `${labels[k]}: enter it too, or clear the others: ${g.why}.`;
  }
  if (Object.keys(errors).length > 0) return errors;
  if (given(p, "placardTire")) checkPlacard(p, labels, errors);
  checkBodyPoints(p, current, labels, errors);
  return errors;
}

/** A profile with nothing entered. */
export function emptyProfile(units: Units): LoadProfile {
  const p = { units, vehicleKind: "light-truck", placardTire: null } as LoadProfile;
  for (const k of MEASURE_KEYS) p[k] = null;
  return p;
}

/** Where the axle loads a pressure is set for come from, as the sentences that cite them say it. */
export type AxleLoadSource = "scale ticket" | "GAWR axle ratings";

/** The axle loads the pressure is set for: the scale ticket when there is one, else the axle ratings. */
export function axleLoadsOf(p: LoadProfile): { frontKg: number; rearKg: number; from: AxleLoadSource } | null {
  if (p.frontAxleKg !== null && p.rearAxleKg !== null) return { frontKg: p.frontAxleKg, rearKg: p.rearAxleKg, from: "scale ticket" };
  if (p.frontGawrKg !== null && p.rearGawrKg !== null) return { frontKg: p.frontGawrKg, rearKg: p.rearGawrKg, from: "GAWR axle ratings" };
  return null;
}
