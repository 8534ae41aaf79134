/**
 * Tire size designations: parsing and formatting.
 *
 * Three systems are understood (ISO 4000-1 / ETRTO / TRA designations):
 * - metric: `[P|LT|ST|T]<width mm>/<aspect ratio><R|D|B|ZR|-><rim in>[LT|C] [service description]`,
 *   e.g. `LT285/70R17 121/118Q`, `P225/75R15 102S`, `205/55R16 91V`, `255/35ZR18 94Y`, and the
 *   ETRTO commercial (`C`) sizes with their single/dual load indexes, `235/65R16C 121/119R`;
 * - flotation: `<overall diameter in>x<section width in><R|D|B|-><rim in>[LT]`, e.g. `37x12.50R17LT`,
 *   also typed without the decimal point (`35x1250R17` → `35x12.50R17`);
 * - numeric: `<section width in><R|D|B|-><rim in>[LT|C]`, e.g. `7.50R16`, `7.50-16`, `7.50R16C`.
 *
 * After the size come, in any order, what people copy from a sidewall: the service description
 * (`121/118Q`: load index, dual load index, speed symbol), a load marking (`XL`/`Extra Load`,
 * `RF`/`Reinforced`, `SL`/`Standard Load`), a load range (`LRE`, `LR E`, `Load Range E`, `(E)`,
 * `E`, `10PR`, `10 ply`) and the markings mud-and-snow (`M+S`, `M/S`, `M&S`), severe snow
 * (`3PMSF`, the three-peak mountain snowflake spelled out, `❄`) and run-flat (`RFT`, `run-flat`,
 * `ROF`, `ZP`). The normalized text puts them in one order: service description, load marking,
 * load range, then `M+S`, `3PMSF`, `RUN-FLAT`. A `C` glued to the rim diameter is the commercial
 * suffix; a `C` after a space stays the load range C (as before).
 *
 * Dimensions (mm): metric section height H = S·AR/100 and overall diameter D = d + 2H
 * (ISO 4000-1 / ETRTO / UN R30). Flotation sizes state D and S in inches; their aspect ratio is
 * implied, AR = (D − d)/2 / S × 100. Numeric sizes state S in inches; their aspect ratio is taken
 * as the nominal 92 series (from memory; actual dimensions of numeric LT tires vary by maker).
 */
import { TireSizeError } from "./errors";
import { LOAD_INDEX_KG, SPEED_SYMBOL_KMH } from "./loadSpeed";
import { LOAD_RANGES, loadRangeFromPly, type LoadRange } from "./loadRange";
import { MM_PER_IN } from "./units";

/** Designation system of a tire size. */
export type TireSystem = "metric" | "flotation" | "numeric";
/** Service type prefix: passenger, light truck, special trailer, temporary spare. */
export type ServiceType = "P" | "LT" | "ST" | "T";
/** Construction code: radial, diagonal (bias), belted bias, or `-` (bias, numeric style). */
export type Construction = "R" | "D" | "B" | "-";
/**
 * A sidewall marking beyond the size, load and speed: mud-and-snow (`M+S`), the severe-snow
 * pictogram (three-peak mountain snowflake, `3PMSF`) and run-flat (`RUN-FLAT`).
 */
export type TireMarking = "M+S" | "3PMSF" | "RUN-FLAT";
/** Order of the markings in the normalized text. */
const MARKING_ORDER: readonly TireMarking[] = ["M+S", "3PMSF", "RUN-FLAT"];

