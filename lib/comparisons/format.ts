/**
 * Display helpers for the comparison screens: one unit choice (inch or metric) and one length
 * style (decimals or fractions) applied everywhere. Lengths go through the engine's
 * `formatLength`; pressure and mass conversions through the engine's units. Reference speeds are
 * not converted here: the result carries them at round speeds of each unit (speedometer.ts).
 * Negative values use the typographic minus sign (U+2212).
 */
import { KM_PER_MILE, MM_PER_IN, inToMm, kgToLb, psiToKpa } from "@/lib/fitment/units";
import { formatLength } from "@/lib/fitment/length";
import { type ComparisonWarning, LENGTH_TOKEN } from "./warnings";
import { type SpeedSystem, type SpeedUnit, SPEED_UNIT, enteredSpeed } from "./speedometer";

export type UnitSystem = SpeedSystem;
export type LengthStyle = "decimal" | "fraction";

export interface DisplayPrefs {
  units: UnitSystem;
  lengths: LengthStyle;
}

export const DEFAULT_PREFS: DisplayPrefs = { units: "imperial", lengths: "decimal" };
/** The localStorage key the preference is remembered under. */
export const PREFS_STORAGE_KEY = "hubface.display";

export const MINUS = "\u2212";

/** Reads stored preferences; anything not understood falls back to the defaults. */
export function parsePrefs(raw: string | null | undefined): DisplayPrefs {
  if (!raw) return DEFAULT_PREFS;
  try {
    const v = JSON.parse(raw) as Partial<Record<keyof DisplayPrefs, unknown>>;
    return {
      units: v.units === "metric" ? "metric" : "imperial",
      lengths: v.lengths === "fraction" ? "fraction" : "decimal",
    };
  } catch {
    return DEFAULT_PREFS;
  }
}

function typographic(s: string): string {
  return s.startsWith("-") ? MINUS + s.slice(1) : s;
}

function signed(s: string, value: number): string {
  if (s.startsWith("-")) return MINUS + s.slice(1);
  // A value that rounds to zero shows without sign.
  return value > 0 && !/^0( |$)/.test(s) ? `+${s}` : s;
}

const readsZero = (s: string) => /^-?0(\.0*)? (in|mm)$/.test(s);

/**
 * A length in one unit, the one writing of lengths for every screen (the workspace's formatLen,
 * the garage's bothUnits): the engine's `formatLength`, negatives with the true minus sign, and a
 * figure that is not zero to a tenth of a millimetre never written "0": where the sixteenth or
 * the decimals asked for round it away, it gets decimals until it shows (0.7 mm → "0.028 in",
 * 0.4 mm → "0.4 mm"; 1 in = 25.4 mm exactly, NIST SP 811). Below 0.05 mm it is 0, unsigned.
 *
 * @example
 * lengthText(0.7, { unit: "in", fraction: 16 }); // "0.028 in"
 * lengthText(-4.3, { unit: "in", fraction: 16 }); // "−3/16 in"
 * lengthText(0.4, { unit: "mm", decimals: 0 });   // "0.4 mm"
 */
export function lengthText(mm: number, opts: { unit: "in" | "mm"; fraction?: 16; decimals?: number }): string {
  let s = formatLength(mm, opts);
  if (readsZero(s) && !readsZero(formatLength(mm, { unit: "mm", decimals: 1 }))) {
    const from = Math.max(opts.decimals ?? 0, opts.unit === "in" ? 3 : 1);
    for (let d = from; d <= 6 && (d === from || readsZero(s)); d++) s = formatLength(mm, { unit: opts.unit, decimals: d });
  }
  return typographic(s);
}

/**
 * A length in the chosen units: inches as decimals (2 places) or sixteenths, or millimetres
 * (whole mm unless `decimals` is given); a figure that is not zero never reads "0" (lengthText).
 *
 * @example
 * formatLen(120.65, { units: "imperial", lengths: "fraction" }); // "4-3/4 in"
 * formatLen(-12, { units: "metric", lengths: "decimal" }, { signed: true }); // "−12 mm"
 * formatLen(0.7, { units: "imperial", lengths: "fraction" }); // "0.028 in"
 */
export function formatLen(mm: number, prefs: DisplayPrefs, opts: { signed?: boolean; decimals?: number } = {}): string {
  const s =
    prefs.units === "metric"
      ? lengthText(mm, { unit: "mm", decimals: opts.decimals ?? 0 })
      : lengthText(mm, { unit: "in", fraction: prefs.lengths === "fraction" ? 16 : undefined, decimals: opts.decimals ?? 2 });
  return opts.signed ? signed(s, mm) : s;
}

/** A length in the other units, for a secondary line ("802.8 mm" under "31.61 in"). */
export function formatLenOther(mm: number, prefs: DisplayPrefs, opts: { signed?: boolean } = {}): string {
  const other: DisplayPrefs = { units: prefs.units === "metric" ? "imperial" : "metric", lengths: prefs.lengths };
  return formatLen(mm, other, opts);
}

/** Millimetres to a hundredth, without trailing zeros: 25 → "25", 25.4 → "25.4". */
const isWhole = (x: number) => Math.abs(x - Math.round(x)) < 1e-9;
const exactMm = (mm: number) => formatNumber(mm, isWhole(mm) ? 0 : isWhole(mm * 10) ? 1 : 2);

