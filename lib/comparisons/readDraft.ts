/**
 * What people type into the comparison form (text per field, draft.ts) → the validated comparison
 * input, and the text rewritten for another display choice.
 * Lengths are read by lib/setup's reader (the engine's `parseLength`), so `4-3/4`, `4¾`,
 * `4 3/4 in`, `4.75"` and `120.65 mm` all work; a bare number takes the unit the field's label
 * states (offset and spacer mm, wheel sizes and backspacing inches, the fender line the chosen
 * display unit), and a fraction is read only as inches: `1-1/2` in a mm field is refused with a
 * message, not 1.5 mm. Each setup is checked by `checkSetup` with its messages; the vehicle's
 * messages name the field as labelled (fields.ts), give an example the field accepts and state
 * bounds in the field's unit.
 */
import { KM_PER_MILE, MM_PER_IN, inToMm, mmToIn } from "@/lib/fitment/units";
import { checkSetup } from "@/lib/setup/check";
import { boundText, lengthMessages } from "@/lib/setup/messages";
import type { Setup, SetupForm } from "@/lib/setup/model";
import { readLength, tidy } from "@/lib/setup/read";
import { checkComparison } from "./checkInput";
import {
  type Draft,
  type DraftErrors,
  type SetupDraft,
  type VehicleDraft,
  draftFromInput,
  inchText,
  readNumber,
  vehicleUnitFields,
} from "./draft";
import { type VehicleFieldPath, fenderUnit, inputFieldLabel, speedUnit, vehicleFieldLabel } from "./fields";
import type { DisplayPrefs } from "./format";
import { type ComparisonInput, VEHICLE_LIMITS } from "./model";

/**
 * One field's own value: the field's text read alone, every other field taken from `good` (a
 * valid input), so another field's error cannot hide or change it. null when the text does not
 * read (its own error).
 */
function readAlone<T>(good: ComparisonInput, prefs: DisplayPrefs, put: (d: Draft) => void, pick: (input: ComparisonInput) => T): T | null {
  const probe = draftFromInput(good, prefs);
  put(probe);
  const { input } = readDraft(probe, prefs);
  return input ? pick(input) : null;
}

/**
 * Rewrites the unit-bearing text of a draft for another display choice, field by field: a field
 * whose own text reads under `from` is rewritten from its value under `to`, whatever the other
 * fields hold (an axle ratio of "abc" must not leave 5-1/2 in relabelled as mm); a field whose
 * text does not read keeps it, and when the unit changed it is listed in `unconverted`.
 * `good` is the last valid input (it fills in the other fields while one is read).
 *
 * @example
 * // Inch → metric with the axle ratio "abc": the fender line 5-1/2 in becomes 139.7 mm all the same
 * // (shown to the mm; the exact 139.7 is kept behind the text).
 * convertDraft(draft, good, { units: "imperial", lengths: "fraction" }, { units: "metric", lengths: "decimal" }).draft.vehicle.fender; // "140"
 */
export function convertDraft(
  draft: Draft,
  good: ComparisonInput,
  from: DisplayPrefs,
  to: DisplayPrefs,
): { draft: Draft; unconverted: VehicleFieldPath[] } {
  const v = draft.vehicle;
  const hasFender = v.fender.trim() !== "";
  /**
   * A unit-bearing text's value: `exact`, the value the draft keeps behind it, while the text is
   * the one written from that value; otherwise the text read alone.
   */
  const valueOf = <T>(field: "cruise" | "fender", exact: T | undefined, pick: (i: ComparisonInput) => T): T | null =>
    exact !== undefined && v.exact?.[field] === v[field] ? exact : readAlone(good, from, (d) => void (d.vehicle[field] = v[field]), pick);
  const cruiseMph = valueOf("cruise", v.exact?.cruiseMph, (i) => i.vehicle.cruiseSpeedsMph);
  const fenderMm = hasFender ? valueOf("fender", v.exact?.fenderMm, (i) => i.vehicle.fenderLineMm) : null;
  const fenderRead = !hasFender || fenderMm !== null;
  const fresh = vehicleUnitFields(
    { ...good, vehicle: { ...good.vehicle, cruiseSpeedsMph: cruiseMph ?? good.vehicle.cruiseSpeedsMph, fenderLineMm: fenderMm } },
    to,
  );
  const vehicle: VehicleDraft = {
    ...v,
    cruise: cruiseMph === null ? v.cruise : fresh.cruise,
    fender: fenderRead ? fresh.fender : v.fender,
    // Only a text written here stands for an exact value; a kept text is read afresh.
    exact: {
      cruise: cruiseMph === null ? null : fresh.cruise,
      cruiseMph: cruiseMph ?? [],
      fender: fenderRead ? fresh.fender : null,
      fenderMm,
    },
  };
  const unconverted: VehicleFieldPath[] = [];
  if (from.units !== to.units) {
    if (cruiseMph === null) unconverted.push("cruiseSpeedsMph");
    if (!fenderRead) unconverted.push("fenderLineMm");
  }
  // Backspacing and flange allowance stay inches whatever the choice; only their writing
  // (decimal or sixteenths) follows it, for each text that reads as a length.
  const inches = (text: string): string => {
    const mm = readLength(text, "in");
    return typeof mm === "number" ? inchText(tidy(mmToIn(mm)), to) : text;
  };
  const setup = (side: "current" | "planned"): SetupDraft => {
    const d = draft[side];
    return d.mode === "backspacing" ? { ...d, backspacing: inches(d.backspacing), flange: inches(d.flange) } : d;
  };
  return { draft: { current: setup("current"), planned: setup("planned"), vehicle }, unconverted };
}

