/**
 * Load and inflation pressure of one tire: the load it may carry at a pressure, and the pressure
 * it needs for a load.
 *
 * For one tire the load goes as the inflation pressure to a power (the Tire and Rim Association
 * load formulas, reproduced in NHTSA, *The Pneumatic Tire*, 2006):
 * - light-truck and flotation tires: L = K · 0.425 · P^0.585 · Sd^1.39 · (DR + Sd);
 * - passenger tires (metric form): L = K · P^0.5 · Sd^1.39 · (Dr + Sd).
 * K, Sd (design section width) and DR/Dr (rim diameter) are fixed for a given tire, so against
 * its maximum load Lmax at its reference pressure Pmax:
 *   **L = Lmax · (P / Pmax)^n** and **P = Pmax · (L / Lmax)^(1/n)**, n = 0.585 or 0.5.
 * Pressures are cold gauge pressures. Above Pmax a tire carries no more load.
 *
 * Where the figures come from (each result says which applied, in `sources`):
 * - Lmax: the single load index (ISO 4000-1 table), or the sidewall figure given.
 * - Pmax, light truck: the load range (loadRange.ts: metric LT C 50 / D 65 / E 80 psi, flotation
 *   C 35 / D 50 / E 65 psi, from memory, TRA practice), or the sidewall figure given.
 * - Pmax, passenger: the pressure its standard sets the maximum load at, chosen by designation —
 *   a `P` size is built to the TRA P-metric standard, 35 psi standard load / 41 psi extra load
 *   (≈ 241 / 283 kPa); a size without a prefix (Euro-metric) to the ETRTO standard, 250 kPa /
 *   290 kPa (≈ 36 / 42 psi). Both from memory (TRA Year Book and ETRTO Standards Manual not
 *   checked); they are the pressures behind the load index, not the higher "max press" some
 *   passenger sidewalls carry (44 or 51 psi), which adds no load.
 * - Passenger tire on a light truck, MPV or SUV: its load rating is divided by 1.10 — FMVSS 120
 *   S5.1.2 (49 CFR 571.120), NHTSA interpretation 2351y; the TRA Year Book states the same
 *   (a passenger tire on such vehicles loaded to at most 91 % of its rating).
 * - Road minimum: the pressure below which a tire is significantly under-inflated per FMVSS 138
 *   Table 1 (49 CFR 571.138; from memory, not re-checked): passenger standard load 140 kPa, extra
 *   load 160 kPa, LT load range C 200, D 260, E 320 kPa. Other tires (flotation, load range F
 *   and up, given sidewall figures) get the largest ratio of that table, 140/240 = 0.5833, of
 *   their Pmax (applied by proportion, no source). A maker's minimum, when given, wins.
 */
import { FitmentInputError, TireLimitError, TireSizeError, requireNumber, requireObject } from "./errors";
import { LOAD_INDEX_KG, MAX_LOAD_INDEX, loadIndexKg } from "./loadSpeed";
import { loadRangeInfo } from "./loadRange";
import { type TireSize, toTireSize } from "./tireSize";
import { kpaToPsi, psiToKpa } from "./units";

/** Which load formula a tire follows. */
export type TireLoadClass = "passenger" | "light-truck";
/** The vehicle a tire is on: decides the passenger-tire derating. */
export type VehicleKind = "passenger-car" | "light-truck";

/** Load–pressure exponent n per class (TRA load formulas; NHTSA, The Pneumatic Tire, 2006). */
export const LOAD_PRESSURE_EXPONENT: Readonly<Record<TireLoadClass, number>> = Object.freeze({ passenger: 0.5, "light-truck": 0.585 });
/** Divisor of a passenger tire's load rating on a light truck, MPV or SUV (FMVSS 120 S5.1.2, TRA). */
export const PASSENGER_ON_LIGHT_TRUCK_DIVISOR = 1.1;
/** Reference pressures (kPa) of passenger tires: the pressure the maximum load is set at. */
export const PASSENGER_REFERENCE_KPA = Object.freeze({
  /** TRA P-metric: 35 psi standard load, 41 psi extra load (from memory). */
  pMetric: Object.freeze({ standard: psiToKpa(35), extra: psiToKpa(41) }),
  /** ETRTO (no prefix): 250 kPa standard load, 290 kPa extra load / reinforced (from memory). */
  euroMetric: Object.freeze({ standard: 250, extra: 290 }),
});
/** Default highest pressure accepted on a passenger tire when its sidewall figure is not given: 350 kPa ≈ 51 psi (from memory: the highest "max press" on passenger sidewalls). */
export const PASSENGER_MAX_INFLATION_KPA = 350;
/** FMVSS 138 Table 1 minimum pressures, kPa (from memory, 49 CFR 571.138). */
export const ROAD_MINIMUM_KPA = Object.freeze({ passengerStandard: 140, passengerExtra: 160, C: 200, D: 260, E: 320 });
/** Share of Pmax used as the road minimum for tires outside that table (largest ratio in it, 140/240). */
export const ROAD_MINIMUM_RATIO = 140 / 240;

