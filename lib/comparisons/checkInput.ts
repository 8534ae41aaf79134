/**
 * Validation of a comparison input (model.ts): plain TypeScript with no dependency beyond the
 * setup checks, so the browser can validate as you type without shipping zod. A setup is checked
 * with `checkSetup` without text (lib/setup/check.ts), so an input that passes never makes
 * `computeComparison` throw.
 */
import { type Checked, type Issue, checkSetup, isObject } from "@/lib/setup/check";
import { type ComparisonInput, VEHICLE_LIMITS, type VehicleValues } from "./model";

const cap = (s: string) => `${s[0]?.toUpperCase() ?? ""}${s.slice(1)}`;

/** A number within bounds, or an issue ("Enter … as a number" / "… must be between …"). */
function num(
  v: unknown,
  path: Issue["path"],
  label: string,
  b: { min: number; max: number },
  unit: string,
  example: string,
  issues: Issue[],
): number {
  if (typeof v !== "number" || !Number.isFinite(v)) {
    issues.push({ path, message: `Enter ${label} as a number (e.g. ${example}).` });
    return NaN;
  }
  if (v < b.min || v > b.max) {
    issues.push({ path, message: `${cap(label)} must be between ${b.min} and ${b.max}${unit} (e.g. ${example}).` });
    return NaN;
  }
  return v;
}

/** Validates the vehicle figures. */
export function checkVehicle(v: unknown, path: Issue["path"] = []): Checked<VehicleValues> {
  const issues: Issue[] = [];
  if (!isObject(v))
    return { ok: false, issues: [{ path, message: "Give the vehicle figures (axle ratio, top-gear ratio, cruise speeds)." }] };
  const kpi =
    v.kingpinInclinationDeg === null
      ? null
      : num(
          v.kingpinInclinationDeg,
          [...path, "kingpinInclinationDeg"],
          "the kingpin inclination",
          VEHICLE_LIMITS.kingpinInclinationDeg,
          "°",
          "8",
          issues,
        );
  const axleRatio = num(v.axleRatio, [...path, "axleRatio"], "the axle ratio", VEHICLE_LIMITS.axleRatio, "", "3.73", issues);
  const transmissionRatio = num(
    v.transmissionRatio,
    [...path, "transmissionRatio"],
    "the top-gear ratio",
    VEHICLE_LIMITS.transmissionRatio,
    "",
    "1.00",
    issues,
  );
  const cruise: number[] = [];
  const c = v.cruiseSpeedsMph;
  if (!Array.isArray(c)) issues.push({ path: [...path, "cruiseSpeedsMph"], message: "Enter one to six cruise speeds (e.g. 60, 70)." });
  else if (c.length < VEHICLE_LIMITS.cruiseCount.min)
    issues.push({ path: [...path, "cruiseSpeedsMph"], message: "Enter at least one cruise speed (e.g. 65)." });
  else if (c.length > VEHICLE_LIMITS.cruiseCount.max)
    issues.push({ path: [...path, "cruiseSpeedsMph"], message: "Enter at most six cruise speeds." });
  else
    c.forEach((s: unknown, i) =>
      cruise.push(num(s, [...path, "cruiseSpeedsMph", i], "a cruise speed", VEHICLE_LIMITS.cruiseMph, " mph", "65", issues)),
    );
  const fender =
    v.fenderLineMm === null
      ? null
      : num(v.fenderLineMm, [...path, "fenderLineMm"], "the fender line distance", VEHICLE_LIMITS.fenderLineMm, " mm", "140", issues);
  // Missing (undefined) reads as not entered: comparisons saved before these fields existed load as they were.
  const first =
    v.firstGearRatio === null || v.firstGearRatio === undefined
      ? null
      : num(v.firstGearRatio, [...path, "firstGearRatio"], "the first-gear ratio", VEHICLE_LIMITS.firstGearRatio, "", "4.03", issues);
  const low =
    v.transferLowRatio === null || v.transferLowRatio === undefined
      ? null
      : num(
          v.transferLowRatio,
          [...path, "transferLowRatio"],
          "the transfer-case low ratio",
          VEHICLE_LIMITS.transferLowRatio,
          "",
          "2.72",
          issues,
        );
  if (issues.length > 0) return { ok: false, issues };
  return {
    ok: true,
    value: {
      kingpinInclinationDeg: kpi,
      axleRatio,
      transmissionRatio,
      cruiseSpeedsMph: cruise,
      fenderLineMm: fender,
      firstGearRatio: first,
      transferLowRatio: low,
    },
  };
}

/**
 * Validates a whole comparison input. Returns a clean copy (known fields only) or every issue.
 *
 * @example
 * checkComparison(DEFAULT_INPUT).ok; // true
 * checkComparison({ ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, wheelDiameterIn: 18 } });
 * // { ok: false, issues: [{ path: ["planned", "wheelDiameterIn"], message: "Wheel diameter (in): a 17 in tire needs a 17 in wheel; this wheel is 18 in." }] }
 */
export function checkComparison(v: unknown): Checked<ComparisonInput> {
  if (!isObject(v))
    return { ok: false, issues: [{ path: [], message: "Give a comparison: current and planned setups and the vehicle figures." }] };
  const current = checkSetup(v.current, ["current"]);
  const planned = checkSetup(v.planned, ["planned"]);
  const vehicle = checkVehicle(v.vehicle, ["vehicle"]);
  if (current.ok && planned.ok && vehicle.ok)
    return { ok: true, value: { current: current.value, planned: planned.value, vehicle: vehicle.value } };
  return { ok: false, issues: [current, planned, vehicle].flatMap((r) => (r.ok ? [] : r.issues)) };
}
