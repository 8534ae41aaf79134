/**
 * The comparison in a query string: compact, readable, tolerant.
 *
 *   ?ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12&kpi=8&axle=4.10&cruise=60,70
 *
 * Per setup (prefix `c` = current, `p` = planned): `t` tire size, `d` wheel diameter (in), `w`
 * wheel width (in), then either `o` offset (mm) or `b` backspacing (in) with `r` its reference
 * (`flange` | `bead`) and `f` the flange allowance (in, only when not the default), `s` spacer
 * (mm, only when fitted). Vehicle: `kpi` (°), `axle`, `top` (top-gear ratio), `cruise` (mph,
 * comma-separated), `fender` (mm from the hub face), `first` (first-gear ratio) and `low`
 * (transfer-case low ratio). Figures equal to the defaults are left out, so links made before a
 * parameter existed still decode to what they meant.
 *
 * Decoding never throws: a parameter that is missing falls back to its default (a wheel diameter
 * to the tire's rim diameter); one that is not understood, out of bounds, in conflict with another
 * or left over does too, and is reported in `problems` with the field as the workspace labels it
 * and the value used instead, so a link never changes a figure without saying so.
 */
import { parseTireSize } from "@/lib/fitment";
import { SETUP_FIELD_LABEL, SIDE_LABEL, VEHICLE_FIELD_BASE } from "./fields";
import {
  DEFAULT_FLANGE_ALLOWANCE_IN,
  DEFAULT_INPUT,
  DEFAULT_VEHICLE,
  LIMITS,
  type ComparisonInput,
  type BackspacingReferenceValue,
  type Position,
  type SetupInputValues,
  type VehicleValues,
  checkComparison,
  positionOffsetMm,
} from "./model";

/** What `decodeComparison` accepts: a query string (with or without `?`), URLSearchParams, or Next's searchParams object. */
export type QueryLike = string | URLSearchParams | Record<string, string | string[] | undefined>;

/** Numbers in the URL: at most 4 decimals, no trailing zeros, no exponent. */
export function urlNumber(v: number): string {
  const r = Math.round(v * 10_000) / 10_000;
  return String(r === 0 ? 0 : r);
}

/** Percent-encodes a value but keeps `/`, `,` and `:` readable (all allowed in a query); spaces become `+`. */
function enc(v: string): string {
  return encodeURIComponent(v).replace(/%2F/gi, "/").replace(/%2C/gi, ",").replace(/%3A/gi, ":").replace(/%20/g, "+");
}

/** Query pairs as `key=value` text, values encoded as the comparison's URL does. */
export function joinQuery(pairs: readonly (readonly [string, string])[]): string {
  return pairs.map(([k, v]) => `${k}=${enc(v)}`).join("&");
}

function encodeSetup(prefix: "c" | "p", s: SetupInputValues, out: [string, string][]): void {
  out.push([`${prefix}t`, s.tire.trim()], [`${prefix}d`, urlNumber(s.wheelDiameterIn)], [`${prefix}w`, urlNumber(s.wheelWidthIn)]);
  if (s.position.mode === "offset") {
    out.push([`${prefix}o`, urlNumber(s.position.offsetMm)]);
  } else {
    out.push([`${prefix}b`, urlNumber(s.position.backspacingIn)], [`${prefix}r`, s.position.reference === "flange" ? "flange" : "bead"]);
    if (s.position.flangeIn !== DEFAULT_FLANGE_ALLOWANCE_IN) out.push([`${prefix}f`, urlNumber(s.position.flangeIn)]);
  }
  if (s.spacerMm !== 0) out.push([`${prefix}s`, urlNumber(s.spacerMm)]);
}

/**
 * One setup as query parameters (without `?`), in the comparison's format: the garage pages
 * carry a planned setup this way, so a garage link and a workspace link read alike.
 *
 * @example
 * encodeSetupQuery("p", { tire: "35x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 });
 * // "pt=35x12.50R17LT&pd=17&pw=9&po=-12"
 */
export function encodeSetupQuery(prefix: "c" | "p", s: SetupInputValues): string {
  const out: [string, string][] = [];
  encodeSetup(prefix, s, out);
  return joinQuery(out);
}

/**
 * The query string (without `?`) of a comparison.
 *
 * @example
 * encodeComparison(DEFAULT_INPUT); // "ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12"
 */
