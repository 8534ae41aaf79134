/**
 * The workspace's load and pressure figures for a planned tire, per axle, from the vehicle's
 * placard (size and cold pressures) and its axle loads. Every figure is the engine's
 * (lib/fitment: equivalentPressure, pressureForLoad, loadAtPressure, loadPressureBasis); this
 * module only picks the pressure to set and names the fields in the engine's messages as the
 * panel labels them.
 *
 * Per axle, one tire carries half the axle load. The pressure to set is the highest of
 * - the equivalent pressure: what the planned tire needs to carry what the placard tire carries
 *   at the placard pressure (the usual way to set pressure after a size change);
 * - the pressure the planned tire needs for the axle load itself (a loaded truck can be above the
 *   placard tire's capacity at the placard pressure: it is flagged);
 * - the planned tire's road minimum (FMVSS 138 Table 1 or its proportion; see lib/fitment).
 * Taking the highest is a choice on the safe side (common practice, no source).
 */
import {
  FitmentInputError,
  LOAD_PRESSURE_LIMITS,
  type LoadPressureBasis,
  type VehicleKind,
  equivalentPressure,
  loadAtPressure,
  loadPressureBasis,
  pressureForLoad,
} from "@/lib/fitment";
import type { MeasureSpec } from "./measureEntry";
import type { DisplayPrefs } from "./format";
import { messageInUnits } from "./pressureText";

export type LoadField =
  "placardTire" | "placardFront" | "placardRear" | "frontAxle" | "rearAxle" | "plannedTire" | "plannedMaxLoad" | "plannedMaxPressure";
export type LoadLabels = Record<LoadField, string>;
export type LoadErrors = Partial<Record<LoadField, string>>;

export interface LoadPlanInput {
  placardTire: string;
  plannedTire: string;
  vehicle: VehicleKind;
  placardFrontKpa: number;
  placardRearKpa: number;
  frontAxleKg: number;
  rearAxleKg: number;
  /** The planned tire's sidewall figures, when given (they win over the load index and load range). */
  plannedMaxLoadKg?: number;
  plannedMaxPressureKpa?: number;
}

export type PressureReason = "placard" | "axle load" | "road minimum";

export interface AxlePlan {
  axle: "front" | "rear";
  /** Half the axle load: what one tire carries, kg. */
  tireLoadKg: number;
  placardKpa: number;
  /** What one placard tire carries at the placard pressure, kg. */
  placardLoadKg: number;
  /** The planned tire's pressure for the placard load (formula; may be below the road minimum), kPa. */
  equivalentKpa: number;
  /** The planned tire's pressure for the axle load (formula), kPa. */
  axleLoadKpa: number;
  minimumKpa: number;
  /** The pressure to set: the highest of the three, kPa. */
  pressureToSetKpa: number;
  decidedBy: PressureReason;
  /** What one planned tire may carry at `pressureToSetKpa` beyond the axle's share, kg. */
  reserveKg: number;
  /** The axle's share is above what the placard tire carries at the placard pressure. */
  abovePlacard: boolean;
}

export interface CurvePoint {
  pressureKpa: number;
  /** Load one tire carries at this pressure, kg; null above the highest pressure the tire allows. */
  placardKg: number | null;
  plannedKg: number | null;
}

export interface TireLimits {
  text: string;
  maxLoadKg: number;
  maxPressureKpa: number;
  minimumKpa: number;
  maxLoadSource: string;
  maxPressureSource: string;
  minimumSource: string;
  derating: string | null;
}

export interface LoadPlan {
  axles: AxlePlan[];
  placard: TireLimits;
  planned: TireLimits;
  curve: CurvePoint[];
  notes: string[];
}

/** The engine's message with its field name replaced by the field's label. */
function relabel(e: FitmentInputError, label: string): string {
  const m = e.message;
  if (m.startsWith(`${e.field}: `)) return `${label}: ${m.slice(e.field.length + 2)}`;
  if (m.startsWith(`${e.field} `)) return `${label}: ${m.slice(e.field.length + 1)}`;
  return `${label}: ${m}`;
}

const limitsOf = (b: LoadPressureBasis): TireLimits => ({
  text: b.tire.text,
  maxLoadKg: b.maxLoadKg,
  maxPressureKpa: b.maxPressureKpa,
  minimumKpa: b.minimumPressureKpa,
  maxLoadSource: b.sources.maxLoad,
  maxPressureSource: b.sources.maxPressure,
  minimumSource: b.sources.minimum,
  derating: b.sources.derating,
});

