/**
 * Tightening order (crisscross) and staged torque plans for lug patterns and beadlock rings.
 *
 * Numbering: bolt 1 is the first bolt clockwise from the valve stem, then 2, 3 … clockwise.
 * Order (common practice, no source): start at bolt 1; each bolt is followed by the untightened
 * bolt most opposite it; the next starting bolt is the untightened one farthest from every bolt
 * tightened so far (ties: farthest from the last bolt, then lowest number). With 4 or more bolts
 * the first four therefore sit one per quadrant before any neighbour is touched (for counts that
 * are a multiple of 4 exactly at 0°, 180°, 90°, 270°). For 5 bolts this gives the star 1-3-5-2-4,
 * for 8 bolts 1-5-3-7-2-6-4-8.
 *
 * Torque plan (common practice, no source): start one bolt in each quadrant by hand, then passes
 * at 30 %, 60 % and 100 % of the manufacturer's figure in the crisscross order, then a final check
 * pass at 100 %. Beadlock ring bolts are commonly torqued to 16–18 ft·lb (≈ 21.7–24.4 N·m) this
 * way (common practice, no source) — always use the ring maker's figure.
 */
import { FitmentInputError, requireInteger, requireNumber } from "./errors";
import { ftLbToNm, nmToFtLb } from "./units";

/** Accepted bolt counts. */
export const BOLT_COUNT_LIMITS = { min: 3, max: 64 } as const;
/** Default pass fractions of the final torque. */
export const DEFAULT_TORQUE_STAGES: readonly number[] = Object.freeze([0.3, 0.6, 1.0]);

/**
 * Crisscross tightening order, 1-based, numbered clockwise from the valve stem.
 *
 * @example
 * tighteningSequence(5); // [1, 3, 5, 2, 4]
 * tighteningSequence(8); // [1, 5, 3, 7, 2, 6, 4, 8]
 */
export function tighteningSequence(boltCount: number): number[] {
  const n = requireInteger("boltCount", boltCount, BOLT_COUNT_LIMITS.min, BOLT_COUNT_LIMITS.max, "8");
  const done = new Array<boolean>(n).fill(false);
  const order: number[] = [0];
  done[0] = true;
  const dist = (a: number, b: number): number => {
    const d = Math.abs(a - b) % n;
    return Math.min(d, n - d);
  };
  let expectOpposite = true;
  while (order.length < n) {
    const last = order[order.length - 1] as number;
    let pick = -1;
    if (expectOpposite) {
      // untightened bolt nearest the point diametrically opposite `last`
      let best = Infinity;
      for (let i = 0; i < n; i++) {
        if (done[i]) continue;
        const target = (last + n / 2) % n;
        const d0 = Math.abs(i - target);
        const d = Math.min(d0, n - d0);
        if (d < best - 1e-9) {
          best = d;
          pick = i;
        }
      }
    } else {
      let bestMin = -1;
      let bestLast = -1;
      for (let i = 0; i < n; i++) {
        if (done[i]) continue;
        let m = Infinity;
        for (const j of order) m = Math.min(m, dist(i, j));
        const dl = dist(i, last);
        if (m > bestMin || (m === bestMin && dl > bestLast)) {
          bestMin = m;
          bestLast = dl;
          pick = i;
        }
      }
    }
    order.push(pick);
    done[pick] = true;
    expectOpposite = !expectOpposite;
  }
  return order.map((i) => i + 1);
}

/** One pass of a torque plan. */
export interface TorquePass {
  /** 1-based pass number. */
  pass: number;
  /** "stage" passes raise torque; the "check" pass re-checks every bolt at full torque. */
  kind: "stage" | "check";
  fraction: number;
  torqueNm: number;
  torqueFtLb: number;
  sequence: number[];
}

/** Result of {@link torquePlan}. */
export interface TorquePlan {
  boltCount: number;
  torqueNm: number;
  torqueFtLb: number;
  /** Bolts to start by hand first, one per quadrant (bolt 1 … clockwise). */
  startBolts: number[];
  passes: TorquePass[];
}

/**
 * Staged torque plan from the manufacturer's figure: hand-start one bolt per quadrant, passes
 * at the given fractions (default 30 %, 60 %, 100 %) in crisscross order, then a check pass.
 * Give the figure in N·m (`torqueNm`) or ft·lb (`torqueFtLb`).
 *
 * @example
 * const p = torquePlan({ boltCount: 24, torqueFtLb: 17 });
 * p.passes.map((x) => x.torqueNm.toFixed(1)); // ["6.9", "13.8", "23.0", "23.0"]
 */
export function torquePlan(input: {
  boltCount: number;
  torqueNm?: number;
  torqueFtLb?: number;
  stages?: readonly number[];
  finalCheck?: boolean;
}): TorquePlan {
  if ((input.torqueNm === undefined) === (input.torqueFtLb === undefined)) {
    throw new FitmentInputError("torqueNm", "give exactly one of torqueNm or torqueFtLb (e.g. { boltCount: 24, torqueFtLb: 17 })", input.torqueNm);
  }
  const nm =
    input.torqueNm !== undefined
      ? requireNumber("torqueNm", input.torqueNm, 1, 2000, "23", "N·m")
      : ftLbToNm(requireNumber("torqueFtLb", input.torqueFtLb, 1, 1500, "17", "ft·lb"));
  const sequence = tighteningSequence(input.boltCount);
  const stages = input.stages ?? DEFAULT_TORQUE_STAGES;
  if (!Array.isArray(stages) || stages.length === 0 || stages.length > 10) {
    throw new FitmentInputError("stages", "stages must list 1–10 fractions of the final torque, rising to 1 (e.g. [0.3, 0.6, 1])", stages);
  }
  let prev = 0;
  stages.forEach((f, i) => {
    requireNumber(`stages[${i}]`, f, 0.05, 1, "0.6");
    if (f <= prev) throw new FitmentInputError(`stages[${i}]`, `stages must rise: ${f} after ${prev} (e.g. [0.3, 0.6, 1])`, f);
    prev = f;
  });
  if (prev !== 1) throw new FitmentInputError("stages", `the last stage must be 1 (full torque), got ${prev} (e.g. [0.3, 0.6, 1])`, stages);
  const passes: TorquePass[] = stages.map((f, i) => ({
    pass: i + 1,
    kind: "stage",
    fraction: f,
    torqueNm: nm * f,
    torqueFtLb: nmToFtLb(nm * f),
    sequence: sequence.slice(),
  }));
  if (input.finalCheck !== false) {
    passes.push({ pass: passes.length + 1, kind: "check", fraction: 1, torqueNm: nm, torqueFtLb: nmToFtLb(nm), sequence: sequence.slice() });
  }
  return {
    boltCount: sequence.length,
    torqueNm: nm,
    torqueFtLb: nmToFtLb(nm),
    startBolts: sequence.slice(0, Math.min(4, sequence.length)),
    passes,
  };
}
