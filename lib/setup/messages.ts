/**
 * The messages of a setup, one set for every place that reads one (the workspace as you type,
 * the garage and shop-counter forms, their route handlers, saved comparisons). Each names the
 * field as the screens label it (fields.ts), gives an example the field accepts and states
 * bounds in the field's own unit.
 */
import { MM_PER_IN } from "@/lib/fitment/units";
import { commaRefusal } from "@/lib/fitment/commaEntry";
import { OFFSET_MARGIN_MM } from "@/lib/fitment/offset";
import { BACKSPACING_REFERENCE_LABEL, SETUP_FIELD_EXAMPLE as EX, SETUP_FIELD_LABEL as L } from "./fields";
import type { BackspacingReference } from "./model";
import type { LengthProblem } from "./read";

/**
 * A bound as a message states it in another unit: rounded inward (a minimum up, a maximum down)
 * so that a figure typed at the stated bound is accepted.
 *
 * @example
 * boundText(500 / 25.4, "max", 2); // "19.68"
 * boundText(5 * 1.609344, "min", 1); // "8.1"
 */
export function boundText(v: number, side: "min" | "max", decimals: number): string {
  const f = 10 ** decimals;
  const r = (side === "min" ? Math.ceil(v * f - 1e-9) : Math.floor(v * f + 1e-9)) / f;
  return String(r === 0 ? 0 : r);
}

/**
 * The messages of a length field: each names the field as labelled (`label`), gives an example
 * the field accepts and states bounds in the field's own unit.
 *
 * @example
 * lengthMessages("Spacer (mm, optional)", "mm", "25").fraction("1-1/2");
 * // "Spacer (mm, optional): “1-1/2” is a fraction, which is read only in inches — write “1-1/2 in”, or mm as a decimal, e.g. 25."
 * lengthMessages("Wheel width (in)", "in", "9 or 8-1/2").comma("8,5");
 * // "Wheel width (in): “8,5” is ambiguous — a comma can mark decimals or thousands; write decimals with a point and no thousands separator (e.g. 9 or 8-1/2)."
 */
export function lengthMessages(label: string, unit: "in" | "mm", example: string) {
  const m = {
    empty: `${label}: enter ${unit === "in" ? "inches" : "mm"}, e.g. ${example}.`,
    unreadable:
      unit === "in"
        ? `${label}: not a length in inches, e.g. ${example}.`
        : `${label}: not a length in mm, e.g. ${example}; inches need their unit (1 in).`,
    fraction: (typed: string) =>
      `${label}: “${typed.trim()}” is a fraction, which is read only in inches — write “${typed.trim()} in”, or mm as a decimal, e.g. ${example}.`,
    bounds: (min: string, max: string) => `${label}: must be between ${min} and ${max} ${unit}, e.g. ${example}.`,
    // The example without its trailing note ("25 (leave empty for none)"), since the refusal puts it in brackets.
    comma: (typed: string) => `${label}: ${commaRefusal(`“${typed.trim()}”`, example.replace(/\s*\(.*\)$/, ""))}.`,
  };
  /** The message for a length that did not read, by why (readLengthValue's problem). */
  const because = (problem: LengthProblem, typed: string): string =>
    problem === "fraction" ? m.fraction(typed) : problem === "comma" ? m.comma(typed) : problem === "unreadable" ? m.unreadable : m.empty;
  return { ...m, because };
}

/** The messages about a setup as a whole and about what its fields mean together. */
export const SETUP_MESSAGE = {
  notASetup: "Give a setup: tire, wheel diameter and width, position and spacer.",
  positionMode: 'Give the wheel position as an offset (mode "offset") or a backspacing (mode "backspacing").',
  reference: `${L["position.reference"]}: say where the backspacing was measured to, "flange" (the ${BACKSPACING_REFERENCE_LABEL.flange}) or "bead-seat".`,
  tireEmpty: `${L.tire}: enter a tire size, e.g. ${EX.tire}.`,
  tireTooLong: `${L.tire}: too long for a tire size, e.g. ${EX.tire}.`,
  /** The engine's reason (TireSizeError.reason: without its own "Tire size" naming), which shows the accepted forms. */
  tireUnreadable: (typed: string, engineReason: string) =>
    `${L.tire}: ${JSON.stringify(typed.length > 40 ? `${typed.slice(0, 40)}…` : typed)} — ${engineReason}`,
  rimMismatch: (rimIn: number, wheelIn: number) =>
    `${L.wheelDiameterIn}: a ${rimIn} in tire needs a ${rimIn} in wheel; this wheel is ${wheelIn} in.`,
  /** The offset a person may give a wheel of this width: W/2 + the engine's margin either way. */
  offsetOutside: (offsetMm: number, widthIn: number) =>
    `${L["position.offsetMm"]}: ${offsetMm} mm puts the mounting face outside a ${widthIn} in wide wheel (at most ±${boundText((widthIn * MM_PER_IN) / 2 + OFFSET_MARGIN_MM, "max", 1)} mm on this width), e.g. ${EX["position.offsetMm"]}.`,
  backspacingOutside: (backspacingIn: number, reference: BackspacingReference, widthIn: number) =>
    `${L["position.backspacingIn"]}: ${backspacingIn} in to the ${BACKSPACING_REFERENCE_LABEL[reference]} puts the mounting face outside a ${widthIn} in wide wheel, e.g. ${EX["position.backspacingIn"]}.`,
} as const;
