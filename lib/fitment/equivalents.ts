/**
 * Nearest standard equivalents of a size in another designation system: the metric sizes
 * closest to a flotation size, or the flotation sizes closest to a metric one.
 * Ranked by |overall diameter difference|, then |section width difference| (mm).
 */
import { FitmentInputError, requireInteger } from "./errors";
import { STANDARD_FLOTATION_SIZES, STANDARD_METRIC_SIZES } from "./standardSizes";
import { type TireSize, toTireSize } from "./tireSize";

/** One equivalent size. */
export interface EquivalentSize {
  size: TireSize;
  text: string;
  /** Equivalent minus the given size, mm. */
  diameterDeltaMm: number;
  diameterDeltaPct: number;
  widthDeltaMm: number;
}

/** Options of {@link equivalentSizes}. */
export interface EquivalentOptions {
  /** Target system; default: flotation for a metric size, metric otherwise. */
  system?: "metric" | "flotation";
  /** How many to return (1–50, default 5). */
  limit?: number;
  /** Only sizes for the same rim diameter (default true). */
  sameRimDiameter?: boolean;
  /** Candidate list instead of the built-in standard sizes. */
  sizes?: readonly TireSize[];
}

/**
 * Nearest standard sizes of the other system, with diameter and width deltas.
 *
 * @example
 * equivalentSizes("37x12.50R17LT", { system: "metric" })[0]?.text; // "365/70R17"
 * equivalentSizes("285/75R17", { system: "flotation" })[0]?.text;  // "34x10.50R17LT"
 */
export function equivalentSizes(size: string | TireSize, options: EquivalentOptions = {}): EquivalentSize[] {
  const t = toTireSize(size);
  const system = options.system ?? (t.system === "metric" ? "flotation" : "metric");
  if (system !== "metric" && system !== "flotation") {
    throw new FitmentInputError("system", `system must be "metric" or "flotation", got ${JSON.stringify(system)}`, system);
  }
  const limit = options.limit === undefined ? 5 : requireInteger("limit", options.limit, 1, 50, "5");
  const sameRim = options.sameRimDiameter !== false;
  const pool = options.sizes ?? (system === "metric" ? STANDARD_METRIC_SIZES : STANDARD_FLOTATION_SIZES);
  const out: EquivalentSize[] = [];
  for (const c of pool) {
    if (c.system !== system) continue;
    if (sameRim && c.rimDiameterIn !== t.rimDiameterIn) continue;
    if (c.text === t.text) continue;
    const dd = c.overallDiameterMm - t.overallDiameterMm;
    out.push({
      size: c,
      text: c.text,
      diameterDeltaMm: dd,
      diameterDeltaPct: (dd / t.overallDiameterMm) * 100,
      widthDeltaMm: c.sectionWidthMm - t.sectionWidthMm,
    });
  }
  out.sort(
    (a, b) =>
      Math.abs(a.diameterDeltaMm) - Math.abs(b.diameterDeltaMm) ||
      Math.abs(a.widthDeltaMm) - Math.abs(b.widthDeltaMm) ||
      (a.text < b.text ? -1 : a.text > b.text ? 1 : 0),
  );
  return out.slice(0, limit);
}