/** A parsed tire size. All lengths in mm, the rim diameter in inches (as marked). */
export interface TireSize {
  /** Normalized designation, e.g. `LT285/70R17 121/118Q`. */
  readonly text: string;
  readonly system: TireSystem;
  readonly service: ServiceType | null;
  /** ETRTO commercial size: the `C` suffix after the rim diameter (`235/65R16C`). */
  readonly commercial: boolean;
  readonly construction: Construction;
  /** `ZR` in the size: construction R for speeds above 240 km/h. */
  readonly speedRatedConstruction: boolean;
  /** Nominal section width on the measuring rim, mm. */
  readonly sectionWidthMm: number;
  /** Aspect ratio H/S × 100; implied for flotation and numeric sizes. */
  readonly aspectRatio: number;
  /** True when the aspect ratio is not printed in the designation but derived. */
  readonly aspectRatioImplied: boolean;
  readonly rimDiameterIn: number;
  /** Section height H, mm. */
  readonly sidewallMm: number;
  /** Overall (unloaded) diameter D = d + 2H, mm. */
  readonly overallDiameterMm: number;
  readonly loadIndex: number | null;
  readonly dualLoadIndex: number | null;
  readonly speedSymbol: string | null;
  /** Service description in brackets, e.g. `(94Y)`: the tire is rated above the symbol's speed. */
  readonly serviceDescriptionBracketed: boolean;
  readonly loadRange: LoadRange | null;
  /** `XL` (extra load), `SL` (standard load) or `RF` (reinforced) marking, when given. */
  readonly loadMarking: "XL" | "SL" | "RF" | null;
  /** Other sidewall markings, in the order of {@link TireMarking}: `M+S`, `3PMSF`, `RUN-FLAT`. */
  readonly markings: readonly TireMarking[];
  /** Flotation only: overall diameter as designated, inches. */
  readonly designatedDiameterIn: number | null;
  /** Flotation and numeric: section width as designated, inches. */
  readonly designatedSectionIn: number | null;
}

/** Nominal aspect ratio used for numeric sizes (from memory: numeric sizes are a ~92 series). */
export const NUMERIC_ASPECT_RATIO = 92;

const EXAMPLES = "accepted forms: 265/70R17, LT285/70R17 121/118Q LRE M+S, P225/75R15 102S, 235/65R16C 121/119R, 37x12.50R17LT, 7.50R16";

const METRIC_RE = /^(P|LT|ST|T)?(\d{3})\/(\d{2,3})(ZR|R|D|B|-)(\d{2}(?:\.5)?)(LT|C)?$/;
// The section may be typed without its decimal point: 1250 = 12.50 (3 or 4 digits, see below).
const FLOTATION_RE = /^(LT)?(\d{2}(?:\.\d)?)X(\d{1,2}(?:\.\d{1,2})?|\d{3,4})(R|D|B|-)(\d{2}(?:\.5)?)(LT)?$/;
const NUMERIC_RE = /^(LT|ST|T)?(\d{1,2}\.\d{2})(R|D|B|-)(\d{2}(?:\.5)?)(LT|C)?$/;
const SERVICE_RE = /^(\()?(\d{1,3})(?:\/(\d{1,3}))?(A[1-8]|[B-HJ-NP-WY])?(\))?$/;

function fail(text: string, why: string): never {
  const reason = `${why} (${EXAMPLES})`;
  throw new TireSizeError(
    `Tire size ${JSON.stringify(text.length > 40 ? text.slice(0, 40) + "…" : text)}: ${reason}`,
    text,
    "tire",
    reason,
  );
}

function checkRim(text: string, rim: number): void {
  if (rim < 8 || rim > 30) fail(text, `rim diameter ${rim} in is outside 8–30 in`);
}

function checkLoadIndex(text: string, li: number): void {
  if (li >= LOAD_INDEX_KG.length) fail(text, `load index ${li} is beyond the load index table (0–${LOAD_INDEX_KG.length - 1})`);
}

interface Tail {
  loadIndex: number | null;
  dualLoadIndex: number | null;
  speedSymbol: string | null;
  serviceDescriptionBracketed: boolean;
  loadMarking: "XL" | "SL" | "RF" | null;
  loadRange: LoadRange | null;
  markings: TireMarking[];
}

/** What may follow the size, for the message when something else does. */
const TAIL_FORMS =
  "expected a service description (121/118Q), XL, RF, a load range (LRE, Load Range E, 10PR) or a marking (M+S, 3PMSF, RFT)";

/**
 * Phrases read after the size, each anchored at the start of what is left and ending at a space
 * or the end. Spellings are what people type or copy (common practice, no source); the marks
 * themselves are the sidewall markings of UN R30 / UN R117 (M+S, the severe-snow pictogram) and
 * the trade's load markings (XL, RF) and load range letters (TRA).
 */
