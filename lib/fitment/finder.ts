/**
 * Fitment search: enumerates tire sizes × wheels (diameter = the tire's rim diameter, widths,
 * offsets), keeps what meets the constraints and ranks the rest.
 *
 * Designed to run inside a Web Worker: input and output are plain data (structured-clone safe),
 * it is synchronous and deterministic, reports progress through `onProgress(done, total)` and
 * stops early when `signal.aborted` becomes true.
 *
 * A combination is one tire size on one wheel. The space is sizes × wheel widths × offsets (or
 * sizes × the `wheels` offered, when a list is given); a size whose rim diameter is not among the
 * allowed wheel diameters, or whose diameter is out of range, is rejected with all its
 * combinations, which count as evaluated.
 *
 * Ranking (lexicographic): 1. closeness of the overall diameter to the target (default: the
 * maximum diameter, else the minimum, else larger first); 2. rim width closest to the measuring
 * rim; 3. the larger of the smaller remaining swing margins; 4. enumeration order.
 */
import { type BoltPattern, boltPatternsEquivalent, toBoltPattern } from "./boltPattern";
import { RIM_WIDTH_TOLERANCE_IN, SECTION_WIDTH_K, measuringRimWidthIn } from "./dimensions";
import { FitmentInputError, requireInteger, requireNumber } from "./errors";
import type { Wheel } from "./geometry";
import { SPACER_LIMITS_MM } from "./geometry";
import { OFFSET_MARGIN_MM } from "./offset";
import { STANDARD_SIZES } from "./standardSizes";
import type { TireSize, TireSystem } from "./tireSize";
import { MM_PER_IN } from "./units";

/** What the vehicle allows. All optional; distances from the hub mounting face, mm. */
export interface FitmentConstraints {
  /** The vehicle's bolt pattern; wheels offered in another pattern are rejected. */
  boltPattern?: string | BoltPattern;
  minDiameterMm?: number;
  maxDiameterMm?: number;
  /** Preferred overall diameter for ranking. */
  targetDiameterMm?: number;
  /** Most the tire may reach inboard of the mounting face (e.g. to the frame or control arm). */
  maxInnerSwingMm?: number;
  /** Most the tire may reach outboard of the mounting face (e.g. to the fender lip). */
  maxOuterSwingMm?: number;
  maxSectionWidthMm?: number;
  /** Allowed wheel diameters, inches (e.g. what clears the brakes). */
  wheelDiametersIn?: readonly number[];
  /** Hub spacer to apply to every wheel, mm. */
  spacerMm?: number;
  /** Designation systems to consider (default all). */
  systems?: readonly TireSystem[];
  /** Keep only rim widths suited to the section width (default true). */
  requireSuitableRim?: boolean;
}

/** A wheel offered for sale, when searching a list instead of generic widths × offsets. */
export interface WheelOffer extends Wheel {
  boltPattern: string | BoltPattern;
  /** Free identifier passed back in results. */
  id?: string;
}

/** Options of {@link findFitments}. */
export interface FinderOptions {
  /** Tire sizes to search; default every standard size. */
  sizes?: readonly TireSize[];
  /** Wheel widths to enumerate, inches; default 6–12.5 in steps of 0.5. */
  wheelWidthsIn?: readonly number[];
  /** Offsets to enumerate, mm; default {@link COMMON_OFFSETS_MM}. */
  offsetsMm?: readonly number[];
  /** Search these wheels instead of widths × offsets. */
  wheels?: readonly WheelOffer[];
  /** Most results returned (1–10 000, default 100). */
  limit?: number;
  /** Called with combinations done so far and the total, about every 1 % and at the end. */
  onProgress?: (done: number, total: number) => void;
  /** Stop early when `aborted` turns true (e.g. an AbortSignal). */
  signal?: { readonly aborted: boolean };
}

/** One fitment found. */
export interface FitmentMatch {
  tire: TireSize;
  wheel: Wheel;
  wheelId: string | null;
  boltPattern: BoltPattern | null;
  sectionWidthMm: number;
  overallDiameterMm: number;
  effectiveOffsetMm: number;
  innerSwingMm: number;
  outerSwingMm: number;
  /** Backspacing to the bead seat, inches. */
  backspacingIn: number;
  measuringRimWidthIn: number;
  /** 1-based rank. */
  rank: number;
}

