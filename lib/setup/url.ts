/**
 * A setup in a query string, the one codec the workspace, the garage pages and every link
 * between them use:
 *
 *   pt=35x12.50R17LT&pd=17&pw=9&po=-12          (offset)
 *   pt=35x12.50R17LT&pd=17&pw=9&pb=4-1/2&pr=bead (backspacing to the bead seat)
 *
 * A one-letter prefix names the setup (`c` current, `p` planned), then `t` tire size, `d` wheel
 * diameter (in), `w` wheel width (in), either `o` offset (mm) or `b` backspacing (in) with `r` its
 * reference (`flange` | `bead`; `bead-seat` is read too) and `f` the flange allowance (in, only
 * when not the default), `s` spacer (mm, only when fitted). Numbers are written as decimals;
 * lengths are read like a form reads them (read.ts): `4-1/2`, `4½` and `4.5` are the same
 * backspacing, `1 in` is a 25.4 mm spacer, and a bare fraction in a mm parameter is refused.
 *
 * This file writes links (and says what a link problem is); the two readers are urlRead.ts, apart
 * so that a page which only writes links does not ship them (the workspace reads its address only
 * on back/forward, after the page has loaded).
 */
import { DEFAULT_FLANGE_IN } from "@/lib/fitment/offset";
import type { BackspacingReference, Setup } from "./model";

/** Which setup a parameter belongs to. */
export type SetupPrefix = "c" | "p";

/** The parameter of each setup field, after the setup's prefix. */
export const SETUP_PARAM = {
  tire: "t",
  wheelDiameterIn: "d",
  wheelWidthIn: "w",
  offsetMm: "o",
  backspacingIn: "b",
  reference: "r",
  flangeIn: "f",
  spacerMm: "s",
} as const;
export type ParamKey = keyof typeof SETUP_PARAM;

/** How a link writes each backspacing reference. */
export const REFERENCE_PARAM_VALUE: Record<BackspacingReference, string> = { flange: "flange", "bead-seat": "bead" };

/** What the codecs accept: a query string (with or without `?`), URLSearchParams, or Next's searchParams object. */
export type QueryLike = string | URLSearchParams | Record<string, string | string[] | undefined>;

/** The query as URLSearchParams (Next's searchParams object: the first of repeated keys). */
export function toParams(q: QueryLike): URLSearchParams {
  if (q instanceof URLSearchParams) return q;
  if (typeof q === "string") return new URLSearchParams(q.startsWith("?") ? q.slice(1) : q);
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(q)) {
    const first = Array.isArray(v) ? v[0] : v;
    if (typeof first === "string") p.set(k, first);
  }
  return p;
}

/** Numbers in the URL: at most 4 decimals, no trailing zeros, no exponent. */
export function urlNumber(v: number): string {
  const r = Math.round(v * 10_000) / 10_000;
  return String(r === 0 ? 0 : r);
}

/** Percent-encodes a value but keeps `/`, `,` and `:` readable (all allowed in a query); spaces become `+`. */
function enc(v: string): string {
  return encodeURIComponent(v).replace(/%2F/gi, "/").replace(/%2C/gi, ",").replace(/%3A/gi, ":").replace(/%20/g, "+");
}

/** Query pairs as `key=value` text, values encoded as the workspace's URL does. */
export function joinQuery(pairs: readonly (readonly [string, string])[]): string {
  return pairs.map(([k, v]) => `${k}=${enc(v)}`).join("&");
}

/** One setup's parameters, in order, appended to `out`. */
export function setupParams(prefix: SetupPrefix, s: Setup, out: [string, string][]): void {
  const k = (key: ParamKey) => `${prefix}${SETUP_PARAM[key]}`;
  out.push(
    [k("tire"), s.tire.trim()],
    [k("wheelDiameterIn"), urlNumber(s.wheelDiameterIn)],
    [k("wheelWidthIn"), urlNumber(s.wheelWidthIn)],
  );
  if (s.position.mode === "offset") {
    out.push([k("offsetMm"), urlNumber(s.position.offsetMm)]);
  } else {
    out.push([k("backspacingIn"), urlNumber(s.position.backspacingIn)], [k("reference"), REFERENCE_PARAM_VALUE[s.position.reference]]);
    if (s.position.flangeIn !== DEFAULT_FLANGE_IN) out.push([k("flangeIn"), urlNumber(s.position.flangeIn)]);
  }
  if (s.spacerMm !== 0) out.push([k("spacerMm"), urlNumber(s.spacerMm)]);
}

/**
 * One setup as query parameters (without `?`); the canonical text also keys a checklist.
 *
 * @example
 * setupQuery("p", { tire: "35x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 });
 * // "pt=35x12.50R17LT&pd=17&pw=9&po=-12"
 */
export function setupQuery(prefix: SetupPrefix, s: Setup): string {
  const out: [string, string][] = [];
  setupParams(prefix, s, out);
  return joinQuery(out);
}

/**
 * A value of a link that could not be used as given: the field as the workspace labels it,
 * the text the link gave, why it was not used, and what the workspace uses instead.
 */
export interface LinkProblem {
  /** As the screen labels it, e.g. "Planned setup · Offset (mm)". */
  field: string;
  /** The link's text ("" when the link left the value out). */
  given: string;
  /** Why it was not used, e.g. "is outside 8–30 in". */
  reason: string;
  /** What is used instead, in the link's unit, e.g. "−12 mm". */
  used: string;
}

/**
 * One problem as a sentence.
 *
 * @example
 * problemText({ field: "Axle ratio", given: "abc", reason: "is not a number", used: "3.73" });
 * // "Axle ratio: “abc” is not a number; using 3.73."
 * problemText({ field: "Axle ratio", given: "", reason: "is empty", used: "3.73" });
 * // "Axle ratio is empty; using 3.73."
 */
export function problemText(p: LinkProblem): string {
  return `${p.field}${p.given === "" ? "" : `: “${p.given}”`} ${p.reason}; using ${p.used}.`;
}

/** A number as a link note shows it: the URL's precision, a typographic minus. */
export const shownNumber = (v: number): string => urlNumber(v).replace(/^-/, "\u2212");