/** Options of {@link loadAtPressure} and {@link pressureForLoad}; every figure overrides the engine's. */
export interface LoadPressureOptions {
  /** Pressure the sidewall states the maximum load at, kPa (for LT tires the sidewall maximum). */
  maxPressureKpa?: number;
  /** Maximum load of the tire (single fitment), kg, as on the sidewall. */
  maxLoadKg?: number;
  /** Highest pressure the sidewall allows, kPa, when above `maxPressureKpa` (passenger "max press"). */
  maxInflationKpa?: number;
  /** The tire or vehicle maker's minimum pressure, kPa. */
  minPressureKpa?: number;
  /** `"light-truck"` (also MPV, SUV, van) divides a passenger tire's load by 1.10. Default `"passenger-car"`. */
  vehicle?: VehicleKind;
}

/** Where each figure of a result comes from. */
export interface LoadPressureSources {
  exponent: string;
  maxLoad: string;
  maxPressure: string;
  minimum: string;
  /** Set when a passenger tire's load was divided by 1.10. */
  derating: string | null;
}

/** The figures the load–pressure relation of one tire rests on. */
export interface LoadPressureBasis {
  tire: TireSize;
  tireClass: TireLoadClass;
  exponent: number;
  vehicle: VehicleKind;
  /** Maximum load at `maxPressureKpa`, kg, after the light-truck derating when it applies. */
  maxLoadKg: number;
  /** Maximum load as rated (sidewall / load index), kg. */
  ratedMaxLoadKg: number;
  /** Reference pressure: the tire carries `maxLoadKg` here and no more above it, kPa. */
  maxPressureKpa: number;
  /** Highest pressure accepted, kPa (LT: `maxPressureKpa`). */
  maxInflationKpa: number;
  /** Road minimum, kPa (FMVSS 138 Table 1, its ratio, or the maker's figure). */
  minimumPressureKpa: number;
  sources: LoadPressureSources;
}

/** Result of {@link loadAtPressure}. */
export interface LoadAtPressure {
  loadKg: number;
  maxLoadKg: number;
  maxPressureKpa: number;
  exponent: number;
  tireClass: TireLoadClass;
  pressureKpa: number;
  pressurePsi: number;
  minimumPressureKpa: number;
  /** The pressure is below the road minimum: the load is the formula's, outside what the standards allow on the road. */
  belowMinimum: boolean;
  /** The pressure is above `maxPressureKpa` (passenger tires): the load stays at the maximum. */
  aboveMaxPressure: boolean;
  notes: string[];
  sources: LoadPressureSources;
}

/** Result of {@link pressureForLoad}. */
export interface PressureForLoad {
  pressureKpa: number;
  pressurePsi: number;
  maxLoadKg: number;
  maxPressureKpa: number;
  exponent: number;
  tireClass: TireLoadClass;
  loadKg: number;
  minimumPressureKpa: number;
  /** `pressureKpa` is below the road minimum: set `pressureToSetKpa` instead. */
  belowMinimum: boolean;
  /** The pressure to set: `pressureKpa`, or the road minimum when that is higher. */
  pressureToSetKpa: number;
  pressureToSetPsi: number;
  /** Load the tire may carry at `pressureToSetKpa` beyond `loadKg`, kg. */
  reserveKg: number;
  notes: string[];
  sources: LoadPressureSources;
}

/** Field names used in messages (callers such as equivalentPressure name theirs). */
export interface BasisFieldNames {
  tire: string;
  maxPressureKpa: string;
  maxLoadKg: string;
  maxInflationKpa: string;
  minPressureKpa: string;
  vehicle: string;
}

