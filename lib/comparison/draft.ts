/**
 * What people type into the comparison form (text per field) ⇄ the validated comparison input.
 * Lengths are read with the engine's `parseLength`, so `4-3/4`, `4 3/4 in`, `4.75"` and
 * `120.65 mm` all work; a bare number takes the field's usual unit (offset and spacer mm,
 * wheel sizes and backspacing inches, the fender line the chosen display unit).
 */
import { KM_PER_MILE, formatLength, inToMm, mmToIn, parseLength, parseTireSize } from "@/lib/fitment";
import type { DisplayPrefs } from "./format";
import { type ComparisonInput, type SetupInputValues, type BackspacingReferenceValue, DEFAULT_FLANGE_ALLOWANCE_IN, checkComparison } from "./model";

export interface SetupDraft {
  tire: string;
  diameter: string;
  width: string;
  mode: "offset" | "backspacing";
  offset: string;
  backspacing: string;
  reference: BackspacingReferenceValue;
  flange: string;
  spacer: string;
}

export interface VehicleDraft {
  kpi: string;
  axle: string;
  top: string;
  /** Cruise speeds, comma-separated, in mph (inch units) or km/h (metric units). */
  cruise: string;
  /** Fender line from the hub face, in the display unit; empty = not entered. */
  fender: string;
  /**
   * The exact values behind `cruise` and `fender` as last generated from an input: while the
   * text is unchanged these are read back, so switching units does not round 60 mph to 60.27.
   */
  exact?: { cruise: string; cruiseMph: number[]; fender: string; fenderMm: number | null };
}

export interface Draft {
  current: SetupDraft;
  planned: SetupDraft;
  vehicle: VehicleDraft;
}

/** Field errors keyed by the input path, e.g. `planned.position.backspacingIn`. */
export type DraftErrors = Record<string, string>;

const tidy = (v: number): number => {
  const r = Math.round(v * 1e6) / 1e6;
  return r === 0 ? 0 : r;
};
const plain = (v: number, decimals = 4): string => String(tidy(Number(v.toFixed(decimals))));

/** Inches as typed text: "4.75" or "4-3/4" (sixteenths) without the unit. */
export function inchText(inches: number, prefs: DisplayPrefs): string {
  if (prefs.lengths === "fraction") return formatLength(inToMm(inches), { unit: "in", fraction: 16 }).replace(/ in$/, "");
  return plain(inches);
}

function setupDraft(s: SetupInputValues, prefs: DisplayPrefs): SetupDraft {
  const p = s.position;
  return {
    tire: s.tire,
    diameter: plain(s.wheelDiameterIn),
    width: plain(s.wheelWidthIn),
    mode: p.mode,
    offset: p.mode === "offset" ? plain(p.offsetMm, 2) : "",
    backspacing: p.mode === "backspacing" ? inchText(p.backspacingIn, prefs) : "",
    reference: p.mode === "backspacing" ? p.reference : "flange",
    flange: inchText(p.mode === "backspacing" ? p.flangeIn : DEFAULT_FLANGE_ALLOWANCE_IN, prefs),
    spacer: s.spacerMm === 0 ? "" : plain(s.spacerMm, 2),
  };
}

/** Unit-dependent vehicle fields (cruise speeds, fender line) as text in the display unit. */
export function vehicleUnitFields(input: ComparisonInput, prefs: DisplayPrefs): Pick<VehicleDraft, "cruise" | "fender" | "exact"> {
  const v = input.vehicle;
  const cruise = v.cruiseSpeedsMph.map((mph) => (prefs.units === "metric" ? plain(mph * KM_PER_MILE, 0) : plain(mph, 1))).join(", ");
  const fender = v.fenderLineMm === null ? "" : prefs.units === "metric" ? plain(v.fenderLineMm, 0) : inchText(mmToIn(v.fenderLineMm), prefs);
  return { cruise, fender, exact: { cruise, cruiseMph: v.cruiseSpeedsMph, fender, fenderMm: v.fenderLineMm } };
}

/** The form text for a comparison input. */
export function draftFromInput(input: ComparisonInput, prefs: DisplayPrefs): Draft {
  const v = input.vehicle;
  return {
    current: setupDraft(input.current, prefs),
    planned: setupDraft(input.planned, prefs),
    vehicle: {
      kpi: v.kingpinInclinationDeg === null ? "" : plain(v.kingpinInclinationDeg, 2),
      axle: plain(v.axleRatio, 3),
      top: plain(v.transmissionRatio, 3),
      ...vehicleUnitFields(input, prefs),
    },
  };
}

const NUMBER_RE = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

function readNumber(text: string, unitSuffix?: RegExp): number | null {
  let t = text.trim().replace(/\u2212/g, "-");
  if (unitSuffix) t = t.replace(unitSuffix, "").trim();
  if (!NUMBER_RE.test(t)) return null;
  const v = Number(t);
  return Number.isFinite(v) ? tidy(v) : null;
}

function readLength(text: string, unit: "in" | "mm"): number | null {
  try {
    return tidy(parseLength(text.replace(/\u2212/g, "-"), unit));
  } catch {
    return null;
  }
}

/**
 * If the wheel diameter followed the old tire (or was empty), it follows the new one: typing
 * 35x12.50R15 after a 17 in size moves the wheel diameter to 15.
 */
export function followTire(d: SetupDraft, tire: string): SetupDraft {
  const rimOf = (t: string): number | null => {
    try {
      return parseTireSize(t).rimDiameterIn;
    } catch {
      return null;
    }
  };
  const next = rimOf(tire);
  const old = rimOf(d.tire);
  const dia = readNumber(d.diameter);
  const followed = d.diameter.trim() === "" || old === null || dia === old;
  return { ...d, tire, diameter: next !== null && followed ? String(next) : d.diameter };
}

