/**
 * The quoted tire's pressure limits for the work order's "cold pressure set" step: the highest
 * pressure it allows and its road minimum, from the engine (lib/fitment loadPressureBasis: load
 * range, passenger reference pressures, FMVSS 138 ratio). A counter vehicle keeps no door placard,
 * so the pressure to set comes from the placard and the tire maker's load table; these only bound
 * it. A recorded pressure above the maximum is refused; one below the road minimum is refused unless
 * the technician says the tire maker's load table allows it (belowRoadMinimum).
 */
import { FitmentInputError, loadPressureBasis, psiToKpa } from "@/lib/fitment";
import type { AxlePressure, QuotePressure } from "@/lib/shop/customers/counterPlacard";
import { pressureWords } from "./signedText";
import { FIELD_LABEL } from "./vocabulary";

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

/**
 * How far below the road minimum a figure may be and still read as it on the card: half the card's
 * last digit in the unit typed (psi to 0.1, kPa whole). The card says "46.4 psi" for 320 kPa, and
 * 46.4 psi is 319.9 kPa; typing what the card shows must not be refused.
 */
const shownAs = (unit: "psi" | "kPa") => (unit === "psi" ? psiToKpa(0.05) : 0.5);

/**
 * The pressure is below the quoted tire's road minimum as the card shows it (false without limits).
 *
 * @example
 * isBelowRoadMinimum(psiToKpa(30), "psi", tirePressureLimits("LT285/70R17 121/118Q LRE")); // true (320 kPa = 46.4 psi)
 */
export function isBelowRoadMinimum(kpa: number, unit: "psi" | "kPa", limits: TirePressureLimits | null): boolean {
  return !!limits && kpa < limits.minimumKpa - shownAs(unit);
}

/**
 * The refusal of a recorded pressure below the tire's road minimum, unless `makerTable` (the
 * technician's tick) says the tire maker's load table allows it for this load; null otherwise.
 *
 * Why a tick and not a plain refusal: the road minimum is the app's figure (FMVSS 138 Table 1
 * from memory, or a share of the maximum with no source for flotation sizes), and the tire maker's
 * own load table comes first; a technician may set a lower figure read from it, and says so on the
 * record. Why not an "aired down" tick: this step is the pressure the truck leaves the shop on, a
 * road pressure; airing down for the trail happens at the trail.
 *
 * @example
 * belowRoadMinimum(psiToKpa(30), "psi", limits, "Cold pressure set (psi)", false);
 * // "Cold pressure set (psi): 30 psi (207 kPa) is below the road minimum for LT285/70R17 121/118Q LRE, 46.4 psi (320 kPa) (…); …"
 */
export function belowRoadMinimum(
  kpa: number,
  unit: "psi" | "kPa",
  limits: TirePressureLimits | null,
  label: string,
  makerTable: boolean,
): string | null {
  if (!limits || makerTable || !isBelowRoadMinimum(kpa, unit, limits)) return null;
  return `${label}: ${pressureWords(kpa, unit)} is below the road minimum for ${limits.tire}, ${pressureWords(limits.minimumKpa, unit)} (${limits.minimumSource}); set at least that, or tick "${FIELD_LABEL.makerTable}" only if the tire maker's load table gives this pressure for this load.`;
}

/**
 * What the sheet's form and the server both refuse of a recorded pressure against the quoted
 * tire's limits: above the maximum always, below the road minimum without the tick.
 */
export const pressureRefusal = (kpa: number, unit: "psi" | "kPa", limits: TirePressureLimits | null, label: string, makerTable: boolean) =>
  aboveMaximum(kpa, unit, limits, label) ?? belowRoadMinimum(kpa, unit, limits, label, makerTable);