const DEFAULT_FIELDS: BasisFieldNames = {
  tire: "tire",
  maxPressureKpa: "maxPressureKpa",
  maxLoadKg: "maxLoadKg",
  maxInflationKpa: "maxInflationKpa",
  minPressureKpa: "minPressureKpa",
  vehicle: "vehicle",
};

/** Accepted ranges of the sidewall figures. */
export const LOAD_PRESSURE_LIMITS = Object.freeze({
  pressureKpa: { min: 0, max: 1500 },
  loadKg: { min: 0, max: 10000 },
  maxLoadKg: { min: 50, max: 10000 },
  maxPressureKpa: { min: 100, max: 1500 },
});

const round1 = (x: number): string => (Math.round(x * 10) / 10).toString();
const kpaText = (kpa: number): string => `${round1(kpa)} kPa (${round1(kpaToPsi(kpa))} psi)`;

function readTire(tire: unknown, field: string): TireSize {
  if (typeof tire === "string") {
    try {
      return toTireSize(tire);
    } catch (e) {
      if (e instanceof TireSizeError && field !== "tire") throw new TireSizeError(`${field}: ${e.message}`, tire, field, e.reason);
      throw e;
    }
  }
  if (tire === null || typeof tire !== "object" || typeof (tire as TireSize).overallDiameterMm !== "number") {
    throw new TireSizeError(`${field} must be a tire size such as "LT265/75R16 123/120S LRE" or a parsed size`, tire, field);
  }
  return tire as TireSize;
}

function classOf(t: TireSize, field: string): TireLoadClass {
  if (t.service === "T") {
    throw new FitmentInputError(
      field,
      `${field}: ${t.text} is a temporary spare — inflate it to the pressure on its sidewall; it has no load–pressure schedule (e.g. LT265/75R16 123/120S LRE)`,
      t.text,
    );
  }
  if (t.service === "ST") {
    throw new FitmentInputError(
      field,
      `${field}: ${t.text} is a special trailer tire, for trailer axles only; give a vehicle tire (e.g. LT265/75R16 123/120S LRE)`,
      t.text,
    );
  }
  if (t.service === "P") {
    if (t.loadRange !== null) {
      throw new FitmentInputError(
        field,
        `${field}: ${t.text} is a passenger (P) size with a load range; P sizes carry SL or XL, load ranges belong to LT sizes (e.g. P265/70R17 113S XL or LT265/70R17 121/118S LRE)`,
        t.text,
      );
    }
    return "passenger";
  }
  const lightTruck = t.service === "LT" || t.system !== "metric" || t.commercial || t.loadRange !== null || t.dualLoadIndex !== null;
  return lightTruck ? "light-truck" : "passenger";
}

function optional(field: string, value: unknown, min: number, max: number, example: string, unit: string): number | undefined {
  return value === undefined ? undefined : requireNumber(field, value, min, max, example, unit);
}

/**
 * The figures behind the load–pressure relation of a tire: class and exponent, maximum load and
 * the pressure it is reached at, the highest pressure accepted and the road minimum — each with
 * its source. Throws {@link FitmentInputError} naming the field when a figure is missing (e.g.
 * an LT size without load range and no `maxPressureKpa`).
 *
 * Sources: TRA load formulas (NHTSA, The Pneumatic Tire, 2006); ISO 4000-1 load index table;
 * FMVSS 120 S5.1.2 (÷ 1.10); FMVSS 138 Table 1 (road minimum, from memory); see the module comment.
 *
 * @example
 * const b = loadPressureBasis("LT265/75R16 123/120S LRE");
 * b.exponent;       // 0.585
 * b.maxLoadKg;      // 1550 (load index 123)
 * b.maxPressureKpa; // ≈ 551.6 (80 psi, load range E)
 */
