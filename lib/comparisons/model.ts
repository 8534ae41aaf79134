/**
 * The comparison input — a current and a planned setup (tire, wheel, positioning, spacer) and the
 * vehicle figures — its bounds, defaults and validation. Plain TypeScript with no dependency
 * beyond the engine, so the browser can validate as you type without shipping zod; `schema.ts`
 * wraps `checkComparison` as a zod schema for route handlers and stored JSONB.
 *
 * Units follow the engine (lib/fitment/README.md): mm inside, inches where the trade designates
 * in inches (wheel diameter and width, backspacing, flange allowance), speeds in mph.
 *
 * Besides the per-field bounds, validation asks the engine about what only the engine knows
 * (the tire size designation, the wheel diameter matching the tire's rim diameter, an offset or
 * backspacing that puts the mounting face inside the wheel), so an input that passes never makes
 * `computeComparison` throw.
 */
import {
  DEFAULT_AXLE_RATIO,
  DEFAULT_FLANGE_IN,
  DEFAULT_TRANSMISSION_RATIO,
  FitmentInputError,
  checkOffsetMm,
  offsetFromBackspacing,
  type SetupInput,
  parseTireSize,
} from "@/lib/fitment";

export type BackspacingReferenceValue = "flange" | "bead-seat";

export type Position =
  | { mode: "offset"; offsetMm: number }
  | { mode: "backspacing"; backspacingIn: number; reference: BackspacingReferenceValue; flangeIn: number };

export interface SetupInputValues {
  tire: string;
  wheelDiameterIn: number;
  wheelWidthIn: number;
  position: Position;
  spacerMm: number;
}

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
  current: SetupInputValues;
  planned: SetupInputValues;
  vehicle: VehicleValues;
}

/** Bounds of every number of the input (the engine's accepted ranges, narrowed where sane). */
export const LIMITS = {
  wheelDiameterIn: { min: 8, max: 30 },
  wheelWidthIn: { min: 3, max: 20 },
  offsetMm: { min: -200, max: 200 },
  backspacingIn: { min: 0, max: 20 },
  flangeIn: { min: 0, max: 2 },
  spacerMm: { min: 0, max: 100 },
  kingpinInclinationDeg: { min: 0, max: 30 },
  axleRatio: { min: 1, max: 10 },
  transmissionRatio: { min: 0.3, max: 10 },
  cruiseMph: { min: 5, max: 150 },
  cruiseCount: { min: 1, max: 6 },
  fenderLineMm: { min: 0, max: 500 },
  firstGearRatio: { min: 1, max: 10 },
  transferLowRatio: { min: 1, max: 10 },
} as const;

/** The engine's default flange allowance, inches. */
export const DEFAULT_FLANGE_ALLOWANCE_IN = DEFAULT_FLANGE_IN;

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
  planned: { tire: "37x12.50R17LT 124Q LRD", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 },
  vehicle: DEFAULT_VEHICLE,
};

/**
 * The offset (mm) a position stands for, through the engine (backspacing → offset with its
 * reference and flange allowance); throws FitmentInputError when the mounting face would sit
 * outside the wheel.
 */
export function positionOffsetMm(position: Position, wheelWidthIn: number): number {
  if (position.mode === "offset") return checkOffsetMm(position.offsetMm, wheelWidthIn, "offsetMm");
  return offsetFromBackspacing({ widthIn: wheelWidthIn, backspacingIn: position.backspacingIn, measuredFrom: position.reference, flangeIn: position.flangeIn });
}

/**
 * The engine's input for a valid setup (the position turned into an offset).
 *
 * @example
 * toEngineSetup({ tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 });
 * // { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 }, spacerMm: 0 }
 */
export function toEngineSetup(s: SetupInputValues): SetupInput {
  return {
    tire: s.tire,
    wheel: { diameterIn: s.wheelDiameterIn, widthIn: s.wheelWidthIn, offsetMm: positionOffsetMm(s.position, s.wheelWidthIn) },
    spacerMm: s.spacerMm,
  };
}

/** One problem of an input: the dotted path of the field and a message with an example. */
export interface Issue {
  path: (string | number)[];
  message: string;
}

