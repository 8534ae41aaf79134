/**
 * The one reader of lengths typed by people, for every setup field, form and link: the engine's
 * `parseLength` (fractions `4-3/4`, `4¾`, `4 3/4 in`, decimals, `120 mm`, `3.5"`). A bare number
 * takes the unit the field is labelled in; a fraction is read only as inches, so `1-1/2` in a mm
 * field is refused with a message, never read as 1.5 mm. Zod-free: the workspace uses it in the
 * browser, the zod fields (schema.ts) and the URL codec (url.ts) wrap it.
 */
import { MM_PER_IN } from "@/lib/fitment/units";
import { parseLength } from "@/lib/fitment/length";
import { hasNumberComma } from "@/lib/fitment/commaEntry";

/** Rounds away float noise from unit conversion (4.75 in → mm → in stays 4.75). */
export const tidy = (v: number): number => {
  const r = Math.round(v * 1e6) / 1e6;
  return r === 0 ? 0 : r;
};

/**
 * A length in mm, or why not: "fraction" when a fraction was typed where mm is the unit, "comma"
 * when the figure has a comma (decimals or thousands? never guessed), null when the text is no
 * length at all. A typographic minus (−) reads as a minus.
 *
 * @example
 * readLength("4-3/4", "in"); // 120.65
 * readLength("1-1/2", "mm"); // "fraction"
 * readLength("1,5", "in");   // "comma"
 * readLength("wide", "in");  // null
 */
export function readLength(text: string, unit: "in" | "mm"): number | "fraction" | "comma" | null {
  const t = text.trim().replace(/\u2212/g, "-");
  if (hasNumberComma(t)) return "comma";
  try {
    return tidy(parseLength(t, unit));
  } catch {
    if (unit !== "mm") return null;
    try {
      parseLength(t, "in");
      return "fraction";
    } catch {
      return null;
    }
  }
}

/** What a length field holds: its value in the field's unit, or why it has none. */
export type LengthRead = { value: number } | { problem: LengthProblem };
export type LengthProblem = "empty" | "unreadable" | "fraction" | "comma";

/**
 * A length field's value in its own unit (`unit`, the unit its label states): a number is taken
 * as it is; text (only when `text` is allowed) is read with `readLength`; empty text, null and a
 * missing value are "empty".
 *
 * @example
 * readLengthValue("8-1/2", "in", true); // { value: 8.5 }
 * readLengthValue("1 in", "mm", true);  // { value: 25.4 }
 * readLengthValue("8", "in", false);    // { problem: "empty" } (text not allowed here)
 */
export function readLengthValue(v: unknown, unit: "in" | "mm", text: boolean): LengthRead {
  if (typeof v === "number") return Number.isFinite(v) ? { value: v } : { problem: "unreadable" };
  if (typeof v !== "string" || !text || v.trim() === "") return { problem: "empty" };
  const mm = readLength(v, unit);
  if (mm === "fraction" || mm === "comma") return { problem: mm };
  if (mm === null) return { problem: "unreadable" };
  return { value: unit === "mm" ? mm : tidy(mm / MM_PER_IN) };
}
