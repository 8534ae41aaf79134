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
 * Goals narrow the space silently (diameter range, wheel diameters, designation systems, rim
 * width suited to the section, section width, bolt pattern). **Limits** exclude a combination and
 * say so: the inner and outer swing limits, and every measured clearance point, predicted by
 * `predictPreparedMm` from clearance.ts — the same code the vehicle page's predictions run — and
 * kept at the margin. For every tire size the limits remove entirely, the result carries its
 * nearest miss (the combination short by the least) with the limit that decided it (the one
 * short by the most) and how many limits it fails.
 *
 * Ranking (lexicographic): 1. closeness of the overall diameter to the target (default: the
 * maximum diameter, else the minimum, else larger first); 2. rim width closest to the measuring
 * rim; 3. the larger of the smallest remaining margins (swing limits and measured points);
 * 4. enumeration order. Excluded sizes rank by 1, then their nearest miss's rim (2), shortfall, order.
 */
import { type BoltPattern, boltPatternsEquivalent, toBoltPattern } from "./boltPattern";
import {
  type ClearanceBasis,
  type ClearanceDirection,
  type ClearanceEnvelope,
  type MeasuredClearance,
  type PreparedClearance,
  type SuspensionState,
  CLEARANCE_MARGIN_LIMITS_MM,
  DEFAULT_CLEARANCE_MARGIN_MM,
  classifyClearance,
  predictPreparedMm,
  prepareClearance,
} from "./clearance";
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
  /** Measured gaps on the vehicle: a combination must keep the margin at every one (clearance.ts). */
  clearancePoints?: readonly MeasuredClearance[];
  /** Margin kept at the measured points, mm (default 12.7 = 1/2 in). */
  clearanceMarginMm?: number;
  /** Steering axis at the wheel centre, mm inboard of the hub face, for full-lock points (see clearance.ts). */
  steeringAxisInboardMm?: number;
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
  /** Most excluded sizes returned, best-ranked first (0–10 000, default 50). */
  excludedLimit?: number;
  /** Called with combinations done so far and the total, about every 1 % and at the end. */
  onProgress?: (done: number, total: number) => void;
  /** Stop early when `aborted` turns true (e.g. an AbortSignal). */
  signal?: { readonly aborted: boolean };
}

/** A combination of the search, found or excluded. */
export interface FitmentCandidate {
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
  /** 1-based rank (among the results, or among the exclusions). */
  rank: number;
}

/** One fitment found. */
export interface FitmentMatch extends FitmentCandidate {
  /** The measured point with the least predicted gap (null without points). */
  tightestClearance: { pointIndex: number; label: string | null; predictedMm: number } | null;
}

/** The limit that decided an exclusion: the one short by the most. */
export type ExclusionReason =
  | {
      kind: "inner-swing" | "outer-swing";
      limitMm: number;
      valueMm: number;
      /** How far past the limit, mm. */
      shortfallMm: number;
    }
  | {
      kind: "clearance";
      pointIndex: number;
      label: string | null;
      direction: ClearanceDirection;
      state: SuspensionState;
      basis: ClearanceBasis;
      predictedMm: number;
      marginMm: number;
      status: "tight" | "contact";
      /** Room to gain to get back to the margin, mm. */
      shortfallMm: number;
    };

/** A tire size within the goals that the limits remove entirely: its nearest miss. */
export interface FitmentExclusion extends FitmentCandidate {
  reason: ExclusionReason;
  /** How many limits it fails (the reason is the worst). */
  limitsFailed: number;
}

/** Result of {@link findFitments}. */
export interface FinderResult {
  results: FitmentMatch[];
  /** Combinations evaluated (equals `total` unless aborted). */
  evaluated: number;
  total: number;
  /** Combinations that met every constraint (before `limit`). */
  matched: number;
  /** Sizes within the goals with no combination inside the limits, each by its nearest miss (up to `excludedLimit`). */
  excluded: FitmentExclusion[];
  /** How many sizes that is (before `excludedLimit`). */
  excludedSizes: number;
  /** Combinations within the goals that a limit excluded. */
  excludedCount: number;
  aborted: boolean;
}

/** Default wheel widths, inches. */
export const DEFAULT_WHEEL_WIDTHS_IN: readonly number[] = Object.freeze(Array.from({ length: 14 }, (_, i) => 6 + i * 0.5));
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

/** Scratch result of {@link Limits.assess}, reused across combinations (no allocation in the loop). */
interface Verdict {
  failed: number;
  /** Largest shortfall among failed limits, or −(least remaining margin) when none failed. */
  worst: number;
  /** 1 inner swing, 2 outer swing, 3 a point; 0 none. */
  kind: number;
  point: number;
  gap: number;
  /** Least predicted gap over the points and its index (−1 without points). */
  tightGap: number;
  tight: number;
}

/** The limits of a search, checked the same way in the loop and for the returned records. */
class Limits {
  readonly env: ClearanceEnvelope = { radiusMm: 0, innerSwingMm: 0, outerSwingMm: 0 };
  readonly v: Verdict = { failed: 0, worst: 0, kind: 0, point: -1, gap: 0, tightGap: 0, tight: -1 };
  constructor(
    readonly maxInner: number | undefined,
    readonly maxOuter: number | undefined,
    readonly points: readonly PreparedClearance[],
    readonly margin: number,
  ) {}

