/**
 * Lengths typed by people: fractions (ASCII `4-3/4`, `4 3/4`, and the Unicode forms people paste
 * or type on phones: `4¾`, `4 ¾`, `¾`, `4 3⁄4` with the fraction slash, `4³⁄₄`), decimals, inch
 * marks, millimetres. Returns mm. Fractions are an inch notation: a fraction is read only as
 * inches, never as "1.5 mm" from `1-1/2` in a millimetre field.
 *
 * Sources: 1 in = 25.4 mm exactly (NIST SP 811, B.8); the vulgar fraction characters and U+2044
 * FRACTION SLASH are the Unicode Standard's (chapter 6, "Fractions"; NFKC maps ¾ to 3⁄4).
 */
import { FitmentInputError } from "./errors";
import { MM_PER_IN } from "./units";
import { commaRefusal, hasNumberComma } from "./commaEntry";

/** Length units accepted at the edges. */
export type LengthUnit = "in" | "mm";

const LENGTH_RE = /^([+-])?\s*(?:(\d+(?:\.\d+)?|\.\d+)(?:(?:\s+|-)(\d+)\/(\d+))?|(\d+)\/(\d+))\s*(mm|cm|in|inch|inches|"|''|”)?$/i;

const EXAMPLE = 'e.g. 4-3/4, 4 7/8 in, 3.5", 120 mm or 2';

/** Unicode vulgar fractions (U+00BC–00BE, U+2150–215E) as ASCII `n/d`. */
const VULGAR: Readonly<Record<string, string>> = {
  "¼": "1/4",
  "½": "1/2",
  "¾": "3/4",
  "⅐": "1/7",
  "⅑": "1/9",
  "⅒": "1/10",
  "⅓": "1/3",
  "⅔": "2/3",
  "⅕": "1/5",
  "⅖": "2/5",
  "⅗": "3/5",
  "⅘": "4/5",
  "⅙": "1/6",
  "⅚": "5/6",
  "⅛": "1/8",
  "⅜": "3/8",
  "⅝": "5/8",
  "⅞": "7/8",
};
const SUPER = "⁰¹²³⁴⁵⁶⁷⁸⁹";
const SUB = "₀₁₂₃₄₅₆₇₈₉";
const digitsOf = (s: string, set: string) => [...s].map((c) => String(set.indexOf(c))).join("");

/**
 * Unicode fraction forms as the ASCII ones the grammar reads: `4¾` → `4 3/4`, `¾` → `3/4`,
 * `3⁄4` → `3/4`, `4³⁄₄` → `4 3/4`; a whole number runs into a fraction only through a space.
 */
function asciiFractions(text: string): string {
  return text
    .replace(/([⁰¹²³⁴⁵⁶⁷⁸⁹]+)\s*\u2044\s*([₀₁₂₃₄₅₆₇₈₉]+)/g, (_, n: string, d: string) => ` ${digitsOf(n, SUPER)}/${digitsOf(d, SUB)}`)
    .replace(/[¼½¾⅐⅑⅒⅓⅔⅕⅖⅗⅘⅙⅚⅛⅜⅝⅞]/g, (c) => ` ${VULGAR[c] ?? c}`)
    .replace(/\s*\u2044\s*/g, "/")
    .replace(/(\d|-)\s+(?=\d+\/)/g, (_, a: string) => (a === "-" ? "-" : `${a} `))
    .trim();
}

/**
 * Parses a length and returns millimetres. A bare number uses `defaultUnit`. A fraction is read
 * only as inches: with `defaultUnit` "mm" it needs the text to say so (`1-1/2 in`), and a
 * fraction marked mm or cm is refused, since a fraction of a millimetre is a typing slip.
 *
 * @example
 * parseLength("4-3/4", "in");  // 120.65
 * parseLength("4¾", "in");     // 120.65
 * parseLength("4 3⁄4 in", "mm"); // 120.65
 * parseLength("120 mm", "in"); // 120
 * parseLength('3.5"', "mm");   // 88.9
 * parseLength("1-1/2", "mm");  // throws FitmentInputError: a fraction is inches, write "1-1/2 in"
 * parseLength("1,5", "in");    // throws FitmentInputError: a comma is decimals or thousands?
 */
export function parseLength(text: string, defaultUnit: LengthUnit): number {
  if (defaultUnit !== "in" && defaultUnit !== "mm") {
    throw new FitmentInputError("defaultUnit", `defaultUnit must be "in" or "mm", got ${JSON.stringify(defaultUnit)}`, defaultUnit);
  }
  if (typeof text !== "string" || text.length > 40) {
    throw new FitmentInputError("length", `length must be short text (${EXAMPLE})`, text);
  }
  if (hasNumberComma(text))
    throw new FitmentInputError("length", commaRefusal(JSON.stringify(text), defaultUnit === "in" ? "4.75" : "120.5"), text);
  const m = LENGTH_RE.exec(asciiFractions(text));
  if (!m) throw new FitmentInputError("length", `${JSON.stringify(text)} is not a length (${EXAMPLE})`, text);
  const [, sign, whole, num, den, onlyNum, onlyDen, unitRaw] = m;
  let value: number;
  if (whole !== undefined) {
    value = Number(whole);
    if (num !== undefined && den !== undefined) {
      const n = Number(num);
      const d = Number(den);
      if (d === 0 || n >= d) {
        throw new FitmentInputError(
          "length",
          `${JSON.stringify(text)}: the fraction ${num}/${den} must be a proper fraction (${EXAMPLE})`,
          text,
        );
      }
      value += n / d;
    }
  } else {
    const d = Number(onlyDen);
    if (d === 0) throw new FitmentInputError("length", `${JSON.stringify(text)}: division by zero (${EXAMPLE})`, text);
    value = Number(onlyNum) / d;
  }
  if (!Number.isFinite(value) || value > 1e6) {
    throw new FitmentInputError("length", `${JSON.stringify(text)} is too large (${EXAMPLE})`, text);
  }
  if (sign === "-") value = -value;
  const unit = unitRaw === undefined ? defaultUnit : unitRaw.toLowerCase();
  const fraction = num !== undefined || onlyNum !== undefined;
  if (fraction && (unit === "mm" || unit === "cm")) {
    const typed = text.trim();
    throw new FitmentInputError(
      "length",
      unitRaw === undefined
        ? `${JSON.stringify(typed)} is a fraction, which is read only in inches: write "${typed} in", or the ${unit} as a decimal`
        : `${JSON.stringify(typed)}: fractions are for inches; give ${unit} as a decimal (${EXAMPLE})`,
      text,
    );
  }
  const mm = unit === "mm" ? value : unit === "cm" ? value * 10 : value * MM_PER_IN;
  return mm === 0 ? 0 : mm;
}

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

/**
 * Formats millimetres as inches with a fraction (`4-3/4 in`), decimal inches or millimetres.
 *
 * @example
 * formatLength(120.65, { unit: "in", fraction: 8 });  // "4-3/4 in"
 * formatLength(120.65, { unit: "in" });               // "4.75 in"
 * formatLength(120.65, { unit: "mm" });               // "120.7 mm"
 */
export function formatLength(mm: number, options: { unit: LengthUnit; fraction?: 8 | 16; decimals?: number }): string {
  if (typeof mm !== "number" || !Number.isFinite(mm)) {
    throw new FitmentInputError("mm", `length must be a finite number of mm, got ${String(mm)} (e.g. 120.65)`, mm);
  }
  const { unit, fraction } = options;
  if (unit !== "in" && unit !== "mm") throw new FitmentInputError("unit", `unit must be "in" or "mm", got ${JSON.stringify(unit)}`, unit);
  if (fraction !== undefined && fraction !== 8 && fraction !== 16) {
    throw new FitmentInputError("fraction", `fraction must be 8 or 16, got ${String(fraction)}`, fraction);
  }
  const decimals = options.decimals ?? (unit === "mm" ? 1 : 2);
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 6) {
    throw new FitmentInputError("decimals", `decimals must be a whole number 0–6, got ${String(decimals)}`, decimals);
  }
  if (unit === "mm") return `${trimZero(mm.toFixed(decimals))} mm`;
  const inches = mm / MM_PER_IN;
  if (fraction === undefined) return `${trimZero(inches.toFixed(decimals))} in`;
  const steps = Math.round(Math.abs(inches) * fraction);
  const sign = inches < 0 && steps > 0 ? "-" : "";
  const whole = Math.floor(steps / fraction);
  const rest = steps % fraction;
  if (rest === 0) return `${sign}${whole} in`;
  const g = gcd(rest, fraction);
  const frac = `${rest / g}/${fraction / g}`;
  return whole === 0 ? `${sign}${frac} in` : `${sign}${whole}-${frac} in`;
}

function trimZero(s: string): string {
  const t = s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
  return t === "-0" ? "0" : t;
}
