/**
 * Tire dimensions: nominal size in mm and inches, section width on a given rim, measuring rim,
 * circumference, revolutions.
 *
 * Formulas and sources:
 * - Nominal size of a metric designation W/AR R d (ISO 4000-1 / ETRTO design formula): section
 *   width W mm, sidewall H = W × AR / 100, overall diameter D = d × 25.4 + 2H; in inches D / 25.4
 *   and W / 25.4 (1 in = 25.4 mm exactly, NIST SP 811). 285/75R16: 406.4 + 2 × 213.75 = 833.9 mm
 *   = 32.83 in tall, 285 mm = 11.22 in wide.
 * - Nominal size of a flotation designation D x W R d (TRA): D and W as designated, in inches;
 *   H = (D − d) / 2.
 * - D = d + 2H, H = S × AR / 100 (ISO 4000-1 / ETRTO / UN R30).
 * - Section width on another rim: S = S1 + K·(A − A1) with K = 0.4 (UN R30 §6.1.1.1), i.e. the
 *   section width moves 0.4 mm per mm of rim width change. The engine takes the nominal width S1
 *   to apply on the measuring rim (rounding A1 to the nearest half inch; a simplification of R30,
 *   where A1 = S1 · x is the unrounded theoretical rim).
 * - Measuring rim (from memory of the R30/ETRTO factor x by aspect-ratio series, not checked
 *   against the published text): A1 = S1 · x, x = 0.70 for AR ≥ 75, 0.75 for 60–70, 0.80 for
 *   50–55, 0.85 for 45, 0.90 for 30–40, 0.92 below 30; rounded to the nearest 0.5 in.
 *   Flotation sizes: 0.8 × the section width in inches, to the nearest 0.5 in (from memory; gives
 *   the commonly designated rims 7.5 in for 9.50, 8.5 for 10.50, 10 for 12.50, 11 for 13.50).
 *   Numeric sizes use x = 0.70 (their nominal 92 series).
 * - Rim widths suited to a size: measuring rim ± 1.0 in (common practice, no source).
 * - Circumference = π·D (unloaded; a loaded tire rolls a few percent less), revs per mile =
 *   1 609 344 mm / circumference (1 mile = 1 609.344 m exactly, NIST SP 811).
 */
import { requireInteger, requireNumber } from "./errors";
import { type TireSize, toTireSize } from "./tireSize";
import { MM_PER_IN, MM_PER_MILE } from "./units";

/** Section-width change per unit of rim-width change (UN R30 §6.1.1.1). */
export const SECTION_WIDTH_K = 0.4;
/** Allowed rim width around the measuring rim, inches each way (common practice, no source). */
export const RIM_WIDTH_TOLERANCE_IN = 1.0;
/** Accepted range of wheel (rim) widths, inches. */
export const RIM_WIDTH_LIMITS_IN = { min: 3, max: 20 } as const;

/** Result of {@link tireDimensions}. */
export interface TireDimensions {
  sectionWidthMm: number;
  sidewallMm: number;
  overallDiameterMm: number;
  circumferenceMm: number;
  revsPerMile: number;
  revsPerKm: number;
  measuringRimWidthIn: number;
  /** The rim width the section width was computed for (the measuring rim when none given). */
  rimWidthIn: number;
}

/**
 * The factor x (theoretical rim = section × x) for an aspect ratio; from memory, see module docs.
 *
 * @example
 * measuringRimFactor(70); // 0.75
 */
export function measuringRimFactor(aspectRatio: number): number {
  if (aspectRatio >= 72.5) return 0.7;
  if (aspectRatio >= 57.5) return 0.75;
  if (aspectRatio >= 47.5) return 0.8;
  if (aspectRatio >= 42.5) return 0.85;
  if (aspectRatio >= 27.5) return 0.9;
  return 0.92;
}

/**
 * Measuring rim width (inches, nearest 0.5 in) for a tire size.
 *
 * @example
 * measuringRimWidthIn(parseTireSize("265/70R17"));     // 8
 * measuringRimWidthIn(parseTireSize("37x12.50R17LT")); // 10
 */
export function measuringRimWidthIn(size: TireSize): number {
  const sectionIn = size.sectionWidthMm / MM_PER_IN;
  const x = size.system === "flotation" ? 0.8 : size.system === "numeric" ? 0.7 : measuringRimFactor(size.aspectRatio);
  return Math.round(sectionIn * x * 2) / 2;
}

