/**
 * Quantities on quote lines. Items (tires, wheels, per-wheel and per-vehicle services) are
 * counted in whole numbers; labour sold by the hour may be a part hour, kept exact to the
 * hundredth of an hour so that quantity × price stays exact in cents (1.5 h × 145.00 = 217.50).
 *
 * Hours are read from what a counter person types: `1.5`, `.25`, `1 1/2`, `1-1/2`, `1½`, `¾`,
 * `1:30` (hours:minutes), `90 min`, with an optional `h`/`hr`/`hours`. An entry that is not a
 * whole number of hundredths (`1:20` = 1.333… h, `1/3`) is refused with the nearest figure to
 * type, never rounded silently; a decimal comma (`1,5`) is refused as ambiguous.
 */
import type { QuoteLineUnit } from "@/lib/platform/db/types";

export const MAX_QUANTITY = 999;

export class QuantityError extends Error {}

const VULGAR: Record<string, [number, number]> = {
  "¼": [1, 4],
  "½": [1, 2],
  "¾": [3, 4],
  "⅓": [1, 3],
  "⅔": [2, 3],
  "⅕": [1, 5],
  "⅖": [2, 5],
  "⅗": [3, 5],
  "⅘": [4, 5],
  "⅙": [1, 6],
  "⅚": [5, 6],
  "⅛": [1, 8],
  "⅜": [3, 8],
  "⅝": [5, 8],
  "⅞": [7, 8],
};
const HOURS_SUFFIX = /\s*(h|hr|hrs|hour|hours)\.?$/i;
const MINUTES_SUFFIX = /\s*(m|min|mins|minutes)\.?$/i;

/** A quantity as a whole number of hundredths, or null when it has more than two decimals. */
export function toHundredths(q: number): number | null {
  const h = Math.round(q * 100);
  return Math.abs(q * 100 - h) < 1e-6 ? h : null;
}

/** Reads hours as an exact fraction num/den (den > 0). */
function readHours(text: string): [number, number] {
  let t = text.trim();
  if (MINUTES_SUFFIX.test(t)) {
    const m = /^(\d{1,5})$/.exec(t.replace(MINUTES_SUFFIX, ""));
    if (!m) throw new QuantityError(`Enter minutes as a whole number, e.g. 90 min.`);
    return [Number(m[1]), 60];
  }
  t = t.replace(HOURS_SUFFIX, "");
  if (/^\d+,\d+$/.test(t)) throw new QuantityError(`Use a point for part hours: ${t.replace(",", ".")}, not ${t}.`);
  let m = /^(\d{1,3}):([0-5]\d)$/.exec(t);
  if (m) return [Number(m[1]) * 60 + Number(m[2]), 60];
  m = /^(\d{0,3})\s*([¼½¾⅓⅔⅕⅖⅗⅘⅙⅚⅛⅜⅝⅞])$/.exec(t);
  if (m) {
    const [n, d] = VULGAR[m[2]!]!;
    return [Number(m[1] || 0) * d + n, d];
  }
  m = /^(?:(\d{1,3})(?:\s+|-))?(\d{1,3})\/(\d{1,3})$/.exec(t);
  if (m) {
    const n = Number(m[2]);
    const d = Number(m[3]);
    if (d === 0 || (m[1] !== undefined && n >= d))
      throw new QuantityError(`${text.trim()} is not a fraction of an hour; write e.g. 1 1/2 or 1.5.`);
    return [Number(m[1] ?? 0) * d + n, d];
  }
  m = /^(\d{0,4})(?:\.(\d{1,6}))?$/.exec(t);
  if (m && (m[1] || m[2])) {
    const frac = m[2] ?? "";
    return [Number(m[1] || 0) * 10 ** frac.length + Number(frac || 0), 10 ** frac.length];
  }
  throw new QuantityError(`Enter hours like 1.5, 1 1/2 or 1:30.`);
}

/**
 * The quantity a line carries, from a number or typed text.
 *
 * @example
 * parseQuantity("1 1/2", "hour"); // 1.5
 * parseQuantity("1:30", "hour");  // 1.5
 * parseQuantity("4", "each");     // 4
 * parseQuantity("1:20", "hour");  // throws: 1:20 is 1.333… h, enter 1.33 or 1.35
 */
export function parseQuantity(input: string | number, unit: QuoteLineUnit): number {
  if (typeof input === "number") {
    if (!Number.isFinite(input)) throw new QuantityError("Enter a quantity.");
    return check(input, unit, String(input));
  }
  if (typeof input !== "string" || !input.trim()) throw new QuantityError("Enter a quantity.");
  const text = input.trim();
  if (unit === "each") {
    if (!/^\d{1,4}$/.test(text)) {
      if (/^\d*[.,:/½¼¾]/.test(text) || /\d[.,:/½¼¾]/.test(text))
        throw new QuantityError(`Count whole items: ${text} is not a whole number.`);
      throw new QuantityError("Enter a whole number, e.g. 4.");
    }
    return check(Number(text), unit, text);
  }
  const [num, den] = readHours(text);
  const hundredths = (num * 100) / den;
  if (!Number.isInteger(hundredths)) {
    const down = Math.floor(hundredths) / 100;
    throw new QuantityError(
      `${text} is ${approx(num, den)} h, which is not exact to the hundredth of an hour: enter ${down.toFixed(2)} or ${(down + 0.01).toFixed(2)}.`,
    );
  }
  return check(hundredths / 100, unit, text);
}

/** num/den to three decimals, with "…" when that is not exact. */
function approx(num: number, den: number): string {
  const thousandths = (num * 1000) / den;
  return Number.isInteger(thousandths) ? String(thousandths / 1000) : `${(Math.floor(thousandths) / 1000).toFixed(3)}…`;
}

function check(q: number, unit: QuoteLineUnit, text: string): number {
  if (q <= 0) throw new QuantityError("The quantity must be more than 0.");
  if (q > MAX_QUANTITY) throw new QuantityError(`At most ${MAX_QUANTITY}.`);
  if (unit === "each" && !Number.isInteger(q))
    throw new QuantityError(`Count whole items: ${text} is not a whole number (only hourly labour takes part hours).`);
  if (toHundredths(q) === null) throw new QuantityError(`Use at most two decimals (hundredths of an hour), e.g. 1.25.`);
  return q;
}

/**
 * A quantity as shown on the screens, the PDF and the e-mail.
 *
 * @example
 * formatQuantity(1.5, "hour"); // "1.5 h"
 * formatQuantity(4, "each");   // "4"
 */
export function formatQuantity(q: number, unit: QuoteLineUnit): string {
  const n = String(Number(q.toFixed(2)));
  return unit === "hour" ? `${n} h` : n;
}
