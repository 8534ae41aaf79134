/**
 * Nearest standard equivalents of a size in another designation system: the metric sizes
 * closest to a flotation size, or the flotation sizes closest to a metric one.
 *
 * Ranking (a design choice, common practice, no source):
 * - sizes for the same rim diameter first (they fit the wheels already on the vehicle), unless
 *   `rim` says otherwise;
 * - then by the combined distance 2 × |Δ overall diameter %| + |Δ section width %|, both relative
 *   to the given size's nominal dimensions (ISO 4000-1 / ETRTO for metric sizes, the stated
 *   inches for flotation sizes, TRA). The overall diameter counts double because it moves the
 *   speedometer, the gearing and the ride height and decides whether the tire fits the wheel
 *   well; a width difference is mostly a matter of offset and clearance. With diameter alone a
 *   size 47.5 mm wider won over one 2.5 mm narrower because it was 1 mm nearer in diameter;
 * - ties: the rim diameter nearer the given one, then the designation.
 */
import { FitmentInputError, requireInteger } from "./errors";
import { STANDARD_FLOTATION_SIZES, STANDARD_METRIC_SIZES } from "./standardSizes";
import { type TireSize, toTireSize } from "./tireSize";

/** Weights of the combined distance (a design choice, common practice, no source). */
export const EQUIVALENT_WEIGHTS = Object.freeze({ diameter: 2, width: 1 });

/** One equivalent size; every difference is the equivalent minus the given size. */
export interface EquivalentSize {
  size: TireSize;
  text: string;
  diameterDeltaMm: number;
  /** Relative to the given size's overall diameter, %. */
  diameterDeltaPct: number;
  widthDeltaMm: number;
  /** Relative to the given size's section width, %. */
  widthDeltaPct: number;
  /** Combined distance, see {@link equivalentDistance}; smaller is closer. */
  distance: number;
  /** Same rim diameter as the given size (mounts on the same wheels' diameter). */
  sameRim: boolean;
}

/** Which rim diameters {@link equivalentSizes} considers. */
export type EquivalentRim = "same" | "same-first" | "any";

/** Options of {@link equivalentSizes}. */
export interface EquivalentOptions {
  /** Target system; default: flotation for a metric size, metric otherwise. */
  system?: "metric" | "flotation";
  /** How many to return (1–50, default 6). */
  limit?: number;
  /**
   * `"same-first"` (default): sizes for the same rim diameter, then the rest; `"same"`: only the
   * same rim diameter; `"any"`: by distance alone.
   */
  rim?: EquivalentRim;
  /** Candidate list instead of the built-in standard sizes. */
  sizes?: readonly TireSize[];
}

const RIMS: readonly EquivalentRim[] = ["same", "same-first", "any"];

/**
 * Combined distance of two sizes from their relative differences (percent):
 * 2 × |Δ diameter %| + |Δ width %| ({@link EQUIVALENT_WEIGHTS}).
 *
 * @example
 * equivalentDistance(-0.4256, -0.7874); // 1.639 (315/80R17 against 37x12.50R17LT)
 */
export function equivalentDistance(diameterDeltaPct: number, widthDeltaPct: number): number {
  return EQUIVALENT_WEIGHTS.diameter * Math.abs(diameterDeltaPct) + EQUIVALENT_WEIGHTS.width * Math.abs(widthDeltaPct);
}

/**
 * Nearest standard sizes of the other system, with diameter and width differences in mm and %.
 *
 * @example
 * equivalentSizes("37x12.50R17LT")[0]?.text; // "315/80R17" (−4.0 mm tall, −2.5 mm wide)
 * equivalentSizes("285/75R16").map((e) => e.text);
 * // ["31x10.50R16LT", "33x10.50R15LT", "32x11.50R15LT", "33x12.50R16.5LT", …]: the 16 in size first
 */
export function equivalentSizes(size: string | TireSize, options: EquivalentOptions = {}): EquivalentSize[] {
  const t = toTireSize(size);
  const system = options.system ?? (t.system === "metric" ? "flotation" : "metric");
  if (system !== "metric" && system !== "flotation") {
    throw new FitmentInputError("system", `system must be "metric" or "flotation", got ${JSON.stringify(system)}`, system);
  }
  const rim = options.rim ?? "same-first";
  if (!RIMS.includes(rim)) {
    throw new FitmentInputError("rim", `rim must be "same", "same-first" or "any", got ${JSON.stringify(rim)}`, rim);
  }
  const limit = options.limit === undefined ? 6 : requireInteger("limit", options.limit, 1, 50, "6");
  const pool = options.sizes ?? (system === "metric" ? STANDARD_METRIC_SIZES : STANDARD_FLOTATION_SIZES);
  const out: EquivalentSize[] = [];
  for (const c of pool) {
    if (c.system !== system) continue;
    const sameRim = c.rimDiameterIn === t.rimDiameterIn;
    if (rim === "same" && !sameRim) continue;
    const dd = c.overallDiameterMm - t.overallDiameterMm;
    const dw = c.sectionWidthMm - t.sectionWidthMm;
    // The size itself (or one with the very same dimensions) is no equivalent of it.
    if (sameRim && Math.abs(dd) < 1e-9 && Math.abs(dw) < 1e-9) continue;
    const diameterDeltaPct = (dd / t.overallDiameterMm) * 100;
    const widthDeltaPct = (dw / t.sectionWidthMm) * 100;
    out.push({
      size: c,
      text: c.text,
      diameterDeltaMm: dd,
      diameterDeltaPct,
      widthDeltaMm: dw,
      widthDeltaPct,
      distance: equivalentDistance(diameterDeltaPct, widthDeltaPct),
      sameRim,
    });
  }
  const rimDelta = (e: EquivalentSize) => Math.abs(e.size.rimDiameterIn - t.rimDiameterIn);
  out.sort(
    (a, b) =>
      (rim === "same-first" ? Number(b.sameRim) - Number(a.sameRim) : 0) ||
      a.distance - b.distance ||
      rimDelta(a) - rimDelta(b) ||
      (a.text < b.text ? -1 : a.text > b.text ? 1 : 0),
  );
  return out.slice(0, limit);
}