export function loadPressureBasis(
  tire: string | TireSize,
  options: LoadPressureOptions = {},
  fields: BasisFieldNames = DEFAULT_FIELDS,
): LoadPressureBasis {
  requireObject("options", options, "{ maxPressureKpa: 551.6, maxLoadKg: 1550 }");
  const t = readTire(tire, fields.tire);
  const tireClass = classOf(t, fields.tire);
  const exponent = LOAD_PRESSURE_EXPONENT[tireClass];
  const vehicle = options.vehicle ?? "passenger-car";
  if (vehicle !== "passenger-car" && vehicle !== "light-truck") {
    throw new FitmentInputError(
      fields.vehicle,
      `${fields.vehicle} must be "passenger-car" or "light-truck" (also MPV, SUV, van), got ${JSON.stringify(vehicle)} (e.g. "light-truck")`,
      vehicle,
    );
  }
  const L = LOAD_PRESSURE_LIMITS;
  const givenLoad = optional(fields.maxLoadKg, options.maxLoadKg, L.maxLoadKg.min, L.maxLoadKg.max, "1550", "kg");
  const givenPressure = optional(fields.maxPressureKpa, options.maxPressureKpa, L.maxPressureKpa.min, L.maxPressureKpa.max, "551.6", "kPa");
  const givenInflation = optional(
    fields.maxInflationKpa,
    options.maxInflationKpa,
    L.maxPressureKpa.min,
    L.maxPressureKpa.max,
    "300",
    "kPa",
  );
  const givenMinimum = optional(fields.minPressureKpa, options.minPressureKpa, 0, L.maxPressureKpa.max, "240", "kPa");

  let rated: number;
  let maxLoadSource: string;
  if (givenLoad !== undefined) {
    rated = givenLoad;
    maxLoadSource = "sidewall maximum load as given";
  } else if (t.loadIndex !== null) {
    rated = loadIndexKg(t.loadIndex);
    maxLoadSource = `load index ${t.loadIndex} (single) = ${rated} kg (ISO 4000-1 load index table)`;
  } else {
    throw new FitmentInputError(
      fields.maxLoadKg,
      `${fields.maxLoadKg}: ${t.text} has no load index — give the size with its service description (e.g. LT265/75R16 123/120S) or the sidewall maximum load (e.g. 1550 kg)`,
      options.maxLoadKg,
    );
  }

  const extra = t.loadMarking === "XL" || t.loadMarking === "RF";
  let maxPressure: number;
  let maxPressureSource: string;
  if (givenPressure !== undefined) {
    maxPressure = givenPressure;
    maxPressureSource = "sidewall pressure at maximum load as given";
  } else if (tireClass === "passenger") {
    const table = t.service === "P" ? PASSENGER_REFERENCE_KPA.pMetric : PASSENGER_REFERENCE_KPA.euroMetric;
    maxPressure = extra ? table.extra : table.standard;
    maxPressureSource =
      t.service === "P"
        ? `TRA P-metric ${extra ? "extra load 41" : "standard load 35"} psi (from memory)`
        : `ETRTO ${extra ? "extra load / reinforced 290" : "standard load 250"} kPa (from memory)`;
  } else if (
    t.loadRange !== null &&
    t.system !== "numeric" &&
    !t.commercial &&
    loadRangeInfo(t.loadRange, t.system).maxPressureKpa !== null
  ) {
    const info = loadRangeInfo(t.loadRange, t.system);
    maxPressure = info.maxPressureKpa as number;
    maxPressureSource = `load range ${info.loadRange}, ${t.system === "metric" ? "metric LT" : "flotation LT"}: ${info.maxPressurePsi} psi (${info.source})`;
  } else {
    const why =
      t.loadRange === null
        ? "has no load range"
        : t.commercial
          ? "is a commercial (C) size"
          : `has load range ${t.loadRange}, for which no pressure is held`;
    throw new FitmentInputError(
      fields.maxPressureKpa,
      `${fields.maxPressureKpa}: ${t.text} ${why} — give the load range (e.g. LT265/75R16 123/120S LRE) or the pressure the sidewall states its maximum load at (e.g. 551.6 kPa = 80 psi)`,
      options.maxPressureKpa,
    );
  }

  let maxInflation: number;
  if (givenInflation !== undefined) {
    if (givenInflation < maxPressure) {
      throw new FitmentInputError(
        fields.maxInflationKpa,
        `${fields.maxInflationKpa} ${kpaText(givenInflation)} is below the pressure at maximum load ${kpaText(maxPressure)}; give the sidewall "max press" figure (e.g. ${round1(Math.max(maxPressure, 300))})`,
        givenInflation,
      );
    }
    maxInflation = givenInflation;
  } else {
    maxInflation = tireClass === "passenger" ? Math.max(PASSENGER_MAX_INFLATION_KPA, maxPressure) : maxPressure;
  }

  const derate = tireClass === "passenger" && vehicle === "light-truck";
  const maxLoadKg = derate ? rated / PASSENGER_ON_LIGHT_TRUCK_DIVISOR : rated;

  let minimum: number;
  let minimumSource: string;
  const lr = t.loadRange;
  if (givenMinimum !== undefined) {
    minimum = givenMinimum;
    minimumSource = "maker's minimum as given";
  } else if (tireClass === "passenger") {
    minimum = extra ? ROAD_MINIMUM_KPA.passengerExtra : ROAD_MINIMUM_KPA.passengerStandard;
    minimumSource = `FMVSS 138 Table 1, passenger ${extra ? "extra" : "standard"} load ${minimum} kPa (from memory)`;
  } else if (t.system === "metric" && !t.commercial && givenPressure === undefined && (lr === "C" || lr === "D" || lr === "E")) {
    minimum = ROAD_MINIMUM_KPA[lr];
    minimumSource = `FMVSS 138 Table 1, load range ${lr} ${minimum} kPa (from memory)`;
  } else {
    minimum = ROAD_MINIMUM_RATIO * maxPressure;
    minimumSource = `${round1(ROAD_MINIMUM_RATIO * 100)} % of the pressure at maximum load: the largest ratio in FMVSS 138 Table 1, applied by proportion (no source)`;
  }
  if (minimum >= maxPressure) {
    // Either the maker's minimum or the given pressure at maximum load is wrong; name the one given.
    const field = givenMinimum !== undefined ? fields.minPressureKpa : fields.maxPressureKpa;
    throw new FitmentInputError(
      field,
      `${field}: the road minimum ${kpaText(minimum)} is not below the pressure at maximum load ${kpaText(maxPressure)} (e.g. ${field === fields.minPressureKpa ? round1(maxPressure * 0.6) : "551.6"})`,
      givenMinimum ?? givenPressure,
    );
  }

  return {
    tire: t,
    tireClass,
    exponent,
    vehicle,
    maxLoadKg,
    ratedMaxLoadKg: rated,
    maxPressureKpa: maxPressure,
    maxInflationKpa: maxInflation,
    minimumPressureKpa: minimum,
    sources: {
      exponent:
        tireClass === "passenger"
          ? "passenger: L ∝ P^0.5 (TRA metric passenger load formula; NHTSA, The Pneumatic Tire, 2006)"
          : "light truck / flotation: L ∝ P^0.585 (TRA load formula; NHTSA, The Pneumatic Tire, 2006)",
      maxLoad: maxLoadSource,
      maxPressure: maxPressureSource,
      minimum: minimumSource,
      derating: derate ? "passenger tire on a light truck, MPV or SUV: load ÷ 1.10 (FMVSS 120 S5.1.2; TRA)" : null,
    },
  };
}