/** Result of {@link findFitments}. */
export interface FinderResult {
  results: FitmentMatch[];
  /** Combinations evaluated (equals `total` unless aborted). */
  evaluated: number;
  total: number;
  /** Combinations that met every constraint (before `limit`). */
  matched: number;
  aborted: boolean;
}

/** Default wheel widths, inches. */
export const DEFAULT_WHEEL_WIDTHS_IN: readonly number[] = Object.freeze(
  Array.from({ length: 14 }, (_, i) => 6 + i * 0.5),
);
/** Common wheel offsets, mm (common practice, no source). */
export const COMMON_OFFSETS_MM: readonly number[] = Object.freeze([
  -76, -63, -51, -44, -38, -32, -25, -18, -12, -6, 0, 6, 12, 18, 25, 30, 35, 40, 44, 50, 55, 60,
]);
// Unfrozen private copies for the inner loops (V8 reads frozen arrays slower); never handed out.
const WIDTHS_HOT: readonly number[] = DEFAULT_WHEEL_WIDTHS_IN.slice();
const OFFSETS_HOT: readonly number[] = COMMON_OFFSETS_MM.slice();

interface Cand {
  k1: number;
  k2: number;
  k3: number;
  k4: number;
  size: number;
  width: number;
  offset: number;
  wheel: number;
}

function better(a: Cand, b: Cand): boolean {
  if (Math.abs(a.k1 - b.k1) > 1e-6) return a.k1 < b.k1;
  if (a.k2 !== b.k2) return a.k2 < b.k2;
  if (Math.abs(a.k3 - b.k3) > 1e-6) return a.k3 < b.k3;
  return a.k4 < b.k4;
}

function numberList(field: string, list: unknown, min: number, max: number, example: string): readonly number[] {
  if (!Array.isArray(list) || list.length === 0 || list.length > 10_000) {
    throw new FitmentInputError(field, `${field} must be a list of 1–10000 numbers (e.g. ${example})`, list);
  }
  for (let i = 0; i < list.length; i++) requireNumber(`${field}[${i}]`, list[i], min, max, example);
  return list as readonly number[];
}

function optional(field: string, v: number | undefined, min: number, max: number, example: string): number | undefined {
  return v === undefined ? undefined : requireNumber(field, v, min, max, example, "mm");
}

/**
 * Finds tire and wheel combinations that fit the constraints, ranked best first.
 *
 * @example
 * const r = findFitments(
 *   { boltPattern: "6x5.5", minDiameterMm: 850, maxDiameterMm: 900, maxInnerSwingMm: 170, maxOuterSwingMm: 160 },
 *   { limit: 10 },
 * );
 * r.results[0]?.tire.text; // a size near 900 mm on a suitable wheel
 * r.evaluated;             // combinations evaluated
 */
