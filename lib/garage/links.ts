/**
 * Setups in query strings, in the comparison workspace's format (lib/comparison/url.ts on the
 * workspace branch): per setup, prefix `c` (current) or `p` (planned) + `t` tire, `d` wheel
 * diameter (in), `w` width (in), then `o` offset (mm) or `b` backspacing (in) with `r`
 * (`flange` | `bead`) and `f` flange allowance (in, only when not the default), `s` spacer (mm,
 * only when fitted); vehicle: `kpi`, `axle`, `top` (left out when not set / default).
 * The garage pages carry the planned setup this way too, so one link format serves both.
 */
import { DEFAULT_AXLE_RATIO, DEFAULT_TRANSMISSION_RATIO } from "@/lib/fitment";
import { DEFAULT_FLANGE_ALLOWANCE_IN, type SetupValues, setupSchema } from "@/lib/validation/setup";

export function urlNumber(v: number): string {
  const r = Math.round(v * 10_000) / 10_000;
  return String(r === 0 ? 0 : r);
}

function enc(v: string): string {
  return encodeURIComponent(v).replace(/%2F/gi, "/").replace(/%2C/gi, ",").replace(/%3A/gi, ":").replace(/%20/g, "+");
}

function pairs(prefix: "c" | "p", s: SetupValues): [string, string][] {
  const out: [string, string][] = [[`${prefix}t`, s.tire.trim()], [`${prefix}d`, urlNumber(s.wheelDiameterIn)], [`${prefix}w`, urlNumber(s.wheelWidthIn)]];
  if (s.position.mode === "offset") out.push([`${prefix}o`, urlNumber(s.position.offsetMm)]);
  else {
    out.push([`${prefix}b`, urlNumber(s.position.backspacingIn)], [`${prefix}r`, s.position.reference === "flange" ? "flange" : "bead"]);
    if (s.position.flangeIn !== DEFAULT_FLANGE_ALLOWANCE_IN) out.push([`${prefix}f`, urlNumber(s.position.flangeIn)]);
  }
  if (s.spacerMm !== 0) out.push([`${prefix}s`, urlNumber(s.spacerMm)]);
  return out;
}

const join = (p: [string, string][]) => p.map(([k, v]) => `${k}=${enc(v)}`).join("&");

/**
 * One setup as query parameters (without `?`).
 *
 * @example
 * setupQuery("p", { tire: "35x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 });
 * // "pt=35x12.50R17LT&pd=17&pw=9&po=-12"
 */
export function setupQuery(prefix: "c" | "p", s: SetupValues): string {
  return join(pairs(prefix, s));
}

/** Reads one setup from query parameters; null when missing or invalid. */
export function setupFromQuery(prefix: "c" | "p", q: URLSearchParams | Record<string, string | string[] | undefined>): SetupValues | null {
  const p = q instanceof URLSearchParams ? q : new URLSearchParams(Object.entries(q).flatMap(([k, v]) => (typeof v === "string" ? [[k, v]] : Array.isArray(v) && v[0] ? [[k, v[0]]] : [])));
  const get = (k: string) => p.get(`${prefix}${k}`) ?? undefined;
  const tire = get("t");
  if (!tire) return null;
  const ref = get("r");
  const position =
    get("b") !== undefined
      ? { mode: "backspacing" as const, backspacingIn: get("b") ?? "", reference: ref === "bead" || ref === "bead-seat" ? "bead-seat" : "flange", flangeIn: get("f") ?? String(DEFAULT_FLANGE_ALLOWANCE_IN) }
      : { mode: "offset" as const, offsetMm: get("o") ?? "" };
  const r = setupSchema.safeParse({ tire, wheelDiameterIn: get("d") ?? "", wheelWidthIn: get("w") ?? "", position, spacerMm: get("s") ?? "" });
  return r.success ? r.data : null;
}

/**
 * The workspace link comparing a vehicle's current setup with a candidate, with the vehicle's
 * figures (KPI, axle ratio, top-gear ratio) when set.
 *
 * @example
 * workspaceHref(current, planned, { kingpinInclinationDeg: 8, axleRatio: 4.1, transmissionRatio: null });
 * // "/workspace?ct=265/70R17&cd=17&cw=8&co=25&pt=…&kpi=8&axle=4.1"
 */
export function workspaceHref(
  current: SetupValues,
  planned: SetupValues,
  vehicle: { kingpinInclinationDeg: number | null; axleRatio: number | null; transmissionRatio: number | null },
): string {
  const out = [...pairs("c", current), ...pairs("p", planned)];
  if (vehicle.kingpinInclinationDeg !== null) out.push(["kpi", urlNumber(vehicle.kingpinInclinationDeg)]);
  if (vehicle.axleRatio !== null && vehicle.axleRatio !== DEFAULT_AXLE_RATIO) out.push(["axle", urlNumber(vehicle.axleRatio)]);
  if (vehicle.transmissionRatio !== null && vehicle.transmissionRatio !== DEFAULT_TRANSMISSION_RATIO) out.push(["top", urlNumber(vehicle.transmissionRatio)]);
  return `/workspace?${join(out)}`;
}
