/**
 * The comparison input — a current and a planned setup (lib/setup) and the vehicle figures —
 * its bounds and defaults. Its validation is checkInput.ts (`checkComparison`), apart so that a
 * page which only shows a comparison does not ship it (the workspace loads it once the reader
 * types); `schema.ts` wraps `checkComparison` as a zod schema for route handlers and stored JSONB.
 *
 * Units follow the engine (lib/fitment/README.md): mm inside, inches where the trade designates
 * in inches, speeds in mph.
 */
import { DEFAULT_AXLE_RATIO, DEFAULT_TRANSMISSION_RATIO } from "@/lib/fitment/compare";
import type { Setup } from "@/lib/setup/model";

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
  current: Setup;
  planned: Setup;
  vehicle: VehicleValues;
}

/** Bounds of the vehicle figures (a setup's are lib/setup's SETUP_LIMITS). */
export const VEHICLE_LIMITS = {
  kingpinInclinationDeg: { min: 0, max: 30 },
  axleRatio: { min: 1, max: 10 },
  transmissionRatio: { min: 0.3, max: 10 },
  cruiseMph: { min: 5, max: 150 },
  cruiseCount: { min: 1, max: 6 },
  fenderLineMm: { min: 0, max: 500 },
  firstGearRatio: { min: 1, max: 10 },
  transferLowRatio: { min: 1, max: 10 },
} as const;

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
  planned: {
    tire: "37x12.50R17LT 124Q LRD",
    wheelDiameterIn: 17,
    wheelWidthIn: 9,
    position: { mode: "offset", offsetMm: -12 },
    spacerMm: 0,
  },
  vehicle: DEFAULT_VEHICLE,
};
