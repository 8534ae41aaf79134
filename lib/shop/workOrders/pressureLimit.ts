/**
 * The quoted tire's pressure limits for the work order's "cold pressure set" step: the highest
 * pressure it allows and its road minimum, from the engine (lib/fitment loadPressureBasis: load
 * range, passenger reference pressures, FMVSS 138 ratio). A counter vehicle keeps no door placard,
 * so the pressure to set comes from the placard and the tire maker's load table; these only bound
 * it. A recorded pressure above the maximum is refused.
 */
import { FitmentInputError, loadPressureBasis } from "@/lib/fitment";
import { pressureWords } from "./signedText";

export interface TirePressureLimits {
  tire: string;
  maxKpa: number;
  minimumKpa: number;
  maxSource: string;
  minimumSource: string;
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