function readSetup(side: "current" | "planned", d: SetupDraft, errors: DraftErrors): unknown {
  const err = (path: string, message: string) => {
    errors[`${side}.${path}`] = message;
    return NaN;
  };
  const inches = (text: string, path: string, what: string, example: string) => {
    if (text.trim() === "") return err(path, `Enter the ${what} (e.g. ${example}).`);
    const mm = readLength(text, "in");
    return mm === null ? err(path, `Enter the ${what} in inches, like ${example}.`) : tidy(mmToIn(mm));
  };
  const diameter = inches(d.diameter, "wheelDiameterIn", "wheel diameter", "17");
  const width = inches(d.width, "wheelWidthIn", "wheel width", "9 or 8-1/2");
  let position: unknown;
  if (d.mode === "offset") {
    const mm = d.offset.trim() === "" ? null : readLength(d.offset, "mm");
    position = { mode: "offset", offsetMm: mm ?? err("position.offsetMm", "Enter the offset in mm, like -12 or 25 (a minus sign for negative).") };
  } else {
    position = {
      mode: "backspacing",
      backspacingIn: inches(d.backspacing, "position.backspacingIn", "backspacing", "4-3/4, 4.75 or 4 3/4 in"),
      reference: d.reference,
      flangeIn: inches(d.flange, "position.flangeIn", "flange allowance", "1/2 or 0.5"),
    };
  }
  if (d.tire.trim() === "") err("tire", "Enter a tire size (e.g. 265/70R17).");
  else {
    try {
      parseTireSize(d.tire);
    } catch (e) {
      err("tire", e instanceof Error ? e.message : "Not a tire size (e.g. 265/70R17).");
    }
  }
  let spacer = 0;
  if (d.spacer.trim() !== "") {
    const mm = readLength(d.spacer, "mm");
    spacer = mm ?? err("spacerMm", "Enter the spacer thickness in mm, like 25 (or 1 in); leave empty for none.");
  }
  return { tire: d.tire, wheelDiameterIn: diameter, wheelWidthIn: width, position, spacerMm: spacer };
}

/**
 * Reads the form text into a comparison input. Returns the input when every field is valid
 * (schema included), otherwise null, and the error of each field in `errors`.
 */
export function readDraft(draft: Draft, prefs: DisplayPrefs): { input: ComparisonInput | null; errors: DraftErrors } {
  const errors: DraftErrors = {};
  const v = draft.vehicle;
  const vErr = (path: string, message: string) => {
    errors[`vehicle.${path}`] = message;
    return NaN;
  };
  const kpi = v.kpi.trim() === "" ? null : (readNumber(v.kpi, /°|deg$/i) ?? vErr("kingpinInclinationDeg", "Enter the kingpin inclination in degrees, like 8, or leave it empty."));
  const axle = readNumber(v.axle) ?? vErr("axleRatio", "Enter the axle ratio like 3.73 (or 3.73:1).");
  const top = readNumber(v.top) ?? vErr("transmissionRatio", "Enter the top-gear ratio like 1.00 (direct) or 0.70 (overdrive).");
  const speedUnit = prefs.units === "metric" ? "km/h" : "mph";
  const parts = v.cruise.split(/[,;\s]+/).filter((p) => p !== "" && p.toLowerCase() !== speedUnit);
  const speeds = parts.map((p) => readNumber(p));
  const exact = v.exact;
  const cruise = exact && exact.cruise === v.cruise ? exact.cruiseMph :
    parts.length === 0 || speeds.some((s) => s === null)
      ? [vErr("cruiseSpeedsMph", `Enter one to six cruise speeds in ${speedUnit}, like ${prefs.units === "metric" ? "100, 110" : "60, 70"}.`)]
      : speeds.map((s) => tidy(prefs.units === "metric" ? (s as number) / KM_PER_MILE : (s as number)));
  let fender: number | null = null;
  if (exact && exact.fender === v.fender) {
    fender = exact.fenderMm;
  } else if (v.fender.trim() !== "") {
    const mm = readLength(v.fender, prefs.units === "metric" ? "mm" : "in");
    fender = mm ?? vErr("fenderLineMm", `Enter the fender line distance like ${prefs.units === "metric" ? "140 (mm)" : "5-1/2 (in)"}, or leave it empty.`);
  }
  const candidate = {
    current: readSetup("current", draft.current, errors),
    planned: readSetup("planned", draft.planned, errors),
    vehicle: { kingpinInclinationDeg: kpi, axleRatio: axle, transmissionRatio: top, cruiseSpeedsMph: cruise, fenderLineMm: fender },
  };
  // "3.73:1" is a common way to write a ratio.
  if (errors["vehicle.axleRatio"] && /^\s*\d+(\.\d+)?\s*:\s*1\s*$/.test(v.axle)) {
    delete errors["vehicle.axleRatio"];
    candidate.vehicle.axleRatio = Number(v.axle.split(":")[0]);
  }
  const checked = checkComparison(candidate);
  if (!checked.ok) {
    for (const issue of checked.issues) {
      const key = issue.path.join(".");
      const field = key.startsWith("vehicle.cruiseSpeedsMph") ? "vehicle.cruiseSpeedsMph" : key;
      if (!(field in errors)) {
        errors[field] = field === "vehicle.cruiseSpeedsMph" && prefs.units === "metric" ? issue.message.replace(/(\d+) and (\d+) mph/, (_, a: string, b: string) => `${Math.round(Number(a) * KM_PER_MILE)} and ${Math.round(Number(b) * KM_PER_MILE)} km/h`) : issue.message;
      }
    }
  }
  if (Object.keys(errors).length > 0) return { input: null, errors };
  return { input: checked.ok ? checked.value : null, errors };
}