/**
 * A part's thickness as bought (a spacer): never rounded into another size. Millimetres show to
 * the hundredth; inches show as a sixteenth only when the part is exactly one (1 in = 25.4 mm),
 * otherwise to 0.01 in, with the millimetres beside them — so a 25 mm spacer never reads "1 in"
 * and a 1 in spacer never reads "25 mm".
 *
 * @example
 * formatPartThickness(25, { units: "imperial", lengths: "fraction" });  // "0.98 in (25 mm)"
 * formatPartThickness(25.4, { units: "imperial", lengths: "fraction" }); // "1 in (25.4 mm)"
 * formatPartThickness(25.4, { units: "metric", lengths: "decimal" });    // "25.4 mm"
 */
export function formatPartThickness(mm: number, prefs: DisplayPrefs): string {
  if (prefs.units === "metric") return `${exactMm(mm)} mm`;
  const sixteenths = (mm / MM_PER_IN) * 16;
  const exactSixteenth = Math.abs(sixteenths - Math.round(sixteenths)) < 1e-6;
  const inches = formatLength(mm, { unit: "in", fraction: exactSixteenth && prefs.lengths === "fraction" ? 16 : undefined, decimals: 2 });
  return `${inches} (${exactMm(mm)} mm)`;
}

/** Inches as the trade gives them (wheel diameter and width, backspacing), decimals or fractions. */
export function formatInches(inches: number, prefs: DisplayPrefs): string {
  return formatLen(inToMm(inches), { units: "imperial", lengths: prefs.lengths });
}

/** A plain number with thousands separators and fixed decimals; typographic minus. */
export function formatNumber(n: number, decimals = 0, opts: { signed?: boolean } = {}): string {
  const s = new Intl.NumberFormat("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(n);
  const zero = /^-?0(\.0+)?$/.test(s);
  if (s.startsWith("-")) return zero ? s.slice(1) : MINUS + s.slice(1);
  return opts.signed && n > 0 && !zero ? `+${s}` : s;
}

/**
 * A speed already in its unit (a row of the result's `bySystem`): never converted.
 *
 * @example
 * formatSpeedIn(117.0653, "km/h"); // "117.1 km/h"
 */
export function formatSpeedIn(value: number, unit: SpeedUnit, decimals = 1): string {
  return `${formatNumber(value, decimals)} ${unit}`;
}

/** Up to one decimal, none when whole: how people type speeds. */
const asTyped = (x: number) => formatNumber(x, Number.isInteger(x) ? 0 : 1);

/**
 * A cruise speed (stored in mph) as the user entered it. In the entered unit it shows as typed
 * (100 km/h, never 99.9); in the other unit converted to a tenth, with the entered figure beside
 * it so the rounded conversion is never the only figure.
 *
 * @example
 * formatEnteredSpeed(100 / 1.609344, { units: "metric", lengths: "decimal" });   // "100 km/h"
 * formatEnteredSpeed(100 / 1.609344, { units: "imperial", lengths: "decimal" }); // "62.1 mph (100 km/h)"
 */
export function formatEnteredSpeed(mph: number, prefs: DisplayPrefs): string {
  const e = enteredSpeed(mph);
  const unit = SPEED_UNIT[prefs.units];
  if (e.unit === unit) return `${asTyped(e.value)} ${unit}`;
  const shown = unit === "km/h" ? mph * KM_PER_MILE : mph;
  return `${formatNumber(shown, 1)} ${unit} (${asTyped(e.value)} ${e.unit})`;
}

/** A speed symbol's reference speed in both units, the chosen one first: "160 km/h (99 mph)". */
export function formatSpeedRating(kmh: number, mph: number, prefs: DisplayPrefs): string {
  return prefs.units === "metric"
    ? `${formatNumber(kmh)} km/h (${formatNumber(mph)} mph)`
    : `${formatNumber(mph)} mph (${formatNumber(kmh)} km/h)`;
}

/** A load in both units, the chosen one first: "1,450 kg (3,197 lb)". */
export function formatLoad(kg: number, prefs: DisplayPrefs): string {
  const lb = kgToLb(kg);
  return prefs.units === "metric" ? `${formatNumber(kg)} kg (${formatNumber(lb)} lb)` : `${formatNumber(lb)} lb (${formatNumber(kg)} kg)`;
}

/** A pressure given in psi, the chosen unit first: "50 psi (345 kPa)". */
export function formatPressure(psi: number, prefs: DisplayPrefs): string {
  const kpa = psiToKpa(psi);
  return prefs.units === "metric"
    ? `${formatNumber(kpa)} kPa (${formatNumber(psi)} psi)`
    : `${formatNumber(psi)} psi (${formatNumber(kpa)} kPa)`;
}

/** A warning's title in the chosen units: its speeds from the reader's system, its length converted (a spacer's as bought). */
export function warningTitle(w: ComparisonWarning, prefs: DisplayPrefs): string {
  const title = w.titleBySystem?.[prefs.units] ?? w.title;
  if (w.lengthMm === null) return title;
  const len = w.kind === "spacer" ? formatPartThickness(w.lengthMm, prefs) : formatLen(Math.abs(w.lengthMm), prefs);
  return title.replace(LENGTH_TOKEN, len);
}