const LOAD_MARKING_RE = /^(XL|EXTRA ?-?LOAD|SL|STANDARD ?-?LOAD|RF|REINF\.?|REINFORCED)(?= |$)/;
const LOAD_RANGE_RE = /^(?:LR ?-?|LOAD ?-?RANGE ?-?|\()?([B-HJLMN])\)?(?= |$)/;
const PLY_RE = /^(\d{1,2}) ?(?:PR|PLY)(?= |$)/;
const MARKING_RES: readonly [RegExp, TireMarking][] = [
  [/^(?:M ?[+&/] ?S|M\.S\.|MS|MUD (?:AND|&|\+) SNOW)(?= |$)/, "M+S"],
  [
    /^(?:3PMSF|3PMS|(?:3|THREE) ?-?PEAK ?-?MOUNTAIN ?-?SNOW ?FLAKE|MOUNTAIN ?-?SNOW ?FLAKE|SEVERE ?-?SNOW|\u{1F3D4}? ?\u2744\uFE0F?)(?= |$)/u,
    "3PMSF",
  ],
  [/^(?:RFT|RUN ?-?FLAT|ROF|ZP)(?= |$)/, "RUN-FLAT"],
];

/** The marking phrase at the start of `rest`, if any. */
function matchMarking(rest: string): { mark: TireMarking; used: string } | null {
  for (const [re, mark] of MARKING_RES) {
    const m = re.exec(rest);
    if (m) return { mark, used: m[0] };
  }
  return null;
}

function readServiceDescription(text: string, token: string, t: Tail): void {
  const m = SERVICE_RE.exec(token);
  if (!m) fail(text, `service description ${JSON.stringify(token)} is not load index[/dual] + speed symbol like 121/118Q`);
  if ((m[1] === undefined) !== (m[5] === undefined)) fail(text, `unbalanced brackets in ${JSON.stringify(token)}`);
  t.serviceDescriptionBracketed = m[1] !== undefined;
  const li = Number(m[2]);
  checkLoadIndex(text, li);
  t.loadIndex = li;
  if (m[3] !== undefined) {
    const dual = Number(m[3]);
    checkLoadIndex(text, dual);
    t.dualLoadIndex = dual;
  }
  if (m[4] !== undefined) {
    if (SPEED_SYMBOL_KMH[m[4]] === undefined) fail(text, `unknown speed symbol ${m[4]}`);
    t.speedSymbol = m[4];
  }
}

function setLoadRange(text: string, t: Tail, lr: LoadRange): void {
  if (t.loadRange !== null && t.loadRange !== lr) fail(text, `load range given twice (${t.loadRange} and ${lr})`);
  t.loadRange = lr;
}

/** Nothing after the size. */
function emptyTail(): Tail {
  return {
    loadIndex: null,
    dualLoadIndex: null,
    speedSymbol: null,
    serviceDescriptionBracketed: false,
    loadMarking: null,
    loadRange: null,
    markings: [],
  };
}