export function encodeComparison(input: ComparisonInput): string {
  const out: [string, string][] = [];
  encodeSetup("c", input.current, out);
  encodeSetup("p", input.planned, out);
  const v = input.vehicle;
  if (v.kingpinInclinationDeg !== null) out.push(["kpi", urlNumber(v.kingpinInclinationDeg)]);
  if (v.axleRatio !== DEFAULT_VEHICLE.axleRatio) out.push(["axle", urlNumber(v.axleRatio)]);
  if (v.transmissionRatio !== DEFAULT_VEHICLE.transmissionRatio) out.push(["top", urlNumber(v.transmissionRatio)]);
  if (v.cruiseSpeedsMph.join(",") !== DEFAULT_VEHICLE.cruiseSpeedsMph.join(",")) out.push(["cruise", v.cruiseSpeedsMph.map(urlNumber).join(",")]);
  if (v.fenderLineMm !== null) out.push(["fender", urlNumber(v.fenderLineMm)]);
  if (v.firstGearRatio !== null) out.push(["first", urlNumber(v.firstGearRatio)]);
  if (v.transferLowRatio !== null) out.push(["low", urlNumber(v.transferLowRatio)]);
  return joinQuery(out);
}

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

/**
 * A value of the link that could not be used as given: the field as the workspace labels it,
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

/** A number as the note shows it: the URL's precision, a typographic minus. */
const shown = (v: number): string => urlNumber(v).replace(/^-/, "\u2212");

type Bounds = { min: number; max: number };
type Read = { value: number } | { reason: string };

/** A finite number within bounds, or why not (also for empty, "1e999", "12abc", "0x10"). */
function readParam(raw: string, { min, max }: Bounds, unit: string): Read {
  const t = raw.trim();
  if (t === "") return { reason: "is empty" };
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t) || t.length > 20 || !Number.isFinite(Number(t))) return { reason: "is not a number" };
  const v = Number(t);
  if (v < min || v > max) return { reason: `is outside ${shown(min)}–${shown(max)}${unit}` };
  return { value: v === 0 ? 0 : v };
}

/** The setup parameters by the screen's labels (fields.ts). */
const SETUP_LABEL = {
  t: SETUP_FIELD_LABEL.tire,
  d: SETUP_FIELD_LABEL.wheelDiameterIn,
  w: SETUP_FIELD_LABEL.wheelWidthIn,
  o: SETUP_FIELD_LABEL["position.offsetMm"],
  b: SETUP_FIELD_LABEL["position.backspacingIn"],
  r: SETUP_FIELD_LABEL["position.reference"],
  f: SETUP_FIELD_LABEL["position.flangeIn"],
  s: SETUP_FIELD_LABEL.spacerMm,
} as const;

const positionText = (pos: Position): string =>
  pos.mode === "offset"
    ? `an offset of ${shown(pos.offsetMm)} mm`
    : `a backspacing of ${shown(pos.backspacingIn)} in to the ${pos.reference === "flange" ? "flange edge" : "bead seat"}`;