/**
 * Rim widths (inches) suited to a tire size: measuring rim ± {@link RIM_WIDTH_TOLERANCE_IN}.
 *
 * @example
 * approvedRimWidthRangeIn(parseTireSize("265/70R17")); // { min: 7, max: 9 }
 */
export function approvedRimWidthRangeIn(size: TireSize): { min: number; max: number } {
  const m = measuringRimWidthIn(size);
  return { min: m - RIM_WIDTH_TOLERANCE_IN, max: m + RIM_WIDTH_TOLERANCE_IN };
}

/**
 * Section width (mm) of a size mounted on a rim of `rimWidthIn`: nominal width moved by
 * K = 0.4 × the rim width change from the measuring rim (UN R30 §6.1.1.1).
 *
 * @example
 * sectionWidthOnRimMm(parseTireSize("265/70R17"), 9); // 265 + 0.4 × 25.4 = 275.16
 */
export function sectionWidthOnRimMm(size: TireSize, rimWidthIn: number): number {
  return size.sectionWidthMm + SECTION_WIDTH_K * (rimWidthIn - measuringRimWidthIn(size)) * MM_PER_IN;
}

/**
 * Dimensions of a tire, optionally on a given rim width.
 *
 * @example
 * const d = tireDimensions("265/70R17", { rimWidthIn: 9 });
 * d.overallDiameterMm; // 802.8
 * d.sectionWidthMm;    // 275.16
 */
export function tireDimensions(size: string | TireSize, options: { rimWidthIn?: number } = {}): TireDimensions {
  const t = toTireSize(size);
  const measuring = measuringRimWidthIn(t);
  const rim =
    options.rimWidthIn === undefined
      ? measuring
      : requireNumber("rimWidthIn", options.rimWidthIn, RIM_WIDTH_LIMITS_IN.min, RIM_WIDTH_LIMITS_IN.max, "9", "in");
  const circumference = Math.PI * t.overallDiameterMm;
  return {
    sectionWidthMm: t.sectionWidthMm + SECTION_WIDTH_K * (rim - measuring) * MM_PER_IN,
    sidewallMm: t.sidewallMm,
    overallDiameterMm: t.overallDiameterMm,
    circumferenceMm: circumference,
    revsPerMile: MM_PER_MILE / circumference,
    revsPerKm: 1_000_000 / circumference,
    measuringRimWidthIn: measuring,
    rimWidthIn: rim,
  };
}

/** Result of {@link nominalSize}: the design dimensions a designation stands for. */
export interface NominalSize {
  overallDiameterMm: number;
  sectionWidthMm: number;
  sidewallMm: number;
  overallDiameterIn: number;
  sectionWidthIn: number;
  rimDiameterIn: number;
}

/**
 * Nominal (design) dimensions of a size, in mm and inches — what the designation itself says,
 * before any rim width or load: ISO 4000-1 / ETRTO for metric sizes, the stated inches for
 * flotation sizes (TRA). See the module docs for the formulas.
 *
 * @example
 * const n = nominalSize("285/75R16");
 * n.overallDiameterMm; // 833.9
 * n.overallDiameterIn; // 32.83
 * n.sectionWidthIn;    // 11.22
 */
export function nominalSize(size: string | TireSize): NominalSize {
  const t = toTireSize(size);
  return {
    overallDiameterMm: t.overallDiameterMm,
    sectionWidthMm: t.sectionWidthMm,
    sidewallMm: t.sidewallMm,
    overallDiameterIn: t.overallDiameterMm / MM_PER_IN,
    sectionWidthIn: t.sectionWidthMm / MM_PER_IN,
    rimDiameterIn: t.rimDiameterIn,
  };
}

/**
 * The nominal size in inches as people compare sizes: overall diameter × section width on the
 * rim diameter (left out with `rim: false`), each to `decimals` places (default 1, 0–3).
 *
 * @example
 * formatNominalInchSize("285/75R16");       // "32.8 × 11.2 in on 16 in"
 * formatNominalInchSize("33x12.50R16.5LT"); // "33.0 × 12.5 in on 16.5 in"
 * formatNominalInchSize("315/80R17", { rim: false }); // "36.8 × 12.4 in"
 */
export function formatNominalInchSize(size: string | TireSize, options: { decimals?: number; rim?: boolean } = {}): string {
  const decimals = options.decimals === undefined ? 1 : requireInteger("decimals", options.decimals, 0, 3, "1");
  const n = nominalSize(size);
  const text = `${n.overallDiameterIn.toFixed(decimals)} × ${n.sectionWidthIn.toFixed(decimals)} in`;
  return options.rim === false ? text : `${text} on ${n.rimDiameterIn} in`;
}
