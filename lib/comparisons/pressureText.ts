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

/** A load (kg) in the chosen unit only, for chart axes and tooltips. */
export const loadIn = (kg: number, prefs: DisplayPrefs): number => (prefs.units === "metric" ? kg : kgToLb(kg));
/** A pressure (kPa) in the chosen unit only (psi or kPa), for chart axes and tooltips. */
export const pressureIn = (kpa: number, prefs: DisplayPrefs): number => (prefs.units === "metric" ? kpa : kpaToPsi(kpa));