function decodeSetup(prefix: "c" | "p", p: URLSearchParams, fallback: SetupInputValues, problems: LinkProblem[]): SetupInputValues {
  const side = SIDE_LABEL[prefix === "c" ? "current" : "planned"];
  const get = (k: keyof typeof SETUP_LABEL) => p.get(`${prefix}${k}`);
  const note = (k: keyof typeof SETUP_LABEL, reason: string, used: string) => problems.push({ field: `${side} · ${SETUP_LABEL[k]}`, given: get(k) ?? "", reason, used });
  const num = (k: keyof typeof SETUP_LABEL, bounds: Bounds, unit: string, used: () => string): number | undefined => {
    const raw = get(k);
    if (raw === null) return undefined;
    const r = readParam(raw, bounds, unit);
    if ("value" in r) return r.value;
    note(k, r.reason, used());
    return undefined;
  };

  let tire = fallback.tire;
  let rim = fallback.wheelDiameterIn;
  const rawTire = get("t");
  if (rawTire !== null) {
    try {
      if (rawTire.trim().length > 80) throw new Error("too long");
      rim = parseTireSize(rawTire).rimDiameterIn;
      tire = rawTire.trim();
    } catch (e) {
      note("t", e instanceof Error && e.message === "too long" ? "is longer than 80 characters" : "is not a tire size", fallback.tire);
    }
  }
  let diameter = num("d", LIMITS.wheelDiameterIn, " in", () => `${shown(rim)} in (the tire's rim diameter)`);
  if (diameter !== undefined && diameter !== rim) {
    note("d", `does not match the ${shown(rim)} in tire`, `${shown(rim)} in`);
    diameter = undefined;
  }
  const width = num("w", LIMITS.wheelWidthIn, " in", () => `${shown(fallback.wheelWidthIn)} in`);
  const wheelWidthIn = width ?? fallback.wheelWidthIn;
  const fits = (pos: Position) => {
    try {
      positionOffsetMm(pos, wheelWidthIn);
      return true;
    } catch {
      return false;
    }
  };
  const fallbackPosition: Position = fits(fallback.position) ? fallback.position : { mode: "offset", offsetMm: 0 };
  const instead = () => positionText(fallbackPosition);

  const rawB = get("b");
  const rawO = get("o");
  let position: Position | undefined;
  // A valid backspacing wins over an offset; a bad backspacing falls to a valid offset.
  const offsetOf = () => (rawO === null ? undefined : readParam(rawO, LIMITS.offsetMm, " mm"));
  const bs = num("b", LIMITS.backspacingIn, " in", () => {
    const o = offsetOf();
    return o && "value" in o ? `the link's offset, ${shown(o.value)} mm` : instead();
  });
  if (bs !== undefined) {
    const r = get("r");
    let reference: BackspacingReferenceValue = "flange";
    if (r === "bead" || r === "bead-seat") reference = "bead-seat";
    else if (r !== null && r !== "flange") note("r", "is not flange or bead", "the flange edge");
    const f = num("f", LIMITS.flangeIn, " in", () => `${shown(DEFAULT_FLANGE_ALLOWANCE_IN)} in`);
    position = { mode: "backspacing", backspacingIn: bs, reference, flangeIn: f ?? DEFAULT_FLANGE_ALLOWANCE_IN };
    if (rawO !== null) note("o", "is left out: the link also gives a backspacing", `the backspacing, ${shown(bs)} in`);
  } else {
    const off = num("o", LIMITS.offsetMm, " mm", instead);
    if (off !== undefined) position = { mode: "offset", offsetMm: off };
    // A reference or flange allowance means nothing without a backspacing.
    for (const k of ["r", "f"] as const) if (get(k) !== null) note(k, rawB === null ? "is left out: the link gives no backspacing" : "is left out with the backspacing", position ? positionText(position) : instead());
  }
  if (position !== undefined && !fits(position)) {
    note(position.mode === "offset" ? "o" : "b", `puts the mounting face outside a ${shown(wheelWidthIn)} in wide wheel`, instead());
    position = undefined;
  }
  if (position === undefined && rawB === null && rawO === null && fallbackPosition !== fallback.position) {
    problems.push({ field: `${side} · ${SETUP_LABEL.o}`, given: "", reason: `is not in the link, and the default, ${positionText(fallback.position)}, does not fit a ${shown(wheelWidthIn)} in wide wheel`, used: instead() });
  }

  const spacer = num("s", LIMITS.spacerMm, " mm", () => "no spacer");
  return { tire, wheelDiameterIn: diameter ?? rim, wheelWidthIn, position: position ?? fallbackPosition, spacerMm: spacer ?? 0 };
}

/**
 * The vehicle parameters by the screen's labels; cruise speeds and the fender line without the
 * unit, which follows the reader's display choice while the link holds mph and mm (the note
 * says so with each value).
 */
const VEHICLE_LABEL = {
  kpi: VEHICLE_FIELD_BASE.kingpinInclinationDeg,
  axle: VEHICLE_FIELD_BASE.axleRatio,
  top: VEHICLE_FIELD_BASE.transmissionRatio,
  cruise: VEHICLE_FIELD_BASE.cruiseSpeedsMph,
  fender: VEHICLE_FIELD_BASE.fenderLineMm,
  first: VEHICLE_FIELD_BASE.firstGearRatio,
  low: VEHICLE_FIELD_BASE.transferLowRatio,
} as const;