function baseNotes(b: LoadPressureBasis): string[] {
  const notes: string[] = [];
  if (b.tireClass === "passenger" && b.vehicle === "passenger-car") {
    notes.push(
      'Passenger tire: on a light truck, MPV or SUV pass vehicle "light-truck" — its load rating is divided by 1.10 (FMVSS 120 S5.1.2).',
    );
  }
  if (b.sources.derating !== null)
    notes.push(`Load rating ${b.ratedMaxLoadKg} kg ÷ 1.10 = ${round1(b.maxLoadKg)} kg on a light truck (FMVSS 120 S5.1.2).`);
  notes.push(
    "Cold pressures. The vehicle maker's placard and the tire maker's load tables take precedence; never exceed the sidewall maximum.",
  );
  return notes;
}

/**
 * The load one tire may carry at a cold inflation pressure: L = Lmax · (P / Pmax)^n, n = 0.585
 * (light truck, flotation) or 0.5 (passenger). At or above Pmax the load is Lmax (a passenger
 * tire may be inflated above Pmax up to its sidewall "max press" — `aboveMaxPressure` — without
 * gaining load). A pressure below the road minimum is computed but flagged `belowMinimum`.
 * A pressure above the highest the tire allows throws {@link TireLimitError} (`pressureKpa`).
 *
 * Sources: TRA load formulas (NHTSA, The Pneumatic Tire, 2006); ISO 4000-1 load index table;
 * FMVSS 120 S5.1.2 (÷ 1.10 on a light truck); FMVSS 138 Table 1 (road minimum, from memory).
 *
 * @example
 * loadAtPressure("LT265/75R16 123/120S LRE", psiToKpa(50)).loadKg; // 1550 · (50/80)^0.585 ≈ 1177.6
 * loadAtPressure("P215/75R15 100S", psiToKpa(30)).loadKg;          // 800 · √(30/35) ≈ 740.7
 */
