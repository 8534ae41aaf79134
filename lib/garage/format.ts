/** Display helpers for the garage: every number still comes from the engine. */
import { type DisplayPrefs, formatLen, lengthText } from "@/lib/comparisons/format";
import { MM_PER_IN, formatLength, inToMm } from "@/lib/fitment";
import { BACKSPACING_REFERENCE_LABEL } from "@/lib/setup/fields";
import type { Setup } from "@/lib/setup/model";

/** How the garage wrote lengths before it followed the reader's unit choice: mm first, inch sixteenths beside them. */
const MM_FIRST: DisplayPrefs = { units: "metric", lengths: "fraction" };

/**
 * A length in both units, the reader's choice first (the vehicle page's Units switch): inch mode
 * shows inches (decimals or sixteenths, as chosen) with the millimetres in brackets, metric the
 * millimetres with the inches in brackets. Both through the workspace's own lengthText/formatLen:
 * negatives with the true minus sign, and a figure too small for a sixteenth shows its inches in
 * thousandths, never as "0 in", unless the millimetres read 0 as well. Without a choice: mm first.
 *
 * @example
 * bothUnits(38.1); // "38.1 mm (1-1/2 in)"
 * bothUnits(0.7);  // "0.7 mm (0.028 in)"
 * bothUnits(-4.3); // "−4.3 mm (−3/16 in)"
 * bothUnits(38.1, { units: "imperial", lengths: "decimal" }); // "1.5 in (38.1 mm)"
 */
export function bothUnits(mm: number, prefs: DisplayPrefs = MM_FIRST): string {
  const mmText = lengthText(mm, { unit: "mm", decimals: 1 });
  const inText = formatLen(mm, { units: "imperial", lengths: prefs.lengths });
  return prefs.units === "metric" ? `${mmText} (${inText})` : `${inText} (${mmText})`;
}

/** "+14.5 mm" / "−10 mm" with a sign, for changes. */
export function signedMm(mm: number): string {
  const t = formatLength(Math.abs(mm), { unit: "mm" });
  if (Math.abs(mm) < 0.05) return "±0 mm";
  return `${mm > 0 ? "+" : "−"}${t}`;
}

/**
 * A change in the reader's units, signed: metric as signedMm, inch mode through formatLen
 * ("+1.46 in", "−3/8 in"); under 0.05 mm it is "±0" in either.
 *
 * @example
 * signedLen(37, { units: "imperial", lengths: "decimal" }); // "+1.46 in"
 * signedLen(37, { units: "metric", lengths: "decimal" });   // "+37 mm"
 */
export function signedLen(mm: number, prefs: DisplayPrefs): string {
  if (prefs.units === "metric") return signedMm(mm);
  return Math.abs(mm) < 0.05 ? "±0 in" : formatLen(mm, prefs, { signed: true });
}

/** A short line for a setup, e.g. "265/70R17 on 17x8, offset +25 mm". */
export function setupLine(s: Setup): string {
  const pos =
    s.position.mode === "offset"
      ? `offset ${s.position.offsetMm > 0 ? "+" : ""}${s.position.offsetMm} mm`
      : `${formatLength(inToMm(s.position.backspacingIn), { unit: "in", fraction: 16 })} backspacing to the ${BACKSPACING_REFERENCE_LABEL[s.position.reference]}`;
  return `${s.tire} on ${s.wheelDiameterIn}x${s.wheelWidthIn}, ${pos}${s.spacerMm ? `, ${s.spacerMm} mm spacer` : ""}`;
}

/** A margin as form text: the inch fraction when it is one (12.7 → "1/2 in"), else mm ("15 mm"). */
export function marginText(mm: number): string {
  const sixteenths = (mm / MM_PER_IN) * 16;
  return Math.abs(sixteenths - Math.round(sixteenths)) < 1e-6
    ? formatLength(mm, { unit: "in", fraction: 16 })
    : `${Math.round(mm * 100) / 100} mm`;
}
