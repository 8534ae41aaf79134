/**
 * Pressures and loads of the load and pressure panel in the chosen units, the other units beside
 * them: a figure someone inflates by is never shown in one unit only. bar = kPa / 100 (NIST SP 811).
 */
import { kgToLb, kpaToPsi } from "@/lib/fitment";
import { type DisplayPrefs, formatNumber } from "./format";

/**
 * A pressure (kPa) with psi, kPa and bar, the chosen unit first.
 *
 * @example
 * pressureText(201.1, { units: "imperial", lengths: "decimal" }); // "29.2 psi (201 kPa, 2.01 bar)"
 * pressureText(201.1, { units: "metric", lengths: "decimal" });   // "201 kPa (2.01 bar, 29.2 psi)"
 */
export function pressureText(kpa: number, prefs: DisplayPrefs): string {
  const psi = `${formatNumber(kpaToPsi(kpa), 1)} psi`;
  const k = `${formatNumber(kpa)} kPa`;
  const bar = `${formatNumber(kpa / 100, 2)} bar`;
  return prefs.units === "metric" ? `${k} (${bar}, ${psi})` : `${psi} (${k}, ${bar})`;
}

/** The engine's pressure pair in its messages and notes: "166.6 kPa (24.2 psi)" (lib/fitment/loadPressure.ts). */
const ENGINE_PAIR = /(\d+(?:\.\d+)?) kPa \((\d+(?:\.\d+)?) psi\)/g;

/**
 * An engine note or message with its pressures in the chosen unit's order. The engine writes
 * every pressure as "kPa (psi)"; in the imperial display the table and fields read psi first, so
 * each pair is turned round there. The figures are the engine's own, only their order changes.
 *
 * @example
 * pressuresInOrder("needs only 166.6 kPa (24.2 psi)", { units: "imperial", lengths: "decimal" }); // "needs only 24.2 psi (166.6 kPa)"
 * pressuresInOrder("needs only 166.6 kPa (24.2 psi)", { units: "metric", lengths: "decimal" });   // unchanged
 */
export function pressuresInOrder(text: string, prefs: DisplayPrefs): string {
  return prefs.units === "metric" ? text : text.replace(ENGINE_PAIR, "$2 psi ($1 kPa)");
}

/** The engine's loads in its messages: "1045.5 kg" (lib/fitment/loadPressure.ts); not a figure already in a pair. */
const ENGINE_LOAD = /(?<![\d.,])(\d+)(?:\.(\d+))? kg\b/g;

/**
 * An engine message in the chosen units, as the fields beside it are labelled: pressures in that
 * unit's order ({@link pressuresInOrder}) and each load grouped by thousands as every other figure
 * of the panel ("1,769 kg"): in the imperial display in lb first with the engine's kg beside it
 * (1 lb = 0.45359237 kg exactly, NIST SP 811 B.8), the lb being the kg figure as printed,
 * converted, so the two agree as shown; in the metric display the engine's kg, its decimals kept.
 *
 * @example
 * messageInUnits("1360.8 kg is above 1045.5 kg at 250 kPa (36.3 psi)", { units: "imperial", lengths: "decimal" });
 * // "3,000 lb (1,360.8 kg) is above 2,305 lb (1,045.5 kg) at 36.3 psi (250 kPa)"
 * messageInUnits("1360.8 kg is above 1045.5 kg at 250 kPa (36.3 psi)", { units: "metric", lengths: "decimal" });
 * // "1,360.8 kg is above 1,045.5 kg at 250 kPa (36.3 psi)"
 */
export function messageInUnits(text: string, prefs: DisplayPrefs): string {
  return pressuresInOrder(text, prefs).replace(ENGINE_LOAD, (_, whole: string, frac: string | undefined) => {
    const kg = Number(frac === undefined ? whole : `${whole}.${frac}`);
    const kgText = `${formatNumber(kg, frac?.length ?? 0)} kg`;
    return prefs.units === "metric" ? kgText : `${formatNumber(kgToLb(kg))} lb (${kgText})`;
  });
}

/** A load (kg) in the chosen unit only, for chart axes and tooltips. */
export const loadIn = (kg: number, prefs: DisplayPrefs): number => (prefs.units === "metric" ? kg : kgToLb(kg));
/** A pressure (kPa) in the chosen unit only (psi or kPa), for chart axes and tooltips. */
export const pressureIn = (kpa: number, prefs: DisplayPrefs): number => (prefs.units === "metric" ? kpa : kpaToPsi(kpa));

/**
 * The caution beside every pressure someone may inflate by (workspace, garage, share page,
 * quote, checklist, work order): the makers' figures win, the sidewall maximum is never passed.
 */
export const PRESSURE_CAUTION =
  "Set cold, before driving. The vehicle's placard, the tire maker's load tables and the wheel maker's limits take precedence over any figure here; never inflate above the maximum on the sidewall or the wheel.";
