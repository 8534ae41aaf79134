/**
 * Reads a comparison from a query string (the codec is url.ts). Decoding never throws: a parameter
 * that is missing falls back to its default (a wheel diameter to the tire's rim diameter); one
 * that is not understood, out of bounds, in conflict with another or left over does too, and is
 * reported in `problems` with the field as the workspace labels it and the value used instead, so
 * a link never changes a figure without saying so.
 */
import { type LinkProblem, type QueryLike, shownNumber as shown, toParams } from "@/lib/setup/url";
import { type Bounds, type ParamRead, decodeSetupParams, hasSetupParams, outsideReason } from "@/lib/setup/urlRead";
import { checkComparison } from "./checkInput";
import { SIDE_LABEL, VEHICLE_FIELD_BASE } from "./fields";
import { type ComparisonInput, DEFAULT_INPUT, DEFAULT_VEHICLE, VEHICLE_LIMITS, type VehicleValues } from "./model";

/** A plain number (ratio, degrees, speed) within bounds, or why not (also for empty, "1e999", "12abc", "0x10"). */
function readParam(raw: string, bounds: Bounds, unit: string): ParamRead {
  const t = raw.trim();
  if (t === "") return { reason: "is empty" };
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(t) || t.length > 20 || !Number.isFinite(Number(t))) return { reason: "is not a number" };
  const v = Number(t);
  if (v < bounds.min || v > bounds.max) return { reason: outsideReason(bounds, unit) };
  return { value: v === 0 ? 0 : v };
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

/** The vehicle parameters, in the order of the screen. */
const VEHICLE_PARAMS = Object.keys(VEHICLE_LABEL) as readonly (keyof typeof VEHICLE_LABEL)[];

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
  const kingpinInclinationDeg = num("kpi", VEHICLE_LIMITS.kingpinInclinationDeg, "°", d.kingpinInclinationDeg, "none (not set)");
  const axleRatio = num("axle", VEHICLE_LIMITS.axleRatio, "", d.axleRatio, d.axleRatio.toFixed(2));
  const transmissionRatio = num("top", VEHICLE_LIMITS.transmissionRatio, "", d.transmissionRatio, d.transmissionRatio.toFixed(2));
  let cruise = d.cruiseSpeedsMph;
  const rawCruise = p.get("cruise");
  if (rawCruise !== null) {
    const parts = rawCruise.split(",").slice(0, 20);
    const kept: number[] = [];
    const dropped: string[] = [];
    for (const part of parts) {
      const r = readParam(part, VEHICLE_LIMITS.cruiseMph, " mph");
      if ("value" in r) kept.push(r.value);
      else dropped.push(`${part.trim() === "" ? "an empty entry" : `“${part.trim()}”`} ${r.reason}`);
    }
    const extra = kept.splice(VEHICLE_LIMITS.cruiseCount.max);
    if (rawCruise.split(",").length > parts.length || extra.length > 0)
      dropped.push(`only the first ${VEHICLE_LIMITS.cruiseCount.max} speeds are used`);
    cruise = kept.length > 0 ? kept : d.cruiseSpeedsMph;
    if (dropped.length > 0)
      problems.push({
        field: VEHICLE_LABEL.cruise,
        given: rawCruise,
        reason: `has entries left out (${dropped.join("; ")})`,
        used: `${cruise.map(shown).join(", ")} mph`,
      });
  }
  return {
    kingpinInclinationDeg,
    axleRatio,
    transmissionRatio,
    cruiseSpeedsMph: cruise,
    fenderLineMm: num("fender", VEHICLE_LIMITS.fenderLineMm, " mm", d.fenderLineMm, "none (not measured)"),
    firstGearRatio: num("first", VEHICLE_LIMITS.firstGearRatio, "", d.firstGearRatio, "none (not entered)"),
    transferLowRatio: num("low", VEHICLE_LIMITS.transferLowRatio, "", d.transferLowRatio, "none (not entered)"),
  };
}

/** True when the query carries any comparison parameter (else the page opens the demo comparison). */
export function hasComparisonParams(q: QueryLike): boolean {
  const p = toParams(q);
  return hasSetupParams(p) || [...p.keys()].some((k) => (VEHICLE_PARAMS as readonly string[]).includes(k));
}

/**
 * Reads a comparison from a query string. Never throws; always returns a valid input. Missing
 * parameters take the values of `defaults` (the demo comparison unless given).
 *
 * @example
 * decodeComparison("ct=265/70R17&cw=8&co=25&pt=35x12.50R17LT&pw=9&pb=4.5&pr=flange").input.planned.position;
 * // { mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 }
 */
export function decodeComparison(
  q: QueryLike,
  defaults: ComparisonInput = DEFAULT_INPUT,
): { input: ComparisonInput; problems: LinkProblem[] } {
  const problems: LinkProblem[] = [];
  const whole = (reason: string): LinkProblem => ({ field: "The whole comparison", given: "", reason, used: "the demo comparison" });
  let p: URLSearchParams;
  try {
    p = toParams(q);
  } catch {
    return { input: defaults, problems: [whole("could not be read from the link")] };
  }
  const input: ComparisonInput = {
    current: decodeSetupParams("c", p, defaults.current, SIDE_LABEL.current, problems),
    planned: decodeSetupParams("p", p, defaults.planned, SIDE_LABEL.planned, problems),
    vehicle: decodeVehicle(p, problems),
  };
  const checked = checkComparison(input);
  if (!checked.ok)
    return {
      input: defaults,
      problems: [...problems, whole(`does not hold together (${checked.issues.map((i) => i.message).join(" ")})`)],
    };
  return { input: checked.value, problems };
}
