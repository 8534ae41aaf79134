/**
 * The comparison in a query string: compact, readable, tolerant.
 *
 *   ?ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12&kpi=8&axle=4.10&cruise=60,70
 *
 * Per setup (prefix `c` = current, `p` = planned): `t` tire size, `d` wheel diameter (in), `w`
 * wheel width (in), then either `o` offset (mm) or `b` backspacing (in) with `r` its reference
 * (`flange` | `bead`) and `f` the flange allowance (in, only when not the default), `s` spacer
 * (mm, only when fitted). Vehicle: `kpi` (°), `axle`, `top` (top-gear ratio), `cruise` (mph,
 * comma-separated), `fender` (mm from the hub face). Figures equal to the defaults are left out.
 *
 * Decoding never throws: a parameter that is missing or not understood falls back to its
 * default (a wheel diameter to the tire's rim diameter) and is reported in `problems`.
 */
import { parseTireSize } from "@/lib/fitment";
import {
  DEFAULT_FLANGE_ALLOWANCE_IN,
  DEFAULT_INPUT,
  DEFAULT_VEHICLE,
  LIMITS,
  type ComparisonInput,
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

/** A finite number within bounds, or undefined (also for empty, "1e999", "12abc", "0x10"). */
function numParam(raw: string | null, { min, max }: { min: number; max: number }): number | undefined {
  if (raw === null) return undefined;
  const t = raw.trim();
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t) || t.length > 20) return undefined;
  const v = Number(t);
  return Number.isFinite(v) && v >= min && v <= max ? (v === 0 ? 0 : v) : undefined;
}

function decodeSetup(prefix: "c" | "p", p: URLSearchParams, fallback: SetupInputValues, problems: string[]): SetupInputValues {
  const side = prefix === "c" ? "current" : "planned";
  const note = (what: string) => problems.push(`${side} ${what}`);
  const get = (k: string) => p.get(`${prefix}${k}`);

  let tire = fallback.tire;
  let rim = fallback.wheelDiameterIn;
  const rawTire = get("t");
  if (rawTire !== null) {
    try {
      rim = parseTireSize(rawTire.slice(0, 80)).rimDiameterIn;
      tire = rawTire.trim().slice(0, 80);
    } catch {
      note("tire size");
    }
  }
  let diameter = numParam(get("d"), LIMITS.wheelDiameterIn);
  if (get("d") !== null && diameter === undefined) note("wheel diameter");
  if (diameter !== undefined && diameter !== rim) {
    note("wheel diameter (does not match the tire)");
    diameter = undefined;
  }
  const width = numParam(get("w"), LIMITS.wheelWidthIn);
  if (get("w") !== null && width === undefined) note("wheel width");
  const wheelWidthIn = width ?? fallback.wheelWidthIn;

  let position: Position | undefined;
  const bs = numParam(get("b"), LIMITS.backspacingIn);
  const off = numParam(get("o"), LIMITS.offsetMm);
  if (bs !== undefined) {
    const r = get("r");
    const reference = r === "bead" || r === "bead-seat" ? "bead-seat" : "flange";
    if (r !== null && reference === "flange" && r !== "flange") note("backspacing reference");
    const f = numParam(get("f"), LIMITS.flangeIn);
    if (get("f") !== null && f === undefined) note("flange allowance");
    position = { mode: "backspacing", backspacingIn: bs, reference, flangeIn: f ?? DEFAULT_FLANGE_ALLOWANCE_IN };
  } else if (off !== undefined) {
    position = { mode: "offset", offsetMm: off };
  } else if (get("b") !== null || get("o") !== null) {
    note(get("b") !== null ? "backspacing" : "offset");
  }
  const fits = (pos: Position) => {
    try {
      positionOffsetMm(pos, wheelWidthIn);
      return true;
    } catch {
      return false;
    }
  };
  if (position !== undefined && !fits(position)) {
    note("wheel position (outside the wheel)");
    position = undefined;
  }
  if (position === undefined) position = fits(fallback.position) ? fallback.position : { mode: "offset", offsetMm: 0 };

  const spacer = numParam(get("s"), LIMITS.spacerMm);
  if (get("s") !== null && spacer === undefined) note("spacer");
  return { tire, wheelDiameterIn: diameter ?? rim, wheelWidthIn, position, spacerMm: spacer ?? 0 };
}

function decodeVehicle(p: URLSearchParams, problems: string[]): VehicleValues {
  const pick = <T>(key: string, parsed: T | undefined, fallback: T, label: string): T => {
    if (p.get(key) !== null && parsed === undefined) problems.push(label);
    return parsed ?? fallback;
  };
  let cruise: number[] | undefined;
  const rawCruise = p.get("cruise");
  if (rawCruise !== null) {
    const list = rawCruise
      .split(",")
      .slice(0, 20)
      .map((s) => numParam(s, LIMITS.cruiseMph))
      .filter((v): v is number => v !== undefined)
      .slice(0, LIMITS.cruiseCount.max);
    cruise = list.length > 0 ? list : undefined;
  }
  return {
    kingpinInclinationDeg: pick("kpi", numParam(p.get("kpi"), LIMITS.kingpinInclinationDeg), DEFAULT_VEHICLE.kingpinInclinationDeg, "kingpin inclination"),
    axleRatio: pick("axle", numParam(p.get("axle"), LIMITS.axleRatio), DEFAULT_VEHICLE.axleRatio, "axle ratio"),
    transmissionRatio: pick("top", numParam(p.get("top"), LIMITS.transmissionRatio), DEFAULT_VEHICLE.transmissionRatio, "top-gear ratio"),
    cruiseSpeedsMph: pick("cruise", cruise, DEFAULT_VEHICLE.cruiseSpeedsMph, "cruise speeds"),
    fenderLineMm: pick("fender", numParam(p.get("fender"), LIMITS.fenderLineMm), DEFAULT_VEHICLE.fenderLineMm, "fender line"),
  };
}

/** True when the query carries any comparison parameter (else the page opens the demo comparison). */
export function hasComparisonParams(q: QueryLike): boolean {
  const p = toParams(q);
  return [...p.keys()].some((k) => /^[cp][tdwobrfs]$/.test(k) || ["kpi", "axle", "top", "cruise", "fender"].includes(k));
}

/**
 * Reads a comparison from a query string. Never throws; always returns a valid input. Missing
 * parameters take the values of `defaults` (the demo comparison unless given).
 *
 * @example
 * decodeComparison("ct=265/70R17&cw=8&co=25&pt=35x12.50R17LT&pw=9&pb=4.5&pr=flange").input.planned.position;
 * // { mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 }
 */
export function decodeComparison(q: QueryLike, defaults: ComparisonInput = DEFAULT_INPUT): { input: ComparisonInput; problems: string[] } {
  const problems: string[] = [];
  let p: URLSearchParams;
  try {
    p = toParams(q);
  } catch {
    return { input: defaults, problems: ["query"] };
  }
  const input: ComparisonInput = {
    current: decodeSetup("c", p, defaults.current, problems),
    planned: decodeSetup("p", p, defaults.planned, problems),
    vehicle: decodeVehicle(p, problems),
  };
  const checked = checkComparison(input);
  if (!checked.ok) return { input: defaults, problems: [...problems, "comparison"] };
  return { input: checked.value, problems };
}
