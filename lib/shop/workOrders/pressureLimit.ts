/**
 * The quoted tire's pressure limits for the work order's "cold pressure set" step: the highest
 * pressure it allows and its road minimum, from the engine (lib/fitment loadPressureBasis: load
 * range, passenger reference pressures, FMVSS 138 ratio). A counter vehicle keeps no door placard,
 * so the pressure to set comes from the placard and the tire maker's load table; these only bound
 * it. A recorded pressure above the maximum is refused.
 */
import { FitmentInputError, loadPressureBasis } from "@/lib/fitment";
import type { AxlePressure, QuotePressure } from "@/lib/shop/customers/counterPlacard";
import { pressureWords } from "./signedText";

export interface TirePressureLimits {
  tire: string;
  maxKpa: number;
  minimumKpa: number;
  maxSource: string;
  minimumSource: string;
  /** The cold pressure to set per axle, when the quote was drawn up with the vehicle's door placard (counterPlacard.ts). */
  toSet?: AxlePressure[];
}

/**
 * Null when the quoted tire's size does not read or does not say its limits (an LT size without a
 * load range): the step then carries only the caution.
 *
 * @example
 * tirePressureLimits("37x12.50R17LT 124Q LRD"); // { maxKpa: 344.7 (50 psi), minimumKpa: 201.1 (29.2 psi), … }
 */
export function tirePressureLimits(tire: string | null | undefined): TirePressureLimits | null {
  if (!tire) return null;
  try {
    const b = loadPressureBasis(tire, { vehicle: "light-truck" });
    return {
      tire: b.tire.text,
      maxKpa: b.maxInflationKpa,
      minimumKpa: b.minimumPressureKpa,
      maxSource: b.sources.maxPressure,
      minimumSource: b.sources.minimum,
    };
  } catch (e) {
    if (e instanceof FitmentInputError) return null;
    throw e;
  }
}

/**
 * The limits with the pressures to set per axle the quote computed from the door placard; without
 * them (no placard, or none computed) the limits alone, as before.
 *
 * @example
 * withPressureToSet(tirePressureLimits("35x12.50R17LT 121Q E"), quote.fitment.pressure)?.toSet;
 * // [{ axle: "front", kpa: 261.4, decidedBy: "road minimum" }, { axle: "rear", … }]
 */
export function withPressureToSet(limits: TirePressureLimits | null, pressure: QuotePressure | null): TirePressureLimits | null {
  if (!limits || !pressure || !("axles" in pressure)) return limits;
  return { ...limits, toSet: pressure.axles };
}

/** The pressures to set in the sheet's unit: "front 37.9 psi (261 kPa), rear 37.9 psi (261 kPa)". */
export const toSetWords = (toSet: readonly AxlePressure[], unit: "psi" | "kPa") =>
  toSet.map((a) => `${a.axle} ${pressureWords(a.kpa, unit)}`).join(", ");

/**
 * The refusal of a recorded pressure above the tire's maximum, in the unit it was entered in with
 * the other beside it; null when within it. `label` is the field as the sheet labels it.
 *
 * @example
 * aboveMaximum(psiToKpa(65), "psi", limits, "Cold pressure (psi)");
 * // "Cold pressure (psi): 65 psi (448 kPa) is above the highest pressure 37x12.50R17LT 124Q LRD allows, 50 psi (345 kPa); never inflate above the sidewall maximum."
 */
export function aboveMaximum(kpa: number, unit: "psi" | "kPa", limits: TirePressureLimits | null, label: string): string | null {
  if (!limits || kpa <= limits.maxKpa + 1e-6) return null;
  return `${label}: ${pressureWords(kpa, unit)} is above the highest pressure ${limits.tire} allows, ${pressureWords(limits.maxKpa, unit)}; never inflate above the sidewall maximum.`;
}