function decodeVehicle(p: URLSearchParams, problems: LinkProblem[]): VehicleValues {
  const num = <T>(key: keyof typeof VEHICLE_LABEL, bounds: Bounds, unit: string, fallback: T, used: string): number | T => {
    const raw = p.get(key);
    if (raw === null) return fallback;
    const r = readParam(raw, bounds, unit);
    if ("value" in r) return r.value;
    problems.push({ field: VEHICLE_LABEL[key], given: raw, reason: r.reason, used });
    return fallback;
  };
  const d = DEFAULT_VEHICLE;
  // In the order of the screen: the notes read top to bottom like the fields.
  const kingpinInclinationDeg = num("kpi", LIMITS.kingpinInclinationDeg, "°", d.kingpinInclinationDeg, "none (not set)");
  const axleRatio = num("axle", LIMITS.axleRatio, "", d.axleRatio, d.axleRatio.toFixed(2));
  const transmissionRatio = num("top", LIMITS.transmissionRatio, "", d.transmissionRatio, d.transmissionRatio.toFixed(2));
  let cruise = d.cruiseSpeedsMph;
  const rawCruise = p.get("cruise");
  if (rawCruise !== null) {
    const parts = rawCruise.split(",").slice(0, 20);
    const kept: number[] = [];
    const dropped: string[] = [];
    for (const part of parts) {
      const r = readParam(part, LIMITS.cruiseMph, " mph");
      if ("value" in r) kept.push(r.value);
      else dropped.push(`${part.trim() === "" ? "an empty entry" : `“${part.trim()}”`} ${r.reason}`);
    }
    const extra = kept.splice(LIMITS.cruiseCount.max);
    if (rawCruise.split(",").length > parts.length || extra.length > 0) dropped.push(`only the first ${LIMITS.cruiseCount.max} speeds are used`);
    cruise = kept.length > 0 ? kept : d.cruiseSpeedsMph;
    if (dropped.length > 0) problems.push({ field: VEHICLE_LABEL.cruise, given: rawCruise, reason: `has entries left out (${dropped.join("; ")})`, used: `${cruise.map(shown).join(", ")} mph` });
  }
  return {
    kingpinInclinationDeg,
    axleRatio,
    transmissionRatio,
    cruiseSpeedsMph: cruise,
    fenderLineMm: num("fender", LIMITS.fenderLineMm, " mm", d.fenderLineMm, "none (not measured)"),
    firstGearRatio: num("first", LIMITS.firstGearRatio, "", d.firstGearRatio, "none (not entered)"),
    transferLowRatio: num("low", LIMITS.transferLowRatio, "", d.transferLowRatio, "none (not entered)"),
  };
}

/** True when the query carries any comparison parameter (else the page opens the demo comparison). */
export function hasComparisonParams(q: QueryLike): boolean {
  const p = toParams(q);
  return [...p.keys()].some((k) => /^[cp][tdwobrfs]$/.test(k) || ["kpi", "axle", "top", "cruise", "fender", "first", "low"].includes(k));
}

/**
 * Reads a comparison from a query string. Never throws; always returns a valid input. Missing
 * parameters take the values of `defaults` (the demo comparison unless given).
 *
 * @example
 * decodeComparison("ct=265/70R17&cw=8&co=25&pt=35x12.50R17LT&pw=9&pb=4.5&pr=flange").input.planned.position;
 * // { mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 }
 */
export function decodeComparison(q: QueryLike, defaults: ComparisonInput = DEFAULT_INPUT): { input: ComparisonInput; problems: LinkProblem[] } {
  const problems: LinkProblem[] = [];
  const whole = (reason: string): LinkProblem => ({ field: "The whole comparison", given: "", reason, used: "the demo comparison" });
  let p: URLSearchParams;
  try {
    p = toParams(q);
  } catch {
    return { input: defaults, problems: [whole("could not be read from the link")] };
  }
  const input: ComparisonInput = {
    current: decodeSetup("c", p, defaults.current, problems),
    planned: decodeSetup("p", p, defaults.planned, problems),
    vehicle: decodeVehicle(p, problems),
  };
  const checked = checkComparison(input);
  if (!checked.ok) return { input: defaults, problems: [...problems, whole(`does not hold together (${checked.issues.map((i) => i.message).join(" ")})`)] };
  return { input: checked.value, problems };
}
