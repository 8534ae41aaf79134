/**
 * Load range (ply rating) and maximum inflation pressure for LT tires.
 *
 * Values are from memory of North American (TRA) practice, no published table checked:
 * - ply rating = 2 × (position of the letter in B, C, D, E, F, G, H, J, L, M, N) + 2
 *   (B = 4 ply … E = 10 ply … N = 24 ply);
 * - metric LT sizes (LT285/70R17): C 50 psi, D 65 psi, E 80 psi, F 95 psi (B 35 psi);
 * - flotation LT sizes (37x12.50R17LT): C 35 psi, D 50 psi, E 65 psi, F 80 psi.
 *   A load range D flotation tire is marked 50 psi maximum (common practice, no source).
 */
import { FitmentInputError } from "./errors";
import { psiToKpa } from "./units";

/** Load range letters in order. */
export const LOAD_RANGES = ["B", "C", "D", "E", "F", "G", "H", "J", "L", "M", "N"] as const;
/** A load range letter. */
export type LoadRange = (typeof LOAD_RANGES)[number];

const METRIC_LT_PSI: Readonly<Record<string, number>> = { B: 35, C: 50, D: 65, E: 80, F: 95 };
const FLOTATION_PSI: Readonly<Record<string, number>> = { C: 35, D: 50, E: 65, F: 80 };

/** Result of {@link loadRangeInfo}. */
export interface LoadRangeInfo {
  loadRange: LoadRange;
  plyRating: number;
  /** Tire family the pressure applies to. */
  system: "metric" | "flotation";
  /** Maximum (sidewall) pressure, or null when the engine holds no figure for that letter. */
  maxPressurePsi: number | null;
  maxPressureKpa: number | null;
  /** Where the pressure figure comes from. */
  source: string;
}

/**
 * True when `text` is a load range letter (B–N without I, K, O).
 *
 * @example
 * isLoadRange("E"); // true
 * @public engine API (lib/fitment/index.ts), kept for callers that take a load range as text
 */
export function isLoadRange(text: string): text is LoadRange {
  return (LOAD_RANGES as readonly string[]).includes(text);
}

/**
 * Ply rating of a load range: B = 4, C = 6, D = 8, E = 10, F = 12 …
 *
 * @example
 * plyRating("E"); // 10
 */
export function plyRating(loadRange: string): number {
  const i = (LOAD_RANGES as readonly string[]).indexOf(typeof loadRange === "string" ? loadRange.toUpperCase() : "");
  if (i < 0) {
    throw new FitmentInputError(
      "loadRange",
      `load range must be one of ${LOAD_RANGES.join(", ")}, got ${JSON.stringify(loadRange)} (e.g. "E")`,
      loadRange,
    );
  }
  return 4 + 2 * i;
}

/**
 * Ply rating and maximum pressure for a load range; metric LT and flotation LT differ.
 *
 * @example
 * loadRangeInfo("D", "flotation").maxPressurePsi; // 50
 * loadRangeInfo("E", "metric").maxPressurePsi;    // 80
 */
export function loadRangeInfo(loadRange: string, system: "metric" | "flotation"): LoadRangeInfo {
  const ply = plyRating(loadRange);
  if (system !== "metric" && system !== "flotation") {
    throw new FitmentInputError("system", `system must be "metric" or "flotation", got ${JSON.stringify(system)}`, system);
  }
  const letter = loadRange.toUpperCase() as LoadRange;
  const psi = (system === "metric" ? METRIC_LT_PSI : FLOTATION_PSI)[letter];
  return {
    loadRange: letter,
    plyRating: ply,
    system,
    maxPressurePsi: psi ?? null,
    maxPressureKpa: psi === undefined ? null : psiToKpa(psi),
    source: "from memory (TRA practice), no published table checked",
  };
}

/**
 * Load range letter for a ply rating (4 → B, 10 → E).
 *
 * @example
 * loadRangeFromPly(10); // "E"
 */
export function loadRangeFromPly(ply: number): LoadRange {
  const i = (ply - 4) / 2;
  const lr = Number.isInteger(i) ? LOAD_RANGES[i] : undefined;
  if (lr === undefined) {
    throw new FitmentInputError(
      "plyRating",
      `ply rating must be an even number from 4 to 24, got ${String(ply)} (e.g. 10 for load range E)`,
      ply,
    );
  }
  return lr;
}