function curveOf(placard: LoadPressureBasis, planned: LoadPressureBasis, vehicle: VehicleKind, plannedOpts: object): CurvePoint[] {
  const lo = Math.floor(0.5 * Math.min(placard.minimumPressureKpa, planned.minimumPressureKpa));
  const hi = Math.max(placard.maxPressureKpa, planned.maxPressureKpa);
  const steps = 40;
  const at = (b: LoadPressureBasis, p: number, opts: object) =>
    p > b.maxInflationKpa ? null : loadAtPressure(b.tire, p, { vehicle, ...opts }).loadKg;
  return Array.from({ length: steps + 1 }, (_, i) => {
    const p = lo + ((hi - lo) * i) / steps;
    return { pressureKpa: p, placardKg: at(placard, p, {}), plannedKg: at(planned, p, plannedOpts) };
  });
}

/**
 * The figures of the load and pressure panel, or the fields' messages and no figures at all: an
 * axle whose load the planned tire cannot carry gets the engine's message beside its field, and
 * nothing is computed from a figure that is refused. Messages give loads and pressures in the
 * units of `prefs`, the units the fields are labelled in (the engine's are kg and kPa first).
 *
 * @example
 * planLoad({ placardTire: "265/70R17 113T", plannedTire: "37x12.50R17LT 124Q LRD", vehicle: "light-truck",
 *   placardFrontKpa: psiToKpa(35), placardRearKpa: psiToKpa(35), frontAxleKg: 1300, rearAxleKg: 1100 }, labels, prefs);
 * // plan.axles[0].pressureToSetKpa ≈ 201 (29.2 psi: the flotation road minimum, 0.5833 × 50 psi)
 */
export function planLoad(input: LoadPlanInput, labels: LoadLabels, prefs: DisplayPrefs): { plan: LoadPlan | null; errors: LoadErrors } {
  const { plan, errors } = planLoadSI(input, labels);
  const shown = Object.fromEntries(Object.entries(errors).map(([k, m]) => [k, messageInUnits(m, prefs)])) as LoadErrors;
  return { plan, errors: shown };
}

