/**
 * The comparison in a query string: compact, readable, tolerant.
 *
 *   ?ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12&kpi=8&axle=4.10&cruise=60,70
 *
 * The two setups in lib/setup's codec (prefix `c` current, `p` planned; lib/setup/url.ts), then
 * the vehicle: `kpi` (°), `axle`, `top` (top-gear ratio), `cruise` (mph, comma-separated),
 * `fender` (mm from the hub face), `first` (first-gear ratio) and `low` (transfer-case low
 * ratio). Figures equal to the defaults are left out, so links made before a parameter existed
 * still decode to what they meant. A workspace link may also name the saved comparison it was
 * opened from and a garage vehicle (`workspaceUrl`).
 *
 * Reading a link is urlRead.ts, apart so that a page which only writes links does not ship it.
 */
import { type QueryLike, joinQuery, setupParams, toParams, urlNumber } from "@/lib/setup/url";
import { type ComparisonInput, DEFAULT_VEHICLE } from "./model";

/**
 * The query string (without `?`) of a comparison.
 *
 * @example
 * encodeComparison(DEFAULT_INPUT); // "ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12"
 */
export function encodeComparison(input: ComparisonInput): string {
  const out: [string, string][] = [];
  setupParams("c", input.current, out);
  setupParams("p", input.planned, out);
  const v = input.vehicle;
  if (v.kingpinInclinationDeg !== null) out.push(["kpi", urlNumber(v.kingpinInclinationDeg)]);
  if (v.axleRatio !== DEFAULT_VEHICLE.axleRatio) out.push(["axle", urlNumber(v.axleRatio)]);
  if (v.transmissionRatio !== DEFAULT_VEHICLE.transmissionRatio) out.push(["top", urlNumber(v.transmissionRatio)]);
  if (v.cruiseSpeedsMph.join(",") !== DEFAULT_VEHICLE.cruiseSpeedsMph.join(","))
    out.push(["cruise", v.cruiseSpeedsMph.map(urlNumber).join(",")]);
  if (v.fenderLineMm !== null) out.push(["fender", urlNumber(v.fenderLineMm)]);
  if (v.firstGearRatio !== null) out.push(["first", urlNumber(v.firstGearRatio)]);
  if (v.transferLowRatio !== null) out.push(["low", urlNumber(v.transferLowRatio)]);
  return joinQuery(out);
}

/** Where the workspace lives, and the parameters it keeps besides the comparison. */
export const WORKSPACE_PATH = "/workspace";
export const WORKSPACE_PARAM = {
  /** The saved comparison the workspace was opened from (its changes can be saved back to it). */
  saved: "saved",
  /** A garage vehicle: its predicted clearances are shown against the planned setup. */
  vehicle: "v",
} as const;

/**
 * A link to the workspace: the comparison (none: the demo comparison), the saved comparison it
 * belongs to and the garage vehicle picked, in that order. Every /workspace link is built here.
 *
 * @example
 * workspaceUrl({ input: DEFAULT_INPUT, savedId: "c4…", vehicleId: "d4…" });
 * // "/workspace?ct=265/70R17+113T&cd=17&cw=8&co=25&pt=37x12.50R17LT+124Q+LRD&pd=17&pw=9&po=-12&saved=c4…&v=d4…"
 * workspaceUrl({}); // "/workspace"
 */
export function workspaceUrl({
  input,
  savedId,
  vehicleId,
}: {
  input?: ComparisonInput | null;
  savedId?: string | null;
  vehicleId?: string | null;
}): string {
  const parts = [
    ...(input ? [encodeComparison(input)] : []),
    ...(savedId ? [`${WORKSPACE_PARAM.saved}=${encodeURIComponent(savedId)}`] : []),
    ...(vehicleId ? [`${WORKSPACE_PARAM.vehicle}=${encodeURIComponent(vehicleId)}`] : []),
  ];
  return parts.length ? `${WORKSPACE_PATH}?${parts.join("&")}` : WORKSPACE_PATH;
}

/** A workspace parameter as Next gives it (the first of repeated keys), or null. */
export function workspaceParam(q: QueryLike, key: keyof typeof WORKSPACE_PARAM): string | null {
  return toParams(q).get(WORKSPACE_PARAM[key]);
}
