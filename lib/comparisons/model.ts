/**
 * The comparison input — a current and a planned setup (lib/setup) and the vehicle figures —
 * its defaults and validation. Plain TypeScript with no dependency beyond the engine and the
 * setup model, so the browser can validate as you type without shipping zod; `schema.ts` wraps
 * `checkComparison` as a zod schema for route handlers and stored JSONB.
 *
 * Units follow the engine (lib/fitment/README.md): mm inside, inches where the trade designates
 * in inches, speeds in mph. A comparison holds numbers: its setups are checked with
 * `checkSetup` without text (lib/setup/check.ts), so an input that passes never makes
 * `computeComparison` throw.
 */
import { DEFAULT_AXLE_RATIO, DEFAULT_TRANSMISSION_RATIO } from "@/lib/fitment/compare";
import { type Checked, type Issue, checkSetup, isObject } from "@/lib/setup/check";
import type { Setup } from "@/lib/setup/model";

export interface VehicleValues {
  /** null = not set: the engine then assumes 0° and the drawing shows no steering axis. */
  kingpinInclinationDeg: number | null;
  axleRatio: number;
  transmissionRatio: number;
  cruiseSpeedsMph: number[];
  /** Fender line, measured outboard from the hub mounting face; null = not entered. */
  fenderLineMm: number | null;
  /** First-gear ratio of the transmission, for the crawl ratio; null = not entered. */
  firstGearRatio: number | null;
  /** Transfer-case low-range ratio, for the crawl ratio; null = not entered. */
  transferLowRatio: number | null;
}

export interface ComparisonInput {
  current: Setup;
  planned: Setup;
  vehicle: VehicleValues;
}

/** Bounds of the vehicle figures (a setup's are lib/setup's SETUP_LIMITS). */
export const VEHICLE_LIMITS = {
  kingpinInclinationDeg: { min: 0, max: 30 },
  axleRatio: { min: 1, max: 10 },
  transmissionRatio: { min: 0.3, max: 10 },
  cruiseMph: { min: 5, max: 150 },
  cruiseCount: { min: 1, max: 6 },
  fenderLineMm: { min: 0, max: 500 },
  firstGearRatio: { min: 1, max: 10 },
  transferLowRatio: { min: 1, max: 10 },
} as const;

/** Vehicle figures used when none are given (each labelled as a default in the workspace). */
export const DEFAULT_VEHICLE: VehicleValues = {
  kingpinInclinationDeg: null,
  axleRatio: DEFAULT_AXLE_RATIO,
  transmissionRatio: DEFAULT_TRANSMISSION_RATIO,
  cruiseSpeedsMph: [60, 70],
  fenderLineMm: null,
  firstGearRatio: null,
  transferLowRatio: null,
};

/** The demo comparison the workspace opens with (invented, realistic sizes). */
export const DEFAULT_INPUT: ComparisonInput = {
  current: { tire: "265/70R17 113T", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 },
  planned: {
    tire: "37x12.50R17LT 124Q LRD",
    wheelDiameterIn: 17,
    wheelWidthIn: 9,
    position: { mode: "offset", offsetMm: -12 },
    spacerMm: 0,
  },
  vehicle: DEFAULT_VEHICLE,
};

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
