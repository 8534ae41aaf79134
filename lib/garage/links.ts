/**
 * Garage links in the comparison workspace's query format (lib/comparisons/url.ts): the garage
 * pages carry a planned setup as `p*` parameters, and a workspace link also names the vehicle
 * (`v=<id>`) so the workspace shows that vehicle's predicted clearances.
 */
import { DEFAULT_FLANGE_ALLOWANCE_IN, DEFAULT_VEHICLE } from "@/lib/comparisons/model";
import { type QueryLike, encodeComparison, encodeSetupQuery, toParams } from "@/lib/comparisons/url";
import { type SetupValues, setupSchema } from "@/lib/setup/schema";

/** The workspace's query parameter naming a garage vehicle. */
export const VEHICLE_PARAM = "v";

/**
 * One setup as query parameters (without `?`); the canonical text also keys a checklist.
 *
 * @example
 * setupQuery("p", { tire: "35x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 });
 * // "pt=35x12.50R17LT&pd=17&pw=9&po=-12"
 */
export function setupQuery(prefix: "c" | "p", s: SetupValues): string {
  return encodeSetupQuery(prefix, s);
}

/**
 * Reads one setup from query parameters, strictly (unlike the workspace's tolerant decoder):
 * null when missing or invalid, so a page never acts on a setup the user did not give.
 */
export function setupFromQuery(prefix: "c" | "p", q: QueryLike): SetupValues | null {
  const p = toParams(q);
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
 * figures (KPI, axle ratio, top-gear ratio) when set and the vehicle itself (`v`) when its id is
 * given.
 *
 * @example
 * workspaceHref(current, planned, { id: "…", kingpinInclinationDeg: 8, axleRatio: 4.1, transmissionRatio: null });
 * // "/workspace?ct=265/70R17&cd=17&cw=8&co=25&pt=…&kpi=8&axle=4.1&v=…"
 */
export function workspaceHref(
  current: SetupValues,
  planned: SetupValues,
  vehicle: { id?: string; kingpinInclinationDeg: number | null; axleRatio: number | null; transmissionRatio: number | null },
): string {
  const q = encodeComparison({
    current,
    planned,
    vehicle: {
      ...DEFAULT_VEHICLE,
      kingpinInclinationDeg: vehicle.kingpinInclinationDeg,
      axleRatio: vehicle.axleRatio ?? DEFAULT_VEHICLE.axleRatio,
      transmissionRatio: vehicle.transmissionRatio ?? DEFAULT_VEHICLE.transmissionRatio,
    },
  });
  return `/workspace?${q}${vehicle.id ? `&${VEHICLE_PARAM}=${vehicle.id}` : ""}`;
}