export function findFitments(constraints: FitmentConstraints = {}, options: FinderOptions = {}): FinderResult {
  const c = constraints;
  const minD = optional("minDiameterMm", c.minDiameterMm, 300, 2000, "800");
  const maxD = optional("maxDiameterMm", c.maxDiameterMm, 300, 2000, "900");
  if (minD !== undefined && maxD !== undefined && minD > maxD) {
    throw new FitmentInputError("minDiameterMm", `minDiameterMm ${minD} is above maxDiameterMm ${maxD} (e.g. 800 and 900)`, minD);
  }
  const targetD = optional("targetDiameterMm", c.targetDiameterMm, 300, 2000, "880") ?? maxD ?? minD;
  const maxInner = optional("maxInnerSwingMm", c.maxInnerSwingMm, 0, 600, "170");
  const maxOuter = optional("maxOuterSwingMm", c.maxOuterSwingMm, 0, 600, "160");
  const maxSection = optional("maxSectionWidthMm", c.maxSectionWidthMm, 100, 700, "320");
  const spacer = c.spacerMm === undefined ? 0 : requireNumber("spacerMm", c.spacerMm, SPACER_LIMITS_MM.min, SPACER_LIMITS_MM.max, "25", "mm");
  const diameters = c.wheelDiametersIn === undefined ? undefined : numberList("wheelDiametersIn", c.wheelDiametersIn, 8, 30, "[17, 18]");
  const systems = c.systems;
  if (systems !== undefined && (!Array.isArray(systems) || systems.some((s) => s !== "metric" && s !== "flotation" && s !== "numeric"))) {
    throw new FitmentInputError("systems", `systems must list "metric", "flotation" or "numeric" (e.g. ["flotation"])`, systems);
  }
  const requireRim = c.requireSuitableRim !== false;
  const pattern = c.boltPattern === undefined ? null : toBoltPattern(c.boltPattern);

  const sizes = options.sizes ?? STANDARD_SIZES;
  if (!Array.isArray(sizes)) throw new FitmentInputError("sizes", "sizes must be a list of parsed tire sizes", sizes);
  const limit = options.limit === undefined ? 100 : requireInteger("limit", options.limit, 1, 10_000, "100");
  const wheels = options.wheels;
  let widths: readonly number[] = [];
  let offsets: readonly number[] = [];
  let wheelPatternOk: boolean[] = [];
  if (wheels !== undefined) {
    if (!Array.isArray(wheels) || wheels.length > 100_000) throw new FitmentInputError("wheels", "wheels must be a list of wheel offers", wheels);
    wheelPatternOk = wheels.map((w, i) => {
      requireNumber(`wheels[${i}].diameterIn`, w.diameterIn, 8, 30, "17", "in");
      const width = requireNumber(`wheels[${i}].widthIn`, w.widthIn, 3, 20, "9", "in");
      const lim = (width * MM_PER_IN) / 2 + OFFSET_MARGIN_MM;
      requireNumber(`wheels[${i}].offsetMm`, w.offsetMm, -lim, lim, "-12", "mm");
      return pattern === null || boltPatternsEquivalent(w.boltPattern, pattern);
    });
  } else {
    widths = options.wheelWidthsIn === undefined ? WIDTHS_HOT : numberList("wheelWidthsIn", options.wheelWidthsIn, 3, 20, "[8, 9]");
    offsets = options.offsetsMm === undefined ? OFFSETS_HOT : numberList("offsetsMm", options.offsetsMm, -250, 250, "[-12, 0, 18]");
    for (const w of widths) {
      const lim = (w * MM_PER_IN) / 2 + OFFSET_MARGIN_MM;
      for (const o of offsets) {
        if (Math.abs(o) > lim) {
          throw new FitmentInputError("offsetsMm", `offset ${o} mm is beyond ${OFFSET_MARGIN_MM} mm past the bead seat of a ${w} in wheel (e.g. -12)`, o);
        }
      }
    }
  }
  const perSize = wheels !== undefined ? wheels.length : widths.length * offsets.length;
  const total = sizes.length * perSize;
  const onProgress = options.onProgress;
  const signal = options.signal;
  const step = Math.max(1, Math.floor(total / 100));
  let nextReport = step;

  const top: Cand[] = [];
  let matched = 0;
  let evaluated = 0;
  let seq = 0;
  let aborted = false;

  const consider = (k1: number, k2: number, k3: number, size: number, width: number, offset: number, wheel: number): void => {
    matched++;
    const cand: Cand = { k1, k2, k3, k4: seq++, size, width, offset, wheel };
    if (top.length === limit) {
      const worst = top[top.length - 1] as Cand;
      if (!better(cand, worst)) return;
      top.pop();
    }
    let lo = 0;
    let hi = top.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (better(top[mid] as Cand, cand)) lo = mid + 1;
      else hi = mid;
    }
    top.splice(lo, 0, cand);
  };

  for (let si = 0; si < sizes.length; si++) {
    if (signal?.aborted) {
      aborted = true;
      break;
    }
    const t = sizes[si] as TireSize;
    const D = t.overallDiameterMm;
    const ok =
      (systems === undefined || systems.includes(t.system)) &&
      (minD === undefined || D >= minD) &&
      (maxD === undefined || D <= maxD) &&
      (diameters === undefined || diameters.includes(t.rimDiameterIn));
    if (ok) {
      const measuring = measuringRimWidthIn(t);
      const k1 = targetD === undefined ? -D : Math.abs(D - targetD);
      const s1 = t.sectionWidthMm;
      if (wheels === undefined) {
        for (let wi = 0; wi < widths.length; wi++) {
          const w = widths[wi] as number;
          if (requireRim && (w < measuring - RIM_WIDTH_TOLERANCE_IN || w > measuring + RIM_WIDTH_TOLERANCE_IN)) continue;
          const half = (s1 + SECTION_WIDTH_K * (w - measuring) * MM_PER_IN) / 2;
          if (maxSection !== undefined && 2 * half > maxSection) continue;
          const k2 = Math.abs(w - measuring);
          for (let oi = 0; oi < offsets.length; oi++) {
            const eff = (offsets[oi] as number) - spacer;
            const inner = eff + half;
            const outer = half - eff;
            if (maxInner !== undefined && inner > maxInner) continue;
            if (maxOuter !== undefined && outer > maxOuter) continue;
            const m1 = maxInner === undefined ? Infinity : maxInner - inner;
            const m2 = maxOuter === undefined ? Infinity : maxOuter - outer;
            const m = Math.min(m1, m2);
            consider(k1, k2, m === Infinity ? 0 : -m, si, wi, oi, -1);
          }
        }
      } else {
        for (let wi = 0; wi < wheels.length; wi++) {
          const wh = wheels[wi] as WheelOffer;
          if (!wheelPatternOk[wi] || wh.diameterIn !== t.rimDiameterIn) continue;
          const w = wh.widthIn;
          if (requireRim && (w < measuring - RIM_WIDTH_TOLERANCE_IN || w > measuring + RIM_WIDTH_TOLERANCE_IN)) continue;
          const half = (s1 + SECTION_WIDTH_K * (w - measuring) * MM_PER_IN) / 2;
          if (maxSection !== undefined && 2 * half > maxSection) continue;
          const eff = wh.offsetMm - spacer;
          const inner = eff + half;
          const outer = half - eff;
          if (maxInner !== undefined && inner > maxInner) continue;
          if (maxOuter !== undefined && outer > maxOuter) continue;
          const m = Math.min(maxInner === undefined ? Infinity : maxInner - inner, maxOuter === undefined ? Infinity : maxOuter - outer);
          consider(k1, Math.abs(w - measuring), m === Infinity ? 0 : -m, si, -1, -1, wi);
        }
      }
    }
    evaluated += perSize;
    if (onProgress !== undefined && evaluated >= nextReport && evaluated < total) {
      onProgress(evaluated, total);
      nextReport = evaluated + step;
    }
  }
  if (onProgress !== undefined && !aborted) onProgress(evaluated, total);

  const results: FitmentMatch[] = top.map((cand, i) => {
    const t = sizes[cand.size] as TireSize;
    const offer = cand.wheel >= 0 ? (wheels?.[cand.wheel] as WheelOffer) : undefined;
    const wheel: Wheel =
      offer !== undefined
        ? { diameterIn: offer.diameterIn, widthIn: offer.widthIn, offsetMm: offer.offsetMm }
        : { diameterIn: t.rimDiameterIn, widthIn: widths[cand.width] as number, offsetMm: offsets[cand.offset] as number };
    const measuring = measuringRimWidthIn(t);
    const section = t.sectionWidthMm + SECTION_WIDTH_K * (wheel.widthIn - measuring) * MM_PER_IN;
    const eff = wheel.offsetMm - spacer;
    return {
      tire: t,
      wheel,
      wheelId: offer?.id ?? null,
      boltPattern: offer !== undefined ? toBoltPattern(offer.boltPattern) : pattern,
      sectionWidthMm: section,
      overallDiameterMm: t.overallDiameterMm,
      effectiveOffsetMm: eff,
      innerSwingMm: eff + section / 2,
      outerSwingMm: section / 2 - eff,
      backspacingIn: wheel.widthIn / 2 + eff / MM_PER_IN,
      measuringRimWidthIn: measuring,
      rank: i + 1,
    };
  });
  return { results, evaluated, total, matched, aborted };
}