type Bounds = { min: number; max: number };
const inBounds = (v: number, b: Bounds) => v >= b.min && v <= b.max;
const lower = (s: string) => `${s[0]?.toLowerCase() ?? ""}${s.slice(1)}`;

/**
 * A length field of the form. `unit`: the unit the field is labelled in (a bare number is
 * read in it; fractions only where it is inches); `bounds` in that unit. Returns the value in
 * that unit, or NaN after recording the message.
 */
function lengthField(text: string, unit: "in" | "mm", bounds: Bounds, label: string, example: string, fail: (m: string) => number): number {
  const m = lengthMessages(label, unit, example);
  if (text.trim() === "") return fail(m.empty);
  const mm = readLength(text, unit);
  if (typeof mm !== "number") return fail(m.because(mm ?? "unreadable", text));
  const v = unit === "in" ? tidy(mmToIn(mm)) : mm;
  return inBounds(v, bounds) ? v : fail(m.bounds(String(bounds.min), String(bounds.max)));
}

/** A setup's text as lib/setup's form shape: only the fields of the chosen mode are read. */
function setupForm(d: SetupDraft): SetupForm {
  return {
    tire: d.tire,
    wheelDiameterIn: d.diameter,
    wheelWidthIn: d.width,
    position:
      d.mode === "offset"
        ? { mode: "offset", offsetMm: d.offset }
        : { mode: "backspacing", backspacingIn: d.backspacing, reference: d.reference, flangeIn: d.flange },
    spacerMm: d.spacer,
  };
}

/** One setup's text through `checkSetup`: the setup, or null with each field's message in `errors`. */
function readSetup(side: "current" | "planned", d: SetupDraft, errors: DraftErrors): Setup | null {
  const r = checkSetup(setupForm(d), [side], { text: true });
  if (r.ok) return r.value;
  for (const i of r.issues) {
    const key = i.path.join(".");
    if (!(key in errors)) errors[key] = i.message;
  }
  return null;
}

/**
 * Reads the form text into a comparison input. Returns the input when every field is valid
 * (schema included), otherwise null, and the error of each field in `errors`.
 */