export function loadAtPressure(tire: string | TireSize, pressureKpa: number, options: LoadPressureOptions = {}): LoadAtPressure {
  return loadFromBasis(loadPressureBasis(tire, options), pressureKpa, "pressureKpa");
}

/** {@link loadAtPressure} on a computed basis; `field` names the pressure in messages. */
export function loadFromBasis(b: LoadPressureBasis, pressureKpa: number, field: string): LoadAtPressure {
  const L = LOAD_PRESSURE_LIMITS.pressureKpa;
  const p = requireNumber(field, pressureKpa, L.min, L.max, "240", "kPa");
  if (p > b.maxInflationKpa) {
    throw new TireLimitError(
      field,
      `${field} ${kpaText(p)} is above the highest pressure ${b.tire.text} allows, ${kpaText(b.maxInflationKpa)}; never inflate above the sidewall maximum (e.g. ${round1(b.maxPressureKpa)})`,
      p,
      b.maxInflationKpa,
      "kPa",
    );
  }
  const above = p > b.maxPressureKpa;
  const loadKg = above ? b.maxLoadKg : b.maxLoadKg * (p / b.maxPressureKpa) ** b.exponent;
  const belowMinimum = p < b.minimumPressureKpa;
  const notes = baseNotes(b);
  if (belowMinimum) {
    notes.unshift(
      `Below the road minimum ${kpaText(b.minimumPressureKpa)} (${b.sources.minimum}): the load shown is the formula's, not one the standards allow on the road.`,
    );
  }
  if (above) notes.unshift(`Above ${kpaText(b.maxPressureKpa)} the tire carries no more than its maximum load.`);
  return {
    loadKg,
    maxLoadKg: b.maxLoadKg,
    maxPressureKpa: b.maxPressureKpa,
    exponent: b.exponent,
    tireClass: b.tireClass,
    pressureKpa: p,
    pressurePsi: kpaToPsi(p),
    minimumPressureKpa: b.minimumPressureKpa,
    belowMinimum,
    aboveMaxPressure: above,
    notes,
    sources: b.sources,
  };
}

/**
 * The cold inflation pressure at which one tire carries a load: P = Pmax · (L / Lmax)^(1/n).
 * A load above the tire's maximum throws {@link TireLimitError} (`loadKg`). A pressure below
 * the road minimum is returned flagged `belowMinimum`, with `pressureToSetKpa` = the minimum.
 *
 * Sources: TRA load formulas (NHTSA, The Pneumatic Tire, 2006); ISO 4000-1 load index table;
 * FMVSS 120 S5.1.2 (÷ 1.10 on a light truck); FMVSS 138 Table 1 (road minimum, from memory).
 *
 * @example
 * const r = pressureForLoad("LT265/75R16 123/120S LRE", 1000);
 * r.pressurePsi;      // 80 · (1000/1550)^(1/0.585) ≈ 37.8
 * r.belowMinimum;     // true: load range E road minimum 320 kPa
 * r.pressureToSetKpa; // 320
 */
export function pressureForLoad(tire: string | TireSize, loadKg: number, options: LoadPressureOptions = {}): PressureForLoad {
  const b = loadPressureBasis(tire, options);
  return pressureFromBasis(b, loadKg, "loadKg");
}

