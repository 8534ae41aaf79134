/**
 * Search text as people type it, made comparable with what is stored: the same "search key" is
 * computed for the query here in JavaScript and for the stored rows in PostgreSQL (the function
 * hubface_search_key and the generated search_key columns, db/migrations/…_search_keys.ts), and
 * the query's key is looked for inside the row's key with LIKE.
 *
 * The key:
 * 1. letters with accents lose them (Unicode NFD, then the combining marks are dropped: é → e,
 *    ñ → n, Å → A), and letters Unicode does not decompose are folded by FOLDED_LETTERS
 *    (Ł → l, Ø → o, ß → ss, Æ → ae, Đ → d …);
 * 2. lower case;
 * 3. the multiplication sign × reads as x, and "37 x 12.50" as "37x12.50" (sizes are typed
 *    with either, and the typeface draws x between digits as ×);
 * 4. trailing zeros of decimals go (12.50 → 12.5, 17.0 → 17), so 37x12.5 finds 37x12.50;
 * 5. runs of spaces become one space.
 *
 * Why not PostgreSQL's unaccent: it is an extension, which not every server lets a migration
 * install, and it leaves Ł, Ø and ß alone anyway. normalize(…, NFD) is core PostgreSQL (13+,
 * UTF-8 databases). The SQL function spells out the same table and patterns as this module;
 * tests/integration/search-key.test.ts runs both over the same texts, so change them together
 * (with a migration that re-creates the function). Letters of other scripts are lower-cased by
 * the database's locale (C.UTF-8 here); the final-sigma form is folded so Greek matches either way.
 */

/** Letters Unicode does not decompose into a base letter plus marks, both cases, and their plain spelling. */
export const FOLDED_LETTERS: Readonly<Record<string, string>> = {
  Ł: "l",
  ł: "l",
  Ø: "o",
  ø: "o",
  Đ: "d",
  đ: "d",
  Ð: "d",
  ð: "d",
  Ħ: "h",
  ħ: "h",
  ı: "i",
  Ŀ: "l",
  ŀ: "l",
  Ŧ: "t",
  ŧ: "t",
  ĸ: "k",
  ß: "ss",
  ẞ: "ss",
  Æ: "ae",
  æ: "ae",
  Œ: "oe",
  œ: "oe",
  Þ: "th",
  þ: "th",
  ς: "σ",
  "×": "x",
};

/** Combining marks left by NFD (diacritical marks and their supplements). */
const MARKS = "[\\u0300-\\u036f\\u1ab0-\\u1aff\\u1dc0-\\u1dff\\u20d0-\\u20ff\\ufe20-\\ufe2f]";
/** White space, spelled out so JavaScript and PostgreSQL agree on it (no-break spaces included). */
const SPACE = "[\\t\\n\\v\\f\\r \\u00a0\\u2000-\\u200a\\u2028\\u2029\\u202f\\u205f\\u3000]";

/**
 * The rewriting steps after folding, in order: [pattern, replacement], in the syntax both
 * engines read alike (no \d or \s: their Unicode reach differs; PostgreSQL writes $1 as \1).
 */
const STEPS: readonly (readonly [string, string])[] = [
  // 37 x 12.50 → 37x12.50 (the digit after is only looked at, so 1 x 2 x 3 → 1x2x3 in one pass)
  [`([0-9])${SPACE}*x${SPACE}*(?=[0-9])`, "$1x"],
  // 12.50 → 12.5, 0.500 → 0.5
  ["(\\.[0-9]*[1-9])0+(?![0-9])", "$1"],
  // 17.0 → 17
  ["([0-9])\\.0+(?![0-9])", "$1"],
  [`${SPACE}+`, " "],
];

const MARKS_RE = new RegExp(MARKS, "gu");
const STEPS_RE = STEPS.map(([p, r]) => [new RegExp(p, "gu"), r] as const);
const FOLD_RE = new RegExp(`[${Object.keys(FOLDED_LETTERS).join("")}]`, "gu");

/**
 * Folds accents and letter variants away and lower-cases.
 *
 * @example
 * foldDiacritics("Łukasz Ørsted-Straße"); // "lukasz orsted-strasse"
 */
export function foldDiacritics(text: string): string {
  return text
    .normalize("NFD")
    .replace(MARKS_RE, "")
    .toLowerCase()
    .replace(FOLD_RE, (c) => FOLDED_LETTERS[c] ?? c);
}

/**
 * The search key of a text (see the module comment); hubface_search_key() computes the same in SQL.
 *
 * @example
 * searchKey("37 × 12.50R17LT"); // "37x12.5r17lt"
 * searchKey("  Łukasz  Nowak "); // "lukasz nowak"
 */
export function searchKey(text: string): string {
  let s = foldDiacritics(text);
  for (const [re, r] of STEPS_RE) s = s.replace(re, r);
  return s.replace(/^ | $/g, "");
}

/**
 * Escapes LIKE's wildcards (and its escape character, backslash) so they match themselves.
 *
 * @example
 * escapeLike("50%_off"); // "50\\%\\_off"
 */
export function escapeLike(text: string): string {
  return text.replace(/[%_\\]/g, (c) => "\\" + c);
}

/**
 * A LIKE pattern that finds `text` anywhere, wildcards in it taken literally.
 *
 * @example
 * containsPattern("6x5.5"); // "%6x5.5%"
 */
export function containsPattern(text: string): string {
  return `%${escapeLike(text)}%`;
}
