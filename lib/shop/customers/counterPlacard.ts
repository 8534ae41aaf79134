/**
 * The door placard of a counter vehicle (a shop customer's vehicle): the size printed there, the
 * cold pressures front and rear, and optionally the axle weights from a scale ticket or the axle
 * ratings (GAWR). The same figures, bounds, labels and checks as a garage vehicle's load profile
 * (lib/garage/loadProfile.ts) without the body points: typed in the inch/metric choice, stored in
 * SI (kPa, kg), `units` kept so a message names its field as the counter labelled it.
 *
 * With the placard and an axle pair, the quote and the work order give the cold pressure to set
 * per axle for the quoted tire: the garage's own figures (lib/garage/loadFigures setupFigures, over
 * lib/comparisons/loadPlan planLoad: the TRA load formula's equivalent pressure, the axle load and
 * the road minimum, highest wins).
 */
import { z } from "zod";
import type { VehicleKind } from "@/lib/fitment";
import { setupFigures } from "@/lib/garage/loadFigures";
import {
  type AxleLoadSource,
  type CurrentTire,
  type LoadProfile,
  type Units,
  checkLoadProfile,
  emptyProfile,
} from "@/lib/garage/loadProfile";
import type { Setup } from "@/lib/setup/model";
import { tirePressureLimits, toSetWords } from "@/lib/shop/workOrders/pressureLimit";
import { pressureWords } from "@/lib/shop/workOrders/signedText";

/** The placard figures a counter vehicle keeps (SI). */
export const PLACARD_KEYS = ["placardFrontKpa", "placardRearKpa", "frontGawrKg", "rearGawrKg", "frontAxleKg", "rearAxleKg"] as const;

export type CounterPlacard = {
  units: Units;
  vehicleKind: VehicleKind;
  placardTire: string;
  placardFrontKpa: number;
  placardRearKpa: number;
} & Record<"frontGawrKg" | "rearGawrKg" | "frontAxleKg" | "rearAxleKg", number | null>;

/** A placard as the garage's load profile (no body points), so its checks and figures apply as they are. */
export const placardProfile = (p: CounterPlacard): LoadProfile => ({ ...emptyProfile(p.units), ...p });

const figure = z.number().finite().nullable().optional();

/**
 * The placard as a request carries it (SI, with the units it was typed in), checked by the garage's
 * load checks; `current` is the vehicle's current tire (the checks need one; no body point is read).
 * A message is keyed by the placard's field name.
 */
export function placardSchema(current: () => CurrentTire) {
  return z
    .object({
      units: z.enum(["imperial", "metric"]),
      vehicleKind: z.enum(["light-truck", "passenger-car"]).default("light-truck"),
      placardTire: z.string().nullable().optional(),
      placardFrontKpa: figure,
      placardRearKpa: figure,
      frontGawrKg: figure,
      rearGawrKg: figure,
      frontAxleKg: figure,
      rearAxleKg: figure,
    })
    .transform((v, ctx): CounterPlacard | null => {
      const profile: LoadProfile = { ...emptyProfile(v.units), vehicleKind: v.vehicleKind, placardTire: v.placardTire?.trim() || null };
      for (const k of PLACARD_KEYS) profile[k] = v[k] ?? null;
      const given = profile.placardTire !== null || PLACARD_KEYS.some((k) => profile[k] !== null);
      if (!given) return null;
      // A lone axle figure without the placard computes nothing: the placard group's own message says so.
      const errors = checkLoadProfile(profile, current());
      if (profile.placardTire === null && Object.keys(errors).length === 0)
        errors.placardTire = "Tire size on the placard: enter it with both cold pressures, or clear the axle figures.";
      for (const [k, m] of Object.entries(errors)) ctx.addIssue({ code: "custom", path: [k], message: m });
      if (Object.keys(errors).length > 0) return z.NEVER;
      const { placardTire, placardFrontKpa, placardRearKpa, frontGawrKg, rearGawrKg, frontAxleKg, rearAxleKg } = profile;
      return {
        units: v.units,
        vehicleKind: v.vehicleKind,
        placardTire: placardTire!,
        placardFrontKpa: placardFrontKpa!,
        placardRearKpa: placardRearKpa!,
        frontGawrKg,
        rearGawrKg,
        frontAxleKg,
        rearAxleKg,
      };
    });
}