/** {@link planLoad} with the engine's messages as they come (kg, kPa first). */
function planLoadSI(input: LoadPlanInput, labels: LoadLabels): { plan: LoadPlan | null; errors: LoadErrors } {
  const errors: LoadErrors = {};
  const { vehicle } = input;
  const plannedOpts = { maxLoadKg: input.plannedMaxLoadKg, maxPressureKpa: input.plannedMaxPressureKpa };
  const basis = (tire: string, fields: Parameters<typeof loadPressureBasis>[2], opts: object, key: LoadField) => {
    try {
      return loadPressureBasis(tire, { vehicle, ...opts }, fields);
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      const byLabel = (Object.keys(labels) as LoadField[]).find((k) => labels[k] === e.field) ?? key;
      errors[byLabel] = e.message.startsWith(labels[byLabel]) ? e.message : relabel(e, labels[byLabel]);
      return null;
    }
  };
  const p = labels.placardTire;
  const placard = basis(
    input.placardTire,
    { tire: p, maxPressureKpa: p, maxLoadKg: p, maxInflationKpa: p, minPressureKpa: p, vehicle: p },
    {},
    "placardTire",
  );
  const t = labels.plannedTire;
  const planned = basis(
    input.plannedTire,
    {
      tire: t,
      maxPressureKpa: labels.plannedMaxPressure,
      maxLoadKg: labels.plannedMaxLoad,
      maxInflationKpa: labels.plannedMaxPressure,
      minPressureKpa: t,
      vehicle: t,
    },
    plannedOpts,
    "plannedTire",
  );
  if (!placard || !planned) return { plan: null, errors };

  const axles: AxlePlan[] = [];
  const notes = new Set<string>();
  const sides = [
    { axle: "front", kpa: input.placardFrontKpa, kg: input.frontAxleKg, pressureField: "placardFront", loadField: "frontAxle" },
    { axle: "rear", kpa: input.placardRearKpa, kg: input.rearAxleKg, pressureField: "placardRear", loadField: "rearAxle" },
  ] as const;
  for (const side of sides) {
    const tireLoadKg = side.kg / 2;
    const engineField: Record<string, LoadField> = {
      current: "placardTire",
      currentMaxPressureKpa: "placardTire",
      currentMaxLoadKg: "placardTire",
      currentPressureKpa: side.pressureField,
      planned: "plannedTire",
      plannedMaxPressureKpa: "plannedMaxPressure",
      plannedMaxLoadKg: "plannedMaxLoad",
    };
    let eq: ReturnType<typeof equivalentPressure>;
    try {
      eq = equivalentPressure({
        current: input.placardTire,
        currentPressureKpa: side.kpa,
        planned: input.plannedTire,
        plannedMaxLoadKg: input.plannedMaxLoadKg,
        plannedMaxPressureKpa: input.plannedMaxPressureKpa,
        vehicle,
      });
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      const key = engineField[e.field] ?? side.pressureField;
      errors[key] ??= relabel(e, labels[key]);
      continue;
    }
    let forLoad: ReturnType<typeof pressureForLoad>;
    try {
      forLoad = pressureForLoad(input.plannedTire, tireLoadKg, { vehicle, ...plannedOpts });
    } catch (e) {
      if (!(e instanceof FitmentInputError)) throw e;
      // The engine's message, per tire; its example is in kg, which the field may not be.
      errors[side.loadField] = `${labels[side.loadField]}: one tire carries half the axle, and ${relabel(e, "")
        .slice(2)
        .replace(/ \(e\.g\. [^)]*\)$/, "")}.`;
      continue;
    }
    const pressureToSetKpa = Math.max(eq.pressureToSetKpa, forLoad.pressureToSetKpa);
    const decidedBy: PressureReason =
      pressureToSetKpa === eq.pressureKpa ? "placard" : pressureToSetKpa === forLoad.pressureKpa ? "axle load" : "road minimum";
    const carries = loadAtPressure(input.plannedTire, pressureToSetKpa, { vehicle, ...plannedOpts }).loadKg;
    axles.push({
      axle: side.axle,
      tireLoadKg,
      placardKpa: side.kpa,
      placardLoadKg: eq.loadKg,
      equivalentKpa: eq.pressureKpa,
      axleLoadKpa: forLoad.pressureKpa,
      minimumKpa: eq.minimumPressureKpa,
      pressureToSetKpa,
      decidedBy,
      reserveKg: Math.max(0, carries - tireLoadKg),
      abovePlacard: tireLoadKg > eq.loadKg,
    });
    for (const n of eq.notes) notes.add(n);
  }
  if (Object.keys(errors).length > 0) return { plan: null, errors };
  return {
    plan: {
      axles,
      placard: limitsOf(placard),
      planned: limitsOf(planned),
      curve: curveOf(placard, planned, vehicle, plannedOpts),
      notes: [...notes],
    },
    errors,
  };
}

/** Bounds of the panel's load and pressure fields, from the engine's limits. */
export const LOAD_FIELD_BOUNDS = Object.freeze({
  /** Cold placard pressures: 100 kPa (14.5 psi) up to the engine's ceiling. */
  pressureKpa: { min: 100, max: LOAD_PRESSURE_LIMITS.maxPressureKpa.max },
  /** An axle: two tires, each within the engine's load bounds. */
  axleKg: { min: 100, max: 2 * LOAD_PRESSURE_LIMITS.loadKg.max },
  maxLoadKg: LOAD_PRESSURE_LIMITS.maxLoadKg,
  maxPressureKpa: LOAD_PRESSURE_LIMITS.maxPressureKpa,
});

const pressureSpec = (bounds: { min: number; max: number }, imperial: string, metric: string): MeasureSpec => ({
  quantity: "pressure",
  ...bounds,
  example: { imperial, metric },
});
const loadSpec = (bounds: { min: number; max: number }, imperial: string, metric: string): MeasureSpec => ({
  quantity: "load",
  ...bounds,
  example: { imperial, metric },
});

/** The load panel's typed figures with their bounds and examples (also the garage's placard form). */
export const LOAD_SPEC = {
  placardFront: pressureSpec(LOAD_FIELD_BOUNDS.pressureKpa, "35", "240"),
  placardRear: pressureSpec(LOAD_FIELD_BOUNDS.pressureKpa, "35", "240"),
  frontAxle: loadSpec(LOAD_FIELD_BOUNDS.axleKg, "3100", "1400"),
  rearAxle: loadSpec(LOAD_FIELD_BOUNDS.axleKg, "2900", "1300"),
  plannedMaxLoad: loadSpec(LOAD_FIELD_BOUNDS.maxLoadKg, "3525", "1600"),
  plannedMaxPressure: pressureSpec(LOAD_FIELD_BOUNDS.maxPressureKpa, "50", "345"),
} as const;