/** Reads the tokens after the size, in any order (see the module comment). */
function parseTail(text: string, tokens: string[]): Tail {
  const t = emptyTail();
  let rest = tokens.join(" ");
  let haveService = false;
  while (rest !== "") {
    let m: RegExpExecArray | null;
    let used: string;
    const marking = matchMarking(rest);
    if ((m = PLY_RE.exec(rest))) {
      const n = Number(m[1]);
      if (n < 4 || n > 24 || n % 2 !== 0) fail(text, `ply rating ${n} is not an even number from 4 to 24`);
      setLoadRange(text, t, loadRangeFromPly(n));
      used = m[0];
    } else if (marking !== null) {
      // Before the service description: "3PMSF" and "3 peak mountain snowflake" start with a digit.
      if (!t.markings.includes(marking.mark)) t.markings.push(marking.mark);
      used = marking.used;
    } else if (/^\(?\d/.test(rest)) {
      used = rest.split(" ", 1)[0] as string;
      if (haveService) fail(text, `service description given twice (${JSON.stringify(used)})`);
      readServiceDescription(text, used, t);
      haveService = true;
    } else if ((m = LOAD_MARKING_RE.exec(rest))) {
      const word = m[1] as string;
      const mark = word.startsWith("X") || word.startsWith("E") ? "XL" : word.startsWith("S") ? "SL" : "RF";
      if (t.loadMarking !== null && t.loadMarking !== mark) fail(text, `load marking given twice (${t.loadMarking} and ${mark})`);
      t.loadMarking = mark;
      used = m[0];
    } else if ((m = LOAD_RANGE_RE.exec(rest))) {
      setLoadRange(text, t, m[1] as LoadRange);
      used = m[0];
    } else {
      return fail(text, `unexpected ${JSON.stringify(rest.split(" ", 1)[0])} after the size; ${TAIL_FORMS}`);
    }
    rest = rest.slice(used.length).trimStart();
  }
  t.markings.sort((a, b) => MARKING_ORDER.indexOf(a) - MARKING_ORDER.indexOf(b));
  if (t.loadRange !== null && !(LOAD_RANGES as readonly string[]).includes(t.loadRange)) {
    fail(text, `unknown load range ${t.loadRange}`);
  }
  return t;
}

/** Splits the designation from the service description: the size has no inner spaces once normalized. */
function splitSize(upper: string): { size: string; tail: string[] } {
  // Join spaces inside the size itself ("LT 285 / 70 R 17") but keep the tail tokens apart.
  // The size ends at the rim diameter (two digits, optional .5) plus an optional LT suffix or a
  // commercial C glued to the rim diameter ("235/65R16C"; "R16 C" keeps C as the load range).
  const m = /^((?:P|LT|ST|T)?\s*[\d.]+\s*(?:\/\s*\d+|X\s*[\d.]+)?\s*(?:ZR|R|D|B|-)\s*\d{2}(?:\.5)?(?:\s*LT|C)?)(?=\s|\(|$)(.*)$/.exec(
    upper,
  );
  if (!m || m[1] === undefined) return { size: upper.replace(/\s+/g, ""), tail: [] };
  const tail = (m[2] ?? "").trim();
  return { size: m[1].replace(/\s+/g, ""), tail: tail === "" ? [] : tail.split(/\s+/) };
}

/** Multiplication signs and letters that look like the flotation `x` (after NFKC). */
const X_LOOKALIKES = /[\u00D7\u2715\u2716\u2A2F\u0445\u0425]/g;
/** Slashes other than `/` (after NFKC): division slash, fraction slash. */
const SLASH_LOOKALIKES = /[\u2215\u2044]/g;
/** Hyphens, dashes and the minus sign (after NFKC), for the bias `-` in `7.50-16`. */
const DASH_LOOKALIKES = /[\u2010-\u2015\u2212\uFE63]/g;

/**
 * Folds what people type or paste for a designation to its ASCII characters: Unicode NFKC turns
 * fullwidth letters, digits, `／` and `．` and the no-break spaces into ASCII, then the
 * multiplication signs (`×` U+00D7, `✕`, `✖`, `⨯`) and the Cyrillic `х`/`Х` that look like the
 * flotation `x` become `X`, other slashes `/` and dashes `-`. A typeface shows `37x12.50` as
 * `37×12.50`, so that is what gets copied (common practice, no source).
 *
 * @example
 * foldLookalikes("37×12.50R17"); // "37X12.50R17"
 * foldLookalikes("２８５／７５Ｒ１６"); // "285/75R16"
 */
function foldLookalikes(text: string): string {
  return text.normalize("NFKC").replace(X_LOOKALIKES, "X").replace(SLASH_LOOKALIKES, "/").replace(DASH_LOOKALIKES, "-");
}

function fixed2(n: number): string {
  return n.toFixed(2);
}

/** Builds the normalized text of a size from its fields. */
function buildText(s: Omit<TireSize, "text">): string {
  let size: string;
  const c = s.speedRatedConstruction ? "ZR" : s.construction;
  if (s.system === "metric") {
    size = `${s.service ?? ""}${Math.round(s.sectionWidthMm)}/${s.aspectRatio}${c}${s.rimDiameterIn}${s.commercial ? "C" : ""}`;
  } else if (s.system === "flotation") {
    size = `${s.designatedDiameterIn}x${fixed2(s.designatedSectionIn ?? 0)}${c}${s.rimDiameterIn}${s.service === "LT" ? "LT" : ""}`;
  } else {
    size = `${s.service ?? ""}${fixed2(s.designatedSectionIn ?? 0)}${c}${s.rimDiameterIn}${s.commercial ? "C" : ""}`;
  }
  const parts = [size];
  if (s.loadIndex !== null) {
    const sd = `${s.loadIndex}${s.dualLoadIndex !== null ? `/${s.dualLoadIndex}` : ""}${s.speedSymbol ?? ""}`;
    parts.push(s.serviceDescriptionBracketed ? `(${sd})` : sd);
  }
  if (s.loadMarking !== null) parts.push(s.loadMarking);
  if (s.loadRange !== null) parts.push(`LR${s.loadRange}`);
  parts.push(...s.markings);
  return parts.join(" ");
}

/**
 * Parses a tire size designation (metric, flotation or numeric; case and spacing variants, `×`
 * or `X` for the flotation `x` and fullwidth or lookalike characters accepted, see
 * {@link foldLookalikes}). Throws {@link TireSizeError} for anything else — never another error type.
 *
 * @example
 * const t = parseTireSize("lt285/70r17 121/118q");
 * t.text;              // "LT285/70R17 121/118Q"
 * t.overallDiameterMm; // 830.8
 * parseTireSize("37x12.50R17LT").aspectRatio; // 80 (implied)
 * parseTireSize("37×12.50R17").text;          // "37x12.50R17"
 * parseTireSize("33X1250R15LT").text;         // "33x12.50R15LT"
 * parseTireSize("lt285/70r17 m/s 121/118q load range e 3pmsf").text; // "LT285/70R17 121/118Q LRE M+S 3PMSF"
 * parseTireSize("235/65R16C 121/119R");       // commercial: true, loadIndex 121, dualLoadIndex 119
 */
export function parseTireSize(text: string): TireSize {
  if (typeof text !== "string") {
    const reason = `must be text, got ${text === null ? "null" : typeof text} (${EXAMPLES})`;
    throw new TireSizeError(`Tire size ${reason}`, text, "tire", reason);
  }
  const upper = foldLookalikes(text).trim().toUpperCase().replace(/\s+/g, " ");
  if (upper === "") fail(text, "the text is empty");
  if (upper.length > 80) fail(text, "the text is too long to be a tire size");
  const { size, tail } = splitSize(upper);
  const t = parseTail(text, tail);

  let m: RegExpExecArray | null;
  if ((m = METRIC_RE.exec(size))) {
    const [, prefix, w, ar, cons, rim, suffix] = m;
    if (prefix !== undefined && suffix !== undefined) fail(text, `service type given twice (${prefix} prefix and ${suffix} suffix)`);
    const width = Number(w);
    const aspect = Number(ar);
    const rimIn = Number(rim);
    if (width < 100 || width > 500) fail(text, `section width ${width} mm is outside 100–500 mm`);
    if (aspect < 20 || aspect > 100) fail(text, `aspect ratio ${aspect} is outside 20–100`);
    checkRim(text, rimIn);
    const sidewall = (width * aspect) / 100;
    return finish({
      system: "metric",
      service: suffix === "C" ? null : (((prefix ?? suffix) as ServiceType | undefined) ?? null),
      commercial: suffix === "C",
      construction: cons === "ZR" ? "R" : (cons as Construction),
      speedRatedConstruction: cons === "ZR",
      sectionWidthMm: width,
      aspectRatio: aspect,
      aspectRatioImplied: false,
      rimDiameterIn: rimIn,
      sidewallMm: sidewall,
      overallDiameterMm: rimIn * MM_PER_IN + 2 * sidewall,
      designatedDiameterIn: null,
      designatedSectionIn: null,
      ...t,
    });
  }
  if ((m = FLOTATION_RE.exec(size))) {
    const [, prefix, d, s, cons, rim, suffix] = m;
    if (prefix !== undefined && suffix !== undefined) fail(text, "LT given twice");
    const dia = Number(d);
    // "1250" typed for "12.50": the decimal point goes before the last two digits (common practice, no source).
    const sec = s !== undefined && !s.includes(".") && s.length >= 3 ? Number(s) / 100 : Number(s);
    const rimIn = Number(rim);
    checkRim(text, rimIn);
    if (dia < 20 || dia > 66) fail(text, `overall diameter ${dia} in is outside 20–66 in`);
    if (sec < 5 || sec > 25) fail(text, `section width ${sec} in is outside 5–25 in`);
    const sidewall = ((dia - rimIn) * MM_PER_IN) / 2;
    const aspect = (sidewall / (sec * MM_PER_IN)) * 100;
    if (!(aspect >= 20 && aspect <= 120))
      fail(text, `overall diameter ${dia} in and rim ${rimIn} in leave an implied aspect ratio of ${aspect.toFixed(0)}, outside 20–120`);
    return finish({
      system: "flotation",
      service: prefix !== undefined || suffix !== undefined ? "LT" : null,
      commercial: false,
      construction: cons as Construction,
      speedRatedConstruction: false,
      sectionWidthMm: sec * MM_PER_IN,
      aspectRatio: aspect,
      aspectRatioImplied: true,
      rimDiameterIn: rimIn,
      sidewallMm: sidewall,
      overallDiameterMm: dia * MM_PER_IN,
      designatedDiameterIn: dia,
      designatedSectionIn: sec,
      ...t,
    });
  }
  if ((m = NUMERIC_RE.exec(size))) {
    const [, prefix, s, cons, rim, suffix] = m;
    if (prefix !== undefined && suffix !== undefined) fail(text, `service type given twice (${prefix} prefix and ${suffix} suffix)`);
    const sec = Number(s);
    const rimIn = Number(rim);
    checkRim(text, rimIn);
    if (sec < 4 || sec > 20) fail(text, `section width ${sec} in is outside 4–20 in`);
    const sectionMm = sec * MM_PER_IN;
    const sidewall = (sectionMm * NUMERIC_ASPECT_RATIO) / 100;
    return finish({
      system: "numeric",
      service: suffix === "C" ? null : (((prefix ?? suffix) as ServiceType | undefined) ?? null),
      commercial: suffix === "C",
      construction: cons as Construction,
      speedRatedConstruction: false,
      sectionWidthMm: sectionMm,
      aspectRatio: NUMERIC_ASPECT_RATIO,
      aspectRatioImplied: true,
      rimDiameterIn: rimIn,
      sidewallMm: sidewall,
      overallDiameterMm: rimIn * MM_PER_IN + 2 * sidewall,
      designatedDiameterIn: null,
      designatedSectionIn: sec,
      ...t,
    });
  }
  const guess = slashedGuess(upper);
  return fail(text, `not a recognised tire size designation${guess ? `; did you mean ${guess}?` : ""}`);
}

/** Three numbers between slashes with an optional P or LT before them, e.g. "285/70/17" or "LT 285/70/17 121S". */
const SLASHED_RE = /^(P|LT)?\s*(\d{3})\s*\/\s*(\d{2,3})\s*\/\s*(\d{2}(?:\.5)?)(?=\s|$)(.*)$/;

/**
 * The metric size someone most likely meant by "285/70/17": the construction letter typed as a
 * slash (common practice, no source). Offered only when that reading is itself a valid size.
 */
function slashedGuess(upper: string): string | null {
  const m = SLASHED_RE.exec(upper);
  if (!m) return null;
  const [, prefix, width, aspect, rim, rest] = m;
  try {
    return parseTireSize(`${prefix ?? ""}${width}/${aspect}R${rim}${rest ?? ""}`).text;
  } catch {
    return null;
  }
}

function finish(fields: Omit<TireSize, "text">): TireSize {
  return Object.freeze({ text: buildText(fields), ...fields, markings: Object.freeze([...fields.markings]) });
}

/**
 * Formats a tire size as its normalized designation (the inverse of {@link parseTireSize}:
 * `parseTireSize(formatTireSize(t))` equals `t`).
 *
 * @example
 * formatTireSize(parseTireSize("35X12.5r15")); // "35x12.50R15"
 * formatTireSize(parseTireSize("p225/75 r15 102s"), { serviceDescription: false }); // "P225/75R15"
 */
export function formatTireSize(size: TireSize, options: { serviceDescription?: boolean } = {}): string {
  if (options.serviceDescription === false) {
    return buildText({ ...size, ...emptyTail() });
  }
  return buildText(size);
}

/**
 * Returns `size` when it is already parsed, otherwise parses it.
 *
 * @example
 * toTireSize("265/70R17").sectionWidthMm; // 265
 */
export function toTireSize(size: string | TireSize): TireSize {
  return typeof size === "string" ? parseTireSize(size) : size;
}
