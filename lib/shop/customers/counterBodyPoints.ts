/**
 * A counter vehicle's body points (optional): the front and rear corners' heights and distances
 * from their axles, the lowest point midway and the wheelbase, measured with the current tires.
 * The garage's load-profile fields, labels, bounds and checks (lib/garage/loadProfile.ts) as they
 * are, stored in SI (mm) with the units they were typed in. With them, the quote and its PDF give
 * the approach, departure and breakover angles now and with the quoted tires (lib/garage/loadFigures
 * setupFigures, over lib/comparisons/trailPlan: the engine's SAE J1100 angles).
 */
import { z } from "zod";
import { TRAIL_ANGLE_NAME, type TrailAngle } from "@/lib/comparisons/trailPlan";
import { setupFigures } from "@/lib/garage/loadFigures";
import {
  type CurrentTire,
  type LoadProfile,
  MEASURE_KEYS,
  type MeasureKey,
  type Units,
  checkLoadProfile,
  emptyProfile,
} from "@/lib/garage/loadProfile";
import type { Setup } from "@/lib/setup/model";

/** The load profile's lengths (mm): its body points. */
type BodyKey = Extract<MeasureKey, `${string}Mm`>;
export const BODY_KEYS: readonly BodyKey[] = MEASURE_KEYS.filter((k): k is BodyKey => k.endsWith("Mm"));

/** The body points a counter vehicle keeps (mm). */
export type CounterBodyPoints = { units: Units } & Record<BodyKey, number | null>;

/** The body points as the garage's load profile (no placard), so its checks and figures apply as they are. */
const bodyProfile = (b: CounterBodyPoints): LoadProfile => ({ ...emptyProfile(b.units), ...b });

const figure = z.number().finite().nullable().optional();

/**
 * The body points as a request carries them (mm, with the units they were typed in), checked by the
 * garage's checks: pairs kept whole, bounds, each point outside the current tire's circle. Null
 * when none is given; a message is keyed by the field's name.
 */
export function bodyPointsSchema(current: () => CurrentTire) {
  return z
    .object({
      units: z.enum(["imperial", "metric"]),
      frontCornerHeightMm: figure,
      frontCornerAheadMm: figure,
      rearCornerHeightMm: figure,
      rearCornerBehindMm: figure,
      midHeightMm: figure,
      wheelbaseMm: figure,
    })
    .transform((v, ctx): CounterBodyPoints | null => {
      const points = { units: v.units } as CounterBodyPoints;
      for (const k of BODY_KEYS) points[k] = v[k] ?? null;
      if (BODY_KEYS.every((k) => points[k] === null)) return null;
      const errors = checkLoadProfile(bodyProfile(points), current());
      for (const [k, m] of Object.entries(errors)) ctx.addIssue({ code: "custom", path: [k], message: m });
      return Object.keys(errors).length > 0 ? z.NEVER : points;
    });
}

/** What a quote keeps of the body points (with its fitment summary, so a sent quote never changes). */
export interface QuoteAngles {
  angles: TrailAngle[];
  /** Angles that could not be computed (a body point the quoted tire would reach), in words. */
  messages: string[];
}

/**
 * The trail angles now and with the quoted tires, from the body points measured with the current tires.
 *
 * @example
 * quoteAngles({ units: "metric", frontCornerHeightMm: 750, frontCornerAheadMm: 900, … }, { ...current, tire: "265/70R17" }, { ...planned, tire: "35x12.50R17LT" }).angles[0];
 * // { kind: "approach", currentDeg: 45.7, plannedDeg: 48.6 }
 */
export function quoteAngles(points: CounterBodyPoints, current: Setup, planned: Setup): QuoteAngles {
  const f = setupFigures(bodyProfile(points), current, planned, points.units);
  return { angles: f.angles, messages: f.angleMessages };
}

const deg = (d: number) => `${d.toFixed(1)}°`;

/** The quote's rows: ["Approach angle", "45.7° → 48.6°"]. */
export const angleRows = (a: QuoteAngles): [string, string][] =>
  a.angles.map((x) => [`${TRAIL_ANGLE_NAME[x.kind]} angle`, `${deg(x.currentDeg)} → ${deg(x.plannedDeg)}`]);

/** The angles' caution (the quote's cautions and its PDF). */
export const ANGLE_CAUTION =
  "Trail angles: from the body points the shop measured with the current tires, raised by the tire's radius change; no lift or load change is counted, and a bigger angle is no promise of clearance. Check on the vehicle before driving over an obstacle, and follow the vehicle maker's guidance.";