  assess(radius: number, inner: number, outer: number): Verdict {
    const v = this.v;
    v.failed = 0;
    v.worst = -Infinity;
    v.kind = 0;
    v.point = -1;
    v.tight = -1;
    v.tightGap = Infinity;
    let room = Infinity;
    if (this.maxInner !== undefined) {
      const over = inner - this.maxInner;
      if (over > 0) this.fail(over, 1, -1, 0);
      else room = Math.min(room, -over);
    }
    if (this.maxOuter !== undefined) {
      const over = outer - this.maxOuter;
      if (over > 0) this.fail(over, 2, -1, 0);
      else room = Math.min(room, -over);
    }
    const pts = this.points;
    if (pts.length > 0) {
      const env = this.env;
      env.radiusMm = radius;
      env.innerSwingMm = inner;
      env.outerSwingMm = outer;
      for (let j = 0; j < pts.length; j++) {
        const gap = predictPreparedMm(pts[j] as PreparedClearance, env);
        if (gap < v.tightGap) {
          v.tightGap = gap;
          v.tight = j;
        }
        // The vehicle page's own classing: contact at ≤ 0, tight below the margin.
        if (gap <= 0 || gap < this.margin) this.fail(this.margin - gap, 3, j, gap);
        else room = Math.min(room, gap - this.margin);
      }
    }
    if (v.failed === 0) v.worst = room === Infinity ? 0 : -room;
    return v;
  }

  private fail(short: number, kind: number, point: number, gap: number): void {
    const v = this.v;
    v.failed++;
    if (short > v.worst) {
      v.worst = short;
      v.kind = kind;
      v.point = point;
      v.gap = gap;
    }
  }

  reason(v: Verdict, inner: number, outer: number): ExclusionReason {
    if (v.kind === 3) {
      const p = this.points[v.point] as PreparedClearance;
      const status = classifyClearance(v.gap, this.margin);
      return {
        kind: "clearance",
        pointIndex: v.point,
        label: p.label,
        direction: p.direction,
        state: p.state,
        basis: p.basis,
        predictedMm: v.gap,
        marginMm: this.margin,
        status: status === "contact" ? "contact" : "tight",
        shortfallMm: Math.max(0, this.margin - v.gap),
      };
    }
    const innerKind = v.kind === 1;
    const limitMm = (innerKind ? this.maxInner : this.maxOuter) as number;
    const valueMm = innerKind ? inner : outer;
    return { kind: innerKind ? "inner-swing" : "outer-swing", limitMm, valueMm, shortfallMm: valueMm - limitMm };
  }
}

function ahead(k1: number, k2: number, k3: number, k4: number, b: Cand): boolean {
  if (Math.abs(k1 - b.k1) > 1e-6) return k1 < b.k1;
  if (k2 !== b.k2) return k2 < b.k2;
  if (Math.abs(k3 - b.k3) > 1e-6) return k3 < b.k3;
  return k4 < b.k4;
}

