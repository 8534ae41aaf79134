/**
 * Money as integer cents (USD). Text ⇄ cents goes through the digits, never through floating
 * point, so "19.99" is exactly 1999 cents.
 */

const MONEY_RE = /^\s*\$?\s*(-)?\s*(\d{1,9})(?:\.(\d{1,2}))?\s*$/;

/**
 * Dollars as typed ("1,249.50", "$89", "12.5") → cents, or null when it is not an amount.
 * Thousands separators are accepted only in groups of three.
 *
 * @example
 * parseMoneyToCents("19.99"); // 1999
 * parseMoneyToCents("1,249.5"); // 124950
 */
export function parseMoneyToCents(text: string): number | null {
  if (typeof text !== "string") return null;
  let t = text.trim();
  if (/^\$?-?\d{1,3}(,\d{3})+(\.\d{1,2})?$/.test(t.replace(/^\$\s*/, "$"))) t = t.replace(/,/g, "");
  const m = MONEY_RE.exec(t);
  if (!m) return null;
  const [, minus, whole, frac = ""] = m;
  const cents = Number(whole) * 100 + Number(frac.padEnd(2, "0"));
  return minus ? -cents : cents;
}

/** Cents → "1,249.50" (no currency sign). */
export function formatCents(cents: number): string {
  const neg = cents < 0;
  const abs = Math.abs(Math.trunc(cents));
  const whole = Math.floor(abs / 100).toLocaleString("en-US");
  return `${neg ? "-" : ""}${whole}.${String(abs % 100).padStart(2, "0")}`;
}

/**
 * Cents → an amount field's starting text: dollars and cents without thousands commas, empty when
 * nothing is left to take or give back (so no stale figure sits in the field).
 *
 * @example
 * amountFieldText(323086); // "3230.86"
 * amountFieldText(0); // ""
 */
export function amountFieldText(cents: number): string {
  return cents > 0 ? formatCents(cents).replace(/,/g, "") : "";
}

/** Cents → "$1,249.50". */
export function formatUsd(cents: number): string {
  const s = formatCents(cents);
  return s.startsWith("-") ? `-$${s.slice(1)}` : `$${s}`;
}

/** A percentage as typed ("8.25") → basis points (825), or null. At most two decimals. */
export function parsePercentToBp(text: string): number | null {
  const m = /^\s*(\d{1,3})(?:\.(\d{1,2}))?\s*%?\s*$/.exec(text);
  if (!m) return null;
  return Number(m[1]) * 100 + Number((m[2] ?? "").padEnd(2, "0"));
}

/** Basis points → "8.25". */
export function formatBp(bp: number): string {
  return `${Math.floor(bp / 100)}.${String(bp % 100).padStart(2, "0")}`.replace(/\.00$/, "").replace(/(\.\d)0$/, "$1");
}
