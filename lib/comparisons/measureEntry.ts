/**
 * Typed figures whose unit follows the display choice: pressures (psi or kPa), loads (lb or kg)
 * and lengths (in or mm). A bare number is read in the unit the field's label states; the same
 * unit written after it is accepted; another unit (bar in a kPa field, kg in an lb field, psi in
 * a kPa field) is refused with the conversion spelled out, so nobody inflates by a figure read in
 * the wrong unit. A comma in a figure is refused the same way everywhere (lib/fitment/commaEntry:
 * decimals or thousands is never guessed). Lengths go through lib/setup's reader (fractions only as inches).
 *
 * A unit switch converts each figure that reads and keeps its exact value behind the rounded
 * text (`exact`), so switching back gives the typed figure again; a figure that does not read
 * keeps its text and is reported, never relabelled.
 *
 * Inside, SI-ish units as the engine uses them: kPa, kg, mm. Conversions: NIST SP 811
 * (1 psi = 6.894757 kPa, 1 lb = 0.45359237 kg, 1 in = 25.4 mm) through lib/fitment.
 */
import { commaRefusal, hasNumberComma, kgToLb, kpaToPsi, lbToKg, mmToIn, psiToKpa } from "@/lib/fitment";
import { inchText } from "./draft";
import type { DisplayPrefs } from "./format";
import { lengthMessages } from "@/lib/setup/messages";
import { readLength, tidy } from "@/lib/setup/read";

export type Quantity = "pressure" | "load" | "length";
export type MeasureUnit = "psi" | "kPa" | "lb" | "kg" | "in" | "mm";

/** The unit a field of this quantity is typed in under a display choice. */
export function measureUnit(q: Quantity, prefs: DisplayPrefs): MeasureUnit {
  const metric = prefs.units === "metric";
  if (q === "pressure") return metric ? "kPa" : "psi";
  if (q === "load") return metric ? "kg" : "lb";
  return metric ? "mm" : "in";
}

/** A field's text, and the exact value (kPa, kg, mm) behind it while the text is the one written from it. */
export interface MeasureEntry {
  text: string;
  exact: { text: string; value: number } | null;
}

/** An entry typed by the person (no exact value behind it). */
export const typed = (text: string): MeasureEntry => ({ text, exact: null });

/** Bounds in the engine unit (kPa, kg, mm), with an example in each display unit. */
export interface MeasureSpec {
  quantity: Quantity;
  min: number;
  max: number;
  example: Record<"imperial" | "metric", string>;
}

export type MeasureRead = { value: number } | { empty: true } | { error: string };

const NUMBER_RE = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;
const fromUnit: Record<MeasureUnit, (v: number) => number> = {
  psi: psiToKpa,
  kPa: (v) => v,
  lb: lbToKg,
  kg: (v) => v,
  in: (v) => v * 25.4,
  mm: (v) => v,
};
const toUnit: Record<MeasureUnit, (v: number) => number> = {
  psi: kpaToPsi,
  kPa: (v) => v,
  lb: kgToLb,
  kg: (v) => v,
  in: mmToIn,
  mm: (v) => v,
};
/** Decimals a converted figure is written with. */
const DECIMALS: Record<MeasureUnit, number> = { psi: 1, kPa: 0, lb: 0, kg: 1, in: 2, mm: 1 };
/** Unit spellings people type after a number. */
const PRESSURE_UNITS: Record<string, "psi" | "kPa" | "bar"> = { psi: "psi", kpa: "kPa", bar: "bar" };
const LOAD_UNITS: Record<string, "lb" | "kg"> = { lb: "lb", lbs: "lb", kg: "kg" };

const plain = (v: number, decimals: number): string => String(tidy(Number(v.toFixed(decimals))));
const boundIn = (v: number, unit: MeasureUnit, side: "min" | "max"): string => {
  const f = 10 ** DECIMALS[unit];
  const x = toUnit[unit](v) * f;
  return String((side === "min" ? Math.ceil(x - 1e-9) : Math.floor(x + 1e-9)) / f);
};

/** A typed number with an optional unit word after it: [value, unit spelling lower-cased or ""], or null. */
function splitUnit(text: string): [number, string] | null {
  const m = /^(.*?)\s*([a-z]*)$/i.exec(text.trim().replace(/\u2212/g, "-"));
  if (!m || !NUMBER_RE.test(m[1] ?? "")) return null;
  return [Number(m[1]), (m[2] ?? "").toLowerCase()];
}