const better = (a: Cand, b: Cand): boolean => ahead(a.k1, a.k2, a.k3, a.k4, b);

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
  const spacer =
    c.spacerMm === undefined ? 0 : requireNumber("spacerMm", c.spacerMm, SPACER_LIMITS_MM.min, SPACER_LIMITS_MM.max, "25", "mm");
  const diameters = c.wheelDiametersIn === undefined ? undefined : numberList("wheelDiametersIn", c.wheelDiametersIn, 8, 30, "[17, 18]");
  const systems = c.systems;
  if (systems !== undefined && (!Array.isArray(systems) || systems.some((s) => s !== "metric" && s !== "flotation" && s !== "numeric"))) {
    throw new FitmentInputError("systems", `systems must list "metric", "flotation" or "numeric" (e.g. ["flotation"])`, systems);
  }
  const requireRim = c.requireSuitableRim !== false;
  const pattern = c.boltPattern === undefined ? null : toBoltPattern(c.boltPattern);
  const margin =
    c.clearanceMarginMm === undefined
      ? DEFAULT_CLEARANCE_MARGIN_MM
      : requireNumber(
          "clearanceMarginMm",
          c.clearanceMarginMm,
          CLEARANCE_MARGIN_LIMITS_MM.min,
          CLEARANCE_MARGIN_LIMITS_MM.max,
          "12.7",
          "mm",
        );
  const rawPoints = c.clearancePoints ?? [];
  if (!Array.isArray(rawPoints) || rawPoints.length > 500) {
    throw new FitmentInputError("clearancePoints", "clearancePoints must be a list of at most 500 measured clearances", rawPoints);
  }
  const axis = c.steeringAxisInboardMm === undefined ? {} : { steeringAxisInboardMm: c.steeringAxisInboardMm };
  const limits = new Limits(
    maxInner,
    maxOuter,
    rawPoints.map((pt, i) => prepareClearance(pt, axis, `clearancePoints[${i}]`)),
    margin,
  );

  const sizes = options.sizes ?? STANDARD_SIZES;
  if (!Array.isArray(sizes)) throw new FitmentInputError("sizes", "sizes must be a list of parsed tire sizes", sizes);
  const limit = options.limit === undefined ? 100 : requireInteger("limit", options.limit, 1, 10_000, "100");
  const excludedLimit = options.excludedLimit === undefined ? 50 : requireInteger("excludedLimit", options.excludedLimit, 0, 10_000, "50");
  const wheels = options.wheels;
  let widths: readonly number[] = [];
  let offsets: readonly number[] = [];
  let wheelPatternOk: boolean[] = [];
  if (wheels !== undefined) {
    if (!Array.isArray(wheels) || wheels.length > 100_000)
      throw new FitmentInputError("wheels", "wheels must be a list of wheel offers", wheels);
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
          throw new FitmentInputError(
            "offsetsMm",
            `offset ${o} mm is beyond ${OFFSET_MARGIN_MM} mm past the bead seat of a ${w} in wheel (e.g. -12)`,
            o,
          );
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
  const out: Cand[] = [];
  let matched = 0;
  let excludedCount = 0;
  let excludedSizes = 0;
  // The size being searched: did any combination fit, and its nearest miss so far.
  let sizeFits = false;
  let miss: Cand | null = null;
  let evaluated = 0;
  let seq = 0;
  let aborted = false;

  const keep = (
    list: Cand[],
    max: number,
    k1: number,
    k2: number,
    k3: number,
    k4: number,
    size: number,
    width: number,
    offset: number,
    wheel: number,
  ): void => {
    if (max === 0) return;
    if (list.length === max) {
      if (!ahead(k1, k2, k3, k4, list[list.length - 1] as Cand)) return;
      list.pop();
    }
    const cand: Cand = { k1, k2, k3, k4, size, width, offset, wheel };
    let lo = 0;
    let hi = list.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (better(list[mid] as Cand, cand)) lo = mid + 1;
      else hi = mid;
    }
    list.splice(lo, 0, cand);
  };
  // One combination within the goals: the limits decide whether it is a result or an exclusion.
  const consider = (
    k1: number,
    k2: number,
    radius: number,
    inner: number,
    outer: number,
    size: number,
    width: number,
    offset: number,
    wheel: number,
  ): void => {
    const v = limits.assess(radius, inner, outer);
    const k4 = seq++;
    if (v.failed === 0) {
      matched++;
      sizeFits = true;
      keep(top, limit, k1, k2, v.worst, k4, size, width, offset, wheel);
    } else {
      excludedCount++;
      // Nearest miss of the size: least shortfall, then rim closest to the measuring rim, then order.
      if (!sizeFits && (miss === null || v.worst < miss.k3 - 1e-6 || (Math.abs(v.worst - miss.k3) <= 1e-6 && k2 < miss.k2))) {
        miss = { k1, k2, k3: v.worst, k4, size, width, offset, wheel };
      }
    }
  };

  for (let si = 0; si < sizes.length; si++) {
    if (signal?.aborted) {
      aborted = true;
      break;
    }
    const t = sizes[si] as TireSize;
    const D = t.overallDiameterMm;
    const R = D / 2;
    sizeFits = false;
    miss = null;
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
            consider(k1, k2, R, eff + half, half - eff, si, wi, oi, -1);
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
          consider(k1, Math.abs(w - measuring), R, eff + half, half - eff, si, -1, -1, wi);
        }
      }
    }
    if (!sizeFits && miss !== null) {
      const m: Cand = miss;
      excludedSizes++;
      keep(out, excludedLimit, m.k1, m.k2, m.k3, m.k4, m.size, m.width, m.offset, m.wheel);
    }
    evaluated += perSize;
    if (onProgress !== undefined && evaluated >= nextReport && evaluated < total) {
      onProgress(evaluated, total);
      nextReport = evaluated + step;
    }
  }
  if (onProgress !== undefined && !aborted) onProgress(evaluated, total);

  const candidate = (cand: Cand, i: number): FitmentCandidate => {
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
  };
  // The records re-run the same limits on the same figures as the loop did.
  const results: FitmentMatch[] = top.map((cand, i) => {
    const m = candidate(cand, i);
    const v = limits.assess(m.overallDiameterMm / 2, m.innerSwingMm, m.outerSwingMm);
    const p = v.tight >= 0 ? (limits.points[v.tight] as PreparedClearance) : null;
    return { ...m, tightestClearance: p === null ? null : { pointIndex: v.tight, label: p.label, predictedMm: v.tightGap } };
  });
  const excluded: FitmentExclusion[] = out.map((cand, i) => {
    const m = candidate(cand, i);
    const v = limits.assess(m.overallDiameterMm / 2, m.innerSwingMm, m.outerSwingMm);
    return { ...m, reason: limits.reason(v, m.innerSwingMm, m.outerSwingMm), limitsFailed: v.failed };
  });
  return { results, evaluated, total, matched, excluded, excludedCount, excludedSizes, aborted };
}