/** {@link pressureForLoad} on a computed basis; `field` names the load in messages. */
export function pressureFromBasis(b: LoadPressureBasis, loadKg: number, field: string): PressureForLoad {
  const L = LOAD_PRESSURE_LIMITS.loadKg;
  const load = requireNumber(field, loadKg, L.min, L.max, "1000", "kg");
  if (load <= 0) {
    throw new FitmentInputError(field, `${field} must be above 0 kg, got ${load} (e.g. 1000)`, load);
  }
  if (load > b.maxLoadKg) {
    throw new TireLimitError(
      field,
      `${field} ${round1(load)} kg is above the maximum load of ${b.tire.text}, ${round1(b.maxLoadKg)} kg at ${kpaText(b.maxPressureKpa)}${b.sources.derating !== null ? " (÷ 1.10 on a light truck)" : ""}; choose a tire with a higher load index or load range (e.g. ${round1(b.maxLoadKg * 0.8)})`,
      load,
      b.maxLoadKg,
      "kg",
    );
  }
  const pressureKpa = b.maxPressureKpa * (load / b.maxLoadKg) ** (1 / b.exponent);
  const belowMinimum = pressureKpa < b.minimumPressureKpa;
  const toSet = belowMinimum ? b.minimumPressureKpa : pressureKpa;
  const capacity = b.maxLoadKg * (toSet / b.maxPressureKpa) ** b.exponent;
  const notes = baseNotes(b);
  if (belowMinimum) {
    notes.unshift(
      `The load needs only ${kpaText(pressureKpa)}, below the road minimum ${kpaText(b.minimumPressureKpa)} (${b.sources.minimum}): set at least the minimum.`,
    );
  }
  return {
    pressureKpa,
    pressurePsi: kpaToPsi(pressureKpa),
    maxLoadKg: b.maxLoadKg,
    maxPressureKpa: b.maxPressureKpa,
    exponent: b.exponent,
    tireClass: b.tireClass,
    loadKg: load,
    minimumPressureKpa: b.minimumPressureKpa,
    belowMinimum,
    pressureToSetKpa: toSet,
    pressureToSetPsi: kpaToPsi(toSet),
    // capacity ≥ load by construction; max() only absorbs rounding in the last bit.
    reserveKg: Math.max(0, capacity - load),
    notes,
    sources: b.sources,
  };
}

/** Result of {@link loadIndexNeeded}. */
export interface LoadIndexNeeded {
  /** The least single load index whose load is at least `ratingNeededKg`. */
  loadIndex: number;
  /** The load of that index (ISO 4000-1 table), kg. */
  indexLoadKg: number;
  /** The load one tire must carry, kg, as given. */
  loadKg: number;
  /** The rating that load asks for: `loadKg`, × 1.10 for a passenger tire on a light truck, kg. */
  ratingNeededKg: number;
  tireClass: TireLoadClass;
  /** The passenger-on-light-truck rule raised the rating needed. */
  derated: boolean;
}

/**
 * The least load index a tire of this size must have to carry `loadKg` at its maximum pressure —
 * for sizes written without a service description (a size from a list, not from a sidewall),
 * whose pressure for a load cannot be computed because their maximum load is not known. A
 * passenger tire on a light truck (`vehicle: "light-truck"`) needs a rating 1.10 times the load.
 * A load above the table's largest index throws {@link TireLimitError} (`loadKg`).
 *
 * Sources: ISO 4000-1 load index table; FMVSS 120 S5.1.2 (÷ 1.10 on a light truck).
 *
 * @example
 * loadIndexNeeded("35x12.50R17LT", 894).loadIndex;                         // 104 (900 kg; 103 = 875 kg)
 * loadIndexNeeded("285/70R17", 894, { vehicle: "light-truck" }).loadIndex; // 108 (1000 kg ≥ 894 × 1.10 = 983.4 kg)
 */
export function loadIndexNeeded(tire: string | TireSize, loadKg: number, options: { vehicle?: VehicleKind } = {}): LoadIndexNeeded {
  const t = readTire(tire, "tire");
  const tireClass = classOf(t, "tire");
  const L = LOAD_PRESSURE_LIMITS.loadKg;
  requireNumber("loadKg", loadKg, L.min, L.max, "894 kg", "kg");
  const derated = tireClass === "passenger" && options.vehicle === "light-truck";
  const ratingNeededKg = derated ? loadKg * PASSENGER_ON_LIGHT_TRUCK_DIVISOR : loadKg;
  const loadIndex = LOAD_INDEX_KG.findIndex((kg) => kg >= ratingNeededKg);
  if (loadIndex < 0) {
    const top = LOAD_INDEX_KG[MAX_LOAD_INDEX] as number;
    throw new TireLimitError(
      "loadKg",
      `loadKg: ${round1(ratingNeededKg)} kg is above the load of the table's largest index ${MAX_LOAD_INDEX} (${top} kg) (e.g. 894 kg)`,
      loadKg,
      top,
      "kg",
    );
  }
  return { loadIndex, indexLoadKg: LOAD_INDEX_KG[loadIndex] as number, loadKg, ratingNeededKg, tireClass, derated };
}