/** The pressure to set on one axle of the quoted tire. */
export interface AxlePressure {
  axle: "front" | "rear";
  kpa: number;
  decidedBy: "placard" | "axle load" | "road minimum";
}

/**
 * What a quote keeps of the placard (stored with its fitment summary, so a sent quote never
 * changes): the pressures to set, or why there are none.
 */
export type QuotePressure =
  | {
      placardTire: string;
      placardFrontKpa: number;
      placardRearKpa: number;
      /** Where the axle loads came from. */
      from: AxleLoadSource;
      tire: string;
      axles: AxlePressure[];
      /** The quoted tire's highest inflation pressure (the sidewall maximum, lib/shop/workOrders/pressureLimit.ts). */
      maxKpa: number;
    }
  | { placardTire: string; missing: string };

const psi = (kpa: number) => pressureWords(kpa, "psi");

/**
 * The cold pressure to set per axle for the quoted tire, from the counter vehicle's placard.
 *
 * @example
 * quotePressure(placard, current, { ...planned, tire: "285/70R17 117T" });
 * // { axles: [{ axle: "front", kpa: 193.3, decidedBy: "placard" }, …], maxKpa: 300, from: "scale ticket", … }
 */
export function quotePressure(placard: CounterPlacard, current: Setup, planned: Setup): QuotePressure {
  const f = setupFigures(placardProfile(placard), current, planned, placard.units).load;
  const base = { placardTire: placard.placardTire };
  if (!f)
    return {
      ...base,
      missing: "Enter the axle weights (scale ticket) or the axle ratings (GAWR) with the placard to get the pressure to set.",
    };
  if (!f.plan) {
    const why = f.messages.join(" ");
    return {
      ...base,
      missing: f.tireRefused
        ? `No pressure to set for ${planned.tire}: the quoted tire's size must carry a load index (and, for a light-truck size, its load range) for a pressure. ${why}`
        : `No pressure to set: ${why}`,
    };
  }
  return {
    ...base,
    placardFrontKpa: placard.placardFrontKpa,
    placardRearKpa: placard.placardRearKpa,
    from: f.from,
    tire: f.plan.planned.text,
    axles: f.plan.axles.map((a) => ({ axle: a.axle, kpa: a.pressureToSetKpa, decidedBy: a.decidedBy })),
    maxKpa: tirePressureLimits(planned.tire)?.maxKpa ?? f.plan.planned.maxPressureKpa,
  };
}

/** The pressures to set, axle by axle: "front 28 psi (193 kPa), rear 28 psi (193 kPa)". */
export const axlePressureWords = (p: Extract<QuotePressure, { axles: unknown }>) => toSetWords(p.axles, "psi");

/**
 * The pressure to set in words (the quote's caution, its PDF and the work order's hint).
 *
 * @example
 * pressureToSetText(p); // "Cold pressure to set for 285/70R17 117T: front 28 psi (193 kPa), rear …"
 */
export function pressureToSetText(p: QuotePressure): string {
  if ("missing" in p) return p.missing;
  return `Cold pressure to set for ${p.tire}: ${axlePressureWords(p)} — what it needs to carry the axle loads (${p.from}) as the placard's ${p.placardTire} does at ${psi(p.placardFrontKpa)} front and ${psi(p.placardRearKpa)} rear, by the TRA load formula, never below the road minimum. Never inflate above the sidewall maximum, ${psi(p.maxKpa)}; the vehicle placard and the tire maker's load table take precedence.`;
}