export type Checked<T> = { ok: true; value: T } | { ok: false; issues: Issue[] };

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const cap = (s: string) => `${s[0]?.toUpperCase() ?? ""}${s.slice(1)}`;

/** A number within bounds, or an issue ("Enter … as a number" / "… must be between …"). */
function num(v: unknown, path: Issue["path"], label: string, b: { min: number; max: number }, unit: string, example: string, issues: Issue[]): number {
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

function checkPosition(v: unknown, path: Issue["path"], issues: Issue[]): Position | null {
  if (!isObject(v) || (v.mode !== "offset" && v.mode !== "backspacing")) {
    issues.push({ path, message: 'Give the wheel position as an offset (mode "offset") or a backspacing (mode "backspacing").' });
    return null;
  }
  if (v.mode === "offset") {
    const offsetMm = num(v.offsetMm, [...path, "offsetMm"], "the offset", LIMITS.offsetMm, " mm", "-12", issues);
    return Number.isNaN(offsetMm) ? null : { mode: "offset", offsetMm };
  }
  const backspacingIn = num(v.backspacingIn, [...path, "backspacingIn"], "the backspacing", LIMITS.backspacingIn, " in", "4.5", issues);
  let reference: BackspacingReferenceValue | null = null;
  if (v.reference === "flange" || v.reference === "bead-seat") reference = v.reference;
  else issues.push({ path: [...path, "reference"], message: 'Say where the backspacing was measured to: "flange" (the flange edge) or "bead-seat".' });
  const flangeIn = num(v.flangeIn, [...path, "flangeIn"], "the flange allowance", LIMITS.flangeIn, " in", "0.5", issues);
  return Number.isNaN(backspacingIn) || Number.isNaN(flangeIn) || reference === null ? null : { mode: "backspacing", backspacingIn, reference, flangeIn };
}

/** Validates one setup; the value returned holds only the known fields, the tire text trimmed. */
export function checkSetup(v: unknown, path: Issue["path"] = []): Checked<SetupInputValues> {
  const issues: Issue[] = [];
  if (!isObject(v)) return { ok: false, issues: [{ path, message: "Give a setup: tire, wheel diameter and width, position and spacer." }] };
  let tire: string | null = null;
  if (typeof v.tire !== "string" || v.tire.trim() === "") issues.push({ path: [...path, "tire"], message: "Enter a tire size (e.g. 265/70R17)." });
  else if (v.tire.trim().length > 80) issues.push({ path: [...path, "tire"], message: "That tire size is too long (e.g. 265/70R17)." });
  else tire = v.tire.trim();
  const wheelDiameterIn = num(v.wheelDiameterIn, [...path, "wheelDiameterIn"], "the wheel diameter", LIMITS.wheelDiameterIn, " in", "17", issues);
  const wheelWidthIn = num(v.wheelWidthIn, [...path, "wheelWidthIn"], "the wheel width", LIMITS.wheelWidthIn, " in", "9", issues);
  const position = checkPosition(v.position, [...path, "position"], issues);
  const spacerMm = num(v.spacerMm, [...path, "spacerMm"], "the spacer thickness", LIMITS.spacerMm, " mm", "25", issues);
  // Cross-checks only on fields that passed their own bounds (no second message for one mistake).
  if (tire !== null) {
    let rim: number | null = null;
    try {
      rim = parseTireSize(tire).rimDiameterIn;
    } catch (e) {
      issues.push({ path: [...path, "tire"], message: e instanceof Error ? e.message : "Not a tire size (e.g. 265/70R17)." });
    }
    if (rim !== null && !Number.isNaN(wheelDiameterIn) && wheelDiameterIn !== rim) {
      issues.push({ path: [...path, "wheelDiameterIn"], message: `A ${rim} in tire needs a ${rim} in wheel; this wheel is ${wheelDiameterIn} in.` });
    }
  }
  if (position !== null && !Number.isNaN(wheelWidthIn)) {
    try {
      positionOffsetMm(position, wheelWidthIn);
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      issues.push(
        position.mode === "offset"
          ? { path: [...path, "position", "offsetMm"], message: `An offset of ${position.offsetMm} mm puts the mounting face outside a ${wheelWidthIn} in wide wheel (e.g. -12).` }
          : { path: [...path, "position", "backspacingIn"], message: `A backspacing of ${position.backspacingIn} in puts the mounting face outside a ${wheelWidthIn} in wide wheel (e.g. 4.5).` },
      );
    }
  }
  if (issues.length > 0 || tire === null || position === null) return { ok: false, issues };
  return { ok: true, value: { tire, wheelDiameterIn, wheelWidthIn, position, spacerMm } };
}

/** Validates the vehicle figures. */
export function checkVehicle(v: unknown, path: Issue["path"] = []): Checked<VehicleValues> {
  const issues: Issue[] = [];
  if (!isObject(v)) return { ok: false, issues: [{ path, message: "Give the vehicle figures (axle ratio, top-gear ratio, cruise speeds)." }] };
  const kpi = v.kingpinInclinationDeg === null ? null : num(v.kingpinInclinationDeg, [...path, "kingpinInclinationDeg"], "the kingpin inclination", LIMITS.kingpinInclinationDeg, "°", "8", issues);
  const axleRatio = num(v.axleRatio, [...path, "axleRatio"], "the axle ratio", LIMITS.axleRatio, "", "3.73", issues);
  const transmissionRatio = num(v.transmissionRatio, [...path, "transmissionRatio"], "the top-gear ratio", LIMITS.transmissionRatio, "", "1.00", issues);
  const cruise: number[] = [];
  const c = v.cruiseSpeedsMph;
  if (!Array.isArray(c)) issues.push({ path: [...path, "cruiseSpeedsMph"], message: "Enter one to six cruise speeds (e.g. 60, 70)." });
  else if (c.length < LIMITS.cruiseCount.min) issues.push({ path: [...path, "cruiseSpeedsMph"], message: "Enter at least one cruise speed (e.g. 65)." });
  else if (c.length > LIMITS.cruiseCount.max) issues.push({ path: [...path, "cruiseSpeedsMph"], message: "Enter at most six cruise speeds." });
  else c.forEach((s: unknown, i) => cruise.push(num(s, [...path, "cruiseSpeedsMph", i], "a cruise speed", LIMITS.cruiseMph, " mph", "65", issues)));
  const fender = v.fenderLineMm === null ? null : num(v.fenderLineMm, [...path, "fenderLineMm"], "the fender line distance", LIMITS.fenderLineMm, " mm", "140", issues);
  // Missing (undefined) reads as not entered: comparisons saved before these fields existed load as they were.
  const first = v.firstGearRatio === null || v.firstGearRatio === undefined ? null : num(v.firstGearRatio, [...path, "firstGearRatio"], "the first-gear ratio", LIMITS.firstGearRatio, "", "4.03", issues);
  const low = v.transferLowRatio === null || v.transferLowRatio === undefined ? null : num(v.transferLowRatio, [...path, "transferLowRatio"], "the transfer-case low ratio", LIMITS.transferLowRatio, "", "2.72", issues);
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, value: { kingpinInclinationDeg: kpi, axleRatio, transmissionRatio, cruiseSpeedsMph: cruise, fenderLineMm: fender, firstGearRatio: first, transferLowRatio: low } };
}

/**
 * Validates a whole comparison input. Returns a clean copy (known fields only) or every issue.
 *
 * @example
 * checkComparison(DEFAULT_INPUT).ok; // true
 * checkComparison({ ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, wheelDiameterIn: 18 } });
 * // { ok: false, issues: [{ path: ["planned", "wheelDiameterIn"], message: "A 17 in tire needs a 17 in wheel; this wheel is 18 in." }] }
 */
export function checkComparison(v: unknown): Checked<ComparisonInput> {
  if (!isObject(v)) return { ok: false, issues: [{ path: [], message: "Give a comparison: current and planned setups and the vehicle figures." }] };
  const current = checkSetup(v.current, ["current"]);
  const planned = checkSetup(v.planned, ["planned"]);
  const vehicle = checkVehicle(v.vehicle, ["vehicle"]);
  if (current.ok && planned.ok && vehicle.ok) return { ok: true, value: { current: current.value, planned: planned.value, vehicle: vehicle.value } };
  return { ok: false, issues: [current, planned, vehicle].flatMap((r) => (r.ok ? [] : r.issues)) };
}