function readPressureOrLoad(text: string, unit: MeasureUnit, label: string, example: string): MeasureRead {
  if (hasNumberComma(text)) return { error: `${label}: ${commaRefusal(`“${text.trim()}”`, `${example} ${unit}`)}.` };
  const parts = splitUnit(text);
  const words = unit === "psi" || unit === "kPa" ? PRESSURE_UNITS : LOAD_UNITS;
  const noun = unit === "psi" || unit === "kPa" ? "pressure" : "load";
  if (!parts || (parts[1] !== "" && !(parts[1] in words))) {
    return { error: `${label}: enter one ${noun} in ${unit} as a plain number, e.g. ${example}.` };
  }
  const [n, word] = parts;
  const given = word === "" ? unit : words[word]!;
  if (given !== unit) {
    // bar is no unit of the toggle: 1 bar = 100 kPa exactly (NIST SP 811).
    const kpaOrKg = given === "bar" ? n * 100 : fromUnit[given](n);
    return {
      error: `${label}: the field is in ${unit}; “${text.trim()}” is ${plain(toUnit[unit](kpaOrKg), DECIMALS[unit])} ${unit} — enter that, or switch the units.`,
    };
  }
  return { value: fromUnit[unit](n) };
}

/**
 * Reads a field in the unit its label states. Empty text is `{ empty: true }` (the caller
 * decides whether the field is required). Messages start with the label.
 *
 * @example
 * readMeasure(typed("35"), { quantity: "pressure", min: 100, max: 700, example: { imperial: "35", metric: "240" } }, IMPERIAL, "Placard pressure, front (psi)");
 * // { value: 241.316… } (kPa)
 * readMeasure(typed("2.4 bar"), spec, METRIC, "Placard pressure, front (kPa)");
 * // { error: "Placard pressure, front (kPa): the field is in kPa; “2.4 bar” is 240 kPa — enter that, or switch the units." }
 */
export function readMeasure(entry: MeasureEntry, spec: MeasureSpec, prefs: DisplayPrefs, label: string): MeasureRead {
  if (entry.text.trim() === "") return { empty: true };
  const unit = measureUnit(spec.quantity, prefs);
  const example = spec.example[prefs.units];
  let value: number;
  if (entry.exact !== null && entry.exact.text === entry.text) {
    value = entry.exact.value;
  } else if (spec.quantity === "length") {
    const mm = readLength(entry.text, unit as "in" | "mm");
    const m = lengthMessages(label, unit as "in" | "mm", example);
    if (typeof mm !== "number") return { error: m.because(mm ?? "unreadable", entry.text) };
    value = mm;
  } else {
    const r = readPressureOrLoad(entry.text, unit, label, example);
    if (!("value" in r)) return r;
    value = r.value;
  }
  if (value < spec.min - 1e-9 || value > spec.max + 1e-9) {
    return {
      error: `${label}: must be between ${boundIn(spec.min, unit, "min")} and ${boundIn(spec.max, unit, "max")} ${unit}, e.g. ${example}.`,
    };
  }
  return { value };
}

/** The text a value (kPa, kg, mm) is written with in a display choice, without the unit. */
export function measureText(value: number, q: Quantity, prefs: DisplayPrefs): string {
  const unit = measureUnit(q, prefs);
  if (unit === "in" && prefs.lengths === "fraction") return inchText(tidy(mmToIn(value)), prefs);
  return plain(toUnit[unit](value), DECIMALS[unit]);
}

/** An entry written from a value: the exact value stays behind the text. */
export function entryFromValue(value: number, q: Quantity, prefs: DisplayPrefs): MeasureEntry {
  const text = measureText(value, q, prefs);
  return { text, exact: { text, value } };
}

/**
 * The entry for another display choice: a figure that reads (bounds aside) is rewritten in the
 * new unit with its exact value kept; empty text stays empty; text that does not read is kept
 * and `unconverted` is true when the unit changed under it.
 *
 * @example
 * const kpa = convertEntry(typed("35"), "pressure", IMPERIAL, METRIC).entry; // text "241.3"… written "241", exact 241.3165
 * convertEntry(kpa, "pressure", METRIC, IMPERIAL).entry.text;               // "35"
 */
export function convertEntry(
  entry: MeasureEntry,
  q: Quantity,
  from: DisplayPrefs,
  to: DisplayPrefs,
): { entry: MeasureEntry; unconverted: boolean } {
  if (entry.text.trim() === "") return { entry, unconverted: false };
  const wide: MeasureSpec = { quantity: q, min: -Infinity, max: Infinity, example: { imperial: "", metric: "" } };
  const r = readMeasure(entry, wide, from, "");
  if (!("value" in r)) return { entry, unconverted: measureUnit(q, from) !== measureUnit(q, to) };
  return { entry: entryFromValue(r.value, q, to), unconverted: false };
}