export function readDraft(draft: Draft, prefs: DisplayPrefs): { input: ComparisonInput | null; errors: DraftErrors } {
  const errors: DraftErrors = {};
  const v = draft.vehicle;
  const at = (path: VehicleFieldPath) => (message: string) => {
    errors[`vehicle.${path}`] = message;
    return NaN;
  };
  const label = (path: VehicleFieldPath) => vehicleFieldLabel(path, prefs);
  /** A plain number (ratio, degrees) within bounds. */
  const plainNumber = (
    text: string,
    path: VehicleFieldPath,
    b: Bounds,
    unit: string,
    unreadable: string,
    example: string,
    suffix?: RegExp,
  ): number => {
    const n = readNumber(text, suffix);
    if (n === null) return at(path)(`${label(path)}: ${unreadable}`);
    return inBounds(n, b) ? n : at(path)(`${label(path)}: must be between ${b.min} and ${b.max}${unit}, e.g. ${example}.`);
  };
  const kpi =
    v.kpi.trim() === ""
      ? null
      : plainNumber(
          v.kpi,
          "kingpinInclinationDeg",
          VEHICLE_LIMITS.kingpinInclinationDeg,
          "°",
          "enter degrees, e.g. 8, or leave it empty.",
          "8",
          /°|deg$/i,
        );
  // "3.73:1" is a common way to write a ratio.
  const ratioText = (t: string) => (/^\s*\d+(\.\d+)?\s*:\s*1\s*$/.test(t) ? (t.split(":")[0] ?? "") : t);
  const axle = plainNumber(ratioText(v.axle), "axleRatio", VEHICLE_LIMITS.axleRatio, "", "enter a ratio, e.g. 3.73 (or 3.73:1).", "3.73");
  const top = plainNumber(
    v.top,
    "transmissionRatio",
    VEHICLE_LIMITS.transmissionRatio,
    "",
    "enter a ratio, e.g. 1.00 (direct) or 0.70 (overdrive).",
    "1.00",
  );
  /** A ratio that may be left empty (then null: not entered). */
  const optionalRatio = (text: string, path: "firstGearRatio" | "transferLowRatio", example: string): number | null =>
    text.trim() === ""
      ? null
      : plainNumber(
          ratioText(text),
          path,
          VEHICLE_LIMITS[path],
          "",
          `enter a ratio, e.g. ${example} (or ${example}:1), or leave it empty.`,
          example,
        );
  const first = optionalRatio(v.first, "firstGearRatio", "4.03");
  const low = optionalRatio(v.low, "transferLowRatio", "2.72");

  const sUnit = speedUnit(prefs);
  const metric = prefs.units === "metric";
  const speedExample = metric ? "100, 110" : "60, 70";
  const parts = v.cruise.split(/[,;\s]+/).filter((p) => p !== "" && p.toLowerCase() !== sUnit);
  const speeds = parts.map((p) => readNumber(p));
  const exact = v.exact;
  let cruise: number[];
  if (exact && exact.cruise === v.cruise) cruise = exact.cruiseMph;
  else if (parts.length === 0 || speeds.some((x) => x === null))
    cruise = [
      at("cruiseSpeedsMph")(`${label("cruiseSpeedsMph")}: enter one to six speeds in ${sUnit}, separated by commas, e.g. ${speedExample}.`),
    ];
  else if (parts.length > VEHICLE_LIMITS.cruiseCount.max)
    cruise = [at("cruiseSpeedsMph")(`${label("cruiseSpeedsMph")}: enter at most six speeds, e.g. ${speedExample}.`)];
  else {
    cruise = speeds.map((x) => tidy(metric ? (x as number) / KM_PER_MILE : (x as number)));
    if (!cruise.every((mph) => inBounds(mph, VEHICLE_LIMITS.cruiseMph))) {
      const min = metric ? boundText(VEHICLE_LIMITS.cruiseMph.min * KM_PER_MILE, "min", 1) : String(VEHICLE_LIMITS.cruiseMph.min);
      const max = metric ? boundText(VEHICLE_LIMITS.cruiseMph.max * KM_PER_MILE, "max", 1) : String(VEHICLE_LIMITS.cruiseMph.max);
      cruise = [
        at("cruiseSpeedsMph")(`${label("cruiseSpeedsMph")}: each speed must be between ${min} and ${max} ${sUnit}, e.g. ${speedExample}.`),
      ];
    }
  }

  let fender: number | null = null;
  if (exact && exact.fender === v.fender) {
    fender = exact.fenderMm;
  } else if (v.fender.trim() !== "") {
    const unit = fenderUnit(prefs);
    const example = unit === "mm" ? "140" : "5-1/2 or 5.5";
    const b = VEHICLE_LIMITS.fenderLineMm;
    // Bounds in the unit the field is shown in (the limit itself is in mm).
    const shown = unit === "mm" ? b : { min: b.min / MM_PER_IN, max: b.max / MM_PER_IN };
    const value = lengthField(v.fender, unit, { min: -Infinity, max: Infinity }, label("fenderLineMm"), example, at("fenderLineMm"));
    const mm = unit === "mm" ? value : tidy(inToMm(value));
    if (Number.isNaN(value)) fender = NaN;
    else if (inBounds(mm, b)) fender = mm;
    else
      fender = at("fenderLineMm")(
        lengthMessages(label("fenderLineMm"), unit, example).bounds(boundText(shown.min, "min", 2), boundText(shown.max, "max", 2)),
      );
  }
  const current = readSetup("current", draft.current, errors);
  const planned = readSetup("planned", draft.planned, errors);
  const vehicle = {
    kingpinInclinationDeg: kpi,
    axleRatio: axle,
    transmissionRatio: top,
    cruiseSpeedsMph: cruise,
    fenderLineMm: fender,
    firstGearRatio: first,
    transferLowRatio: low,
  };
  const checked = checkComparison({ current, planned, vehicle });
  if (!checked.ok) {
    // Left: what only the whole input knows, named by the field's label (the setups' own
    // messages are in already).
    for (const issue of checked.issues) {
      const key = issue.path.join(".");
      if (key.startsWith("current") || key.startsWith("planned")) continue;
      const field = key.startsWith("vehicle.cruiseSpeedsMph") ? "vehicle.cruiseSpeedsMph" : key;
      if (field in errors) continue;
      const name = inputFieldLabel(field, prefs);
      errors[field] = name ? `${name}: ${lower(issue.message)}` : issue.message;
    }
  }
  if (Object.keys(errors).length > 0) return { input: null, errors };
  return { input: checked.ok ? checked.value : null, errors };
}
