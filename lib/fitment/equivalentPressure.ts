/**
 * Equivalent inflation pressure after a tire size or type change: the pressure at which the
 * planned tire carries what the current tire carries at the vehicle maker's placard pressure —
 * the usual way to set pressure after a change (load formulas of loadPressure.ts: TRA, reproduced
 * in NHTSA, *The Pneumatic Tire*, 2006).
 *
 *   load = Lmax,cur · (P_placard / Pmax,cur)^n_cur  (capped at Lmax,cur above Pmax,cur)
 *   P    = Pmax,pla · (load / Lmax,pla)^(1/n_pla)
 *
 * A passenger tire on a light truck, MPV or SUV has its rating divided by 1.10 (FMVSS 120
 * S5.1.2) — on either side, with `vehicle: "light-truck"`. A planned tire that cannot carry the
 * load at its maximum is refused; a pressure below the planned tire's road minimum is flagged
 * and `pressureToSetKpa` is the minimum.
 */
import { TireLimitError, requireObject } from "./errors";
import {
  type BasisFieldNames,
  type LoadAtPressure,
  type PressureForLoad,
  type VehicleKind,
  loadFromBasis,
  loadPressureBasis,
  pressureFromBasis,
} from "./loadPressure";
import type { TireSize } from "./tireSize";
import { kpaToPsi } from "./units";

/** Input of {@link equivalentPressure}. */
export interface EquivalentPressureInput {
  /** The tire the placard pressure is for, e.g. `"P265/70R17 113S"`. */
  current: string | TireSize;
  /** The vehicle maker's placard (cold) pressure for the current tire on this axle, kPa. */
  currentPressureKpa: number;
  /** Pressure the current tire's sidewall states its maximum load at, kPa (default from its standard/load range). */
  currentMaxPressureKpa?: number;
  /** Current tire's maximum load, kg (default from its load index). */
  currentMaxLoadKg?: number;
  /** The planned tire, e.g. `"37x12.50R17LT 124Q LRD"`. */
  planned: string | TireSize;
  /** Pressure the planned tire's sidewall states its maximum load at, kPa (default from its load range). */
  plannedMaxPressureKpa?: number;
  /** Planned tire's maximum load, kg (default from its load index). */
  plannedMaxLoadKg?: number;
  /** The tire or wheel maker's minimum for the planned tire, kPa. */
  plannedMinPressureKpa?: number;
  /** `"light-truck"` (also MPV, SUV, van) divides a passenger tire's rating by 1.10. Default `"passenger-car"`. */
  vehicle?: VehicleKind;
}

/** Result of {@link equivalentPressure}. */
export interface EquivalentPressure {
  /** Pressure at which the planned tire carries `loadKg`, kPa (may be below the road minimum: see `belowMinimum`). */
  pressureKpa: number;
  pressurePsi: number;
  /** Load the current tire carries at the placard pressure, kg. */
  loadKg: number;
  /** `pressureKpa`, or the planned tire's road minimum when that is higher. */
  pressureToSetKpa: number;
  pressureToSetPsi: number;
  belowMinimum: boolean;
  minimumPressureKpa: number;
  /** Load the planned tire may carry at `pressureToSetKpa` beyond `loadKg`, kg. */
  reserveKg: number;
  /** The current tire at the placard pressure. */
  current: LoadAtPressure;
  /** The planned tire carrying `loadKg`. */
  planned: PressureForLoad;
  notes: string[];
}

const CURRENT_FIELDS: BasisFieldNames = {
  tire: "current",
  maxPressureKpa: "currentMaxPressureKpa",
  maxLoadKg: "currentMaxLoadKg",
  maxInflationKpa: "currentMaxInflationKpa",
  minPressureKpa: "currentMinPressureKpa",
  vehicle: "vehicle",
};
const PLANNED_FIELDS: BasisFieldNames = {
  tire: "planned",
  maxPressureKpa: "plannedMaxPressureKpa",
  maxLoadKg: "plannedMaxLoadKg",
  maxInflationKpa: "plannedMaxInflationKpa",
  minPressureKpa: "plannedMinPressureKpa",
  vehicle: "vehicle",
};

/**
 * The pressure at which the planned tire carries what the current tire carries at the placard
 * pressure. Throws {@link TireLimitError} with field `planned` when the planned tire cannot
 * carry that load even at its maximum, and naming the field for any missing or impossible figure.
 *
 * Sources: TRA load formulas (NHTSA, The Pneumatic Tire, 2006); ISO 4000-1 load index table;
 * FMVSS 120 S5.1.2 (÷ 1.10); FMVSS 138 Table 1 (road minimum, from memory).
 *
 * @example
 * const r = equivalentPressure({
 *   current: "P265/70R17 113S", currentPressureKpa: psiToKpa(35),
 *   planned: "LT285/70R17 121/118Q LRE", vehicle: "light-truck",
 * });
 * r.loadKg;           // 1150 / 1.10 ≈ 1045.5 (LI 113 at its 35 psi reference, on a light truck)
 * r.pressurePsi;      // 80 · (1045.5/1450)^(1/0.585) ≈ 45.7 — below the load range E minimum, so
 * r.pressureToSetKpa; // 320 (≈ 46.4 psi, FMVSS 138 Table 1)
 */
export function equivalentPressure(input: EquivalentPressureInput): EquivalentPressure {
  requireObject("input", input, '{ current: "P265/70R17 113S", currentPressureKpa: 241, planned: "LT285/70R17 121/118Q LRE" }');
  const vehicle = input.vehicle;
  const currentBasis = loadPressureBasis(
    input.current,
    { maxPressureKpa: input.currentMaxPressureKpa, maxLoadKg: input.currentMaxLoadKg, vehicle },
    CURRENT_FIELDS,
  );
  const plannedBasis = loadPressureBasis(
    input.planned,
    {
      maxPressureKpa: input.plannedMaxPressureKpa,
      maxLoadKg: input.plannedMaxLoadKg,
      minPressureKpa: input.plannedMinPressureKpa,
      vehicle,
    },
    PLANNED_FIELDS,
  );
  const current = loadFromBasis(currentBasis, input.currentPressureKpa, "currentPressureKpa");
  const loadKg = current.loadKg;
  if (loadKg > plannedBasis.maxLoadKg) {
    throw new TireLimitError(
      "planned",
      `planned: ${plannedBasis.tire.text} carries at most ${Math.round(plannedBasis.maxLoadKg)} kg at its maximum ${Math.round(kpaToPsi(plannedBasis.maxPressureKpa))} psi, less than the ${Math.round(loadKg)} kg ${currentBasis.tire.text} carries at the placard pressure — choose a tire with a higher load index or load range (e.g. LT285/70R17 121/118Q LRE)`,
      loadKg,
      plannedBasis.maxLoadKg,
      "kg",
    );
  }
  const planned = pressureFromBasis(plannedBasis, loadKg, "loadKg");
  const notes = [...planned.notes];
  if (current.belowMinimum)
    notes.unshift("The placard pressure given is below the current tire's road minimum: check the figure on the door placard.");
  return {
    pressureKpa: planned.pressureKpa,
    pressurePsi: planned.pressurePsi,
    loadKg,
    pressureToSetKpa: planned.pressureToSetKpa,
    pressureToSetPsi: planned.pressureToSetPsi,
    belowMinimum: planned.belowMinimum,
    minimumPressureKpa: planned.minimumPressureKpa,
    reserveKg: planned.reserveKg,
    current,
    planned,
    notes,
  };
}
