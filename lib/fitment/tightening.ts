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
 *
 * Torque entry: a figure typed in ft·lb or N·m is read by {@link parseTorqueEntry}, which refuses
 * anything it would have to guess at (a range, a comma, the other unit's symbol) with a message
 * naming the field as the screen labels it. A unit switch converts the figure
 * ({@link switchTorqueUnit}) and keeps the exact N·m behind the rounded text it writes, so
 * switching back and forth never drifts. Conversions use 1 ft·lbf = 1.355818 N·m (NIST SP 811
 * (2008) B.9, through ./units).
 */
import { FitmentInputError, requireInteger, requireNumber } from "./errors";
import { ftLbToNm, nmToFtLb } from "./units";
import { commaRefusal, hasNumberComma } from "./commaEntry";

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
    throw new FitmentInputError(
      "torqueNm",
      "give exactly one of torqueNm or torqueFtLb (e.g. { boltCount: 24, torqueFtLb: 17 })",
      input.torqueNm,
    );
  }
  // One range in N·m whichever unit the figure came in, so a unit switch never turns an accepted
  // figure into a refused one (the old 1–1500 ft·lb let through 2033 N·m that N·m refused).
  const nm =
    input.torqueNm !== undefined
      ? requireTorqueNm(input.torqueNm, "nm", "torqueNm")
      : requireTorqueNm(typeof input.torqueFtLb === "number" ? torqueToNm(input.torqueFtLb, "ftlb") : Number.NaN, "ftlb", "torqueFtLb");
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
    passes.push({
      pass: passes.length + 1,
      kind: "check",
      fraction: 1,
      torqueNm: nm,
      torqueFtLb: nmToFtLb(nm),
      sequence: sequence.slice(),
    });
  }
  return {
    boltCount: sequence.length,
    torqueNm: nm,
    torqueFtLb: nmToFtLb(nm),
    startBolts: sequence.slice(0, Math.min(4, sequence.length)),
    passes,
  };
}

/** Units a torque figure can be typed in. */
export type TorqueUnit = "ftlb" | "nm";

/** How each torque unit is written on screen. */
export const TORQUE_UNIT_SYMBOL: Readonly<Record<TorqueUnit, string>> = Object.freeze({ ftlb: "ft·lb", nm: "N·m" });

/**
 * Accepted torque figures, in N·m whichever unit they are typed in (from a small ring bolt to a
 * heavy truck's wheel nut, with room on both sides).
 */
export const TORQUE_LIMITS_NM = Object.freeze({ min: 1, max: 2000 });

/**
 * A torque figure in the given unit to N·m (NIST SP 811 B.9: 1 ft·lbf = 1.355818 N·m).
 *
 * @example
 * torqueToNm(18, "ftlb"); // ≈ 24.4047
 * torqueToNm(24.4, "nm"); // 24.4
 */
export function torqueToNm(value: number, unit: TorqueUnit): number {
  return unit === "nm" ? value : ftLbToNm(value);
}

/**
 * N·m to a torque figure in the given unit (NIST SP 811 B.9).
 *
 * @example
 * torqueFromNm(24.404724, "ftlb"); // ≈ 18
 */
export function torqueFromNm(nm: number, unit: TorqueUnit): number {
  return unit === "nm" ? nm : nmToFtLb(nm);
}

/**
 * {@link TORQUE_LIMITS_NM} in the given unit, rounded inward to 0.1 so that every figure inside the
 * limits as written is accepted.
 *
 * @example
 * torqueLimitsIn("ftlb"); // { min: 0.8, max: 1475.1 }
 */
export function torqueLimitsIn(unit: TorqueUnit): { min: number; max: number } {
  return {
    min: Math.ceil(torqueFromNm(TORQUE_LIMITS_NM.min, unit) * 10 - 1e-9) / 10,
    max: Math.floor(torqueFromNm(TORQUE_LIMITS_NM.max, unit) * 10 + 1e-9) / 10,
  };
}

/**
 * A torque figure as a field shows it after a unit switch: rounded to 0.1, no thousands
 * separator (so it reads back as one number), no trailing ".0".
 *
 * @example
 * formatTorqueEntry(24.404724, "nm");   // "24.4"
 * formatTorqueEntry(24.404724, "ftlb"); // "18"
 */
export function formatTorqueEntry(nm: number, unit: TorqueUnit): string {
  return String(Math.round(torqueFromNm(nm, unit) * 10) / 10);
}

/**
 * Checks a torque in N·m against {@link TORQUE_LIMITS_NM}; the message names `field` and gives the
 * limits in the unit the figure was typed in.
 *
 * @example
 * requireTorqueNm(24.4, "nm", "Maker's torque (N·m)"); // 24.4
 * requireTorqueNm(6779, "ftlb", "Maker's torque (ft·lb)");
 * // throws "Maker's torque (ft·lb) must be between 0.8 and 1475.1 ft·lb (1 and 2000 N·m), got 5000 ft·lb …"
 */
export function requireTorqueNm(nm: number, unit: TorqueUnit, field: string): number {
  const sym = TORQUE_UNIT_SYMBOL[unit];
  const { min, max } = torqueLimitsIn(unit);
  const limits =
    unit === "nm" ? `${min} and ${max} N·m` : `${min} and ${max} ${sym} (${TORQUE_LIMITS_NM.min} and ${TORQUE_LIMITS_NM.max} N·m)`;
  const got = typeof nm === "number" && Number.isFinite(nm) ? `${formatTorqueEntry(nm, unit)} ${sym}` : String(nm);
  if (typeof nm !== "number" || !Number.isFinite(nm) || nm < TORQUE_LIMITS_NM.min || nm > TORQUE_LIMITS_NM.max) {
    throw new FitmentInputError(
      field,
      `${field} must be between ${limits}, got ${got} — check the maker's figure (e.g. ${unit === "nm" ? "24.4" : "18"})`,
      nm,
    );
  }
  return nm;
}

/** Unit words people write after a torque figure, squeezed (lower case, no spaces, dots, dashes or middle dots). */
const UNIT_WORDS: Record<string, TorqueUnit | "inlb" | "kgfm"> = {
  ftlb: "ftlb",
  ftlbs: "ftlb",
  ftlbf: "ftlb",
  lbft: "ftlb",
  lbsft: "ftlb",
  lbfft: "ftlb",
  footpound: "ftlb",
  footpounds: "ftlb",
  poundfeet: "ftlb",
  poundsfeet: "ftlb",
  poundfoot: "ftlb",
  nm: "nm",
  newtonmetre: "nm",
  newtonmetres: "nm",
  newtonmeter: "nm",
  newtonmeters: "nm",
  inlb: "inlb",
  inlbs: "inlb",
  inlbf: "inlb",
  lbin: "inlb",
  lbsin: "inlb",
  lbfin: "inlb",
  inchpound: "inlb",
  inchpounds: "inlb",
  kgfm: "kgfm",
  kgm: "kgfm",
  mkg: "kgfm",
  kpm: "kgfm",
};

/**
 * Reads a torque figure typed in a field labelled `field`, in `unit`; returns the figure in that
 * unit. A symbol of the chosen unit after the number is allowed ("18 ft-lb"). Refused, each with a
 * message that starts with `field`: an empty field, a range ("16-18": which end?), a comma ("18,5"
 * and "1,500": decimal mark or thousands?), a negative figure, another unit's symbol, and anything
 * else that is not one plain number.
 *
 * @example
 * parseTorqueEntry("18", "ftlb", "Maker's torque (ft·lb)");     // 18
 * parseTorqueEntry("24.4 Nm", "nm", "Maker's torque (N·m)");     // 24.4
 * parseTorqueEntry("16-18", "ftlb", "Maker's torque (ft·lb)");  // throws: "… is a range …"
 */
export function parseTorqueEntry(text: string, unit: TorqueUnit, field: string): number {
  const sym = TORQUE_UNIT_SYMBOL[unit];
  const example = unit === "nm" ? "24.4" : "18";
  const t = String(text)
    .trim()
    .replace(/\u2212/g, "-")
    .replace(/\s+/g, " ");
  const refuse = (why: string): never => {
    throw new FitmentInputError(field, `${field}: ${why}`, text);
  };
  const shown = JSON.stringify(t);
  if (t === "") refuse(`enter the maker's figure in ${sym} (e.g. ${example})`);
  if (/^[+-]?[\d.,]+\s*(-|–|—|to|~)\s*[\d.,]+/i.test(t)) {
    refuse(`${shown} is a range — enter the one figure to tighten to, from the maker's instructions (e.g. ${example})`);
  }
  if (/^-/.test(t)) refuse(`${shown}: a torque cannot be negative (e.g. ${example})`);
  if (hasNumberComma(t)) refuse(commaRefusal(shown, example === "18" ? "17.5" : "24.4"));
  const m = /^\+?(\d+(?:\.\d*)?|\.\d+)\s*([^\d]*)$/.exec(t);
  if (!m) refuse(`${shown} is not a number — enter the maker's figure like ${example}`);
  const [, num, rawUnit] = m as RegExpExecArray;
  const word = (rawUnit ?? "").toLowerCase().replace(/[\s.·⋅•\-_*×]/g, "");
  if (word !== "") {
    const named = UNIT_WORDS[word];
    if (named === undefined) refuse(`${shown} is not a number — enter the maker's figure like ${example}`);
    if (named === "inlb")
      refuse(`${shown} is in inch-pounds; this field takes ${sym} (12 in·lb = 1 ft·lb) — convert it or choose the unit the maker uses`);
    if (named === "kgfm")
      refuse(`${shown} is in kgf·m; this field takes ${sym} (1 kgf·m = 9.80665 N·m) — convert it or choose the unit the maker uses`);
    if (named !== unit) {
      refuse(
        `${shown} is in ${TORQUE_UNIT_SYMBOL[named as TorqueUnit]} but the chosen unit is ${sym} — choose ${TORQUE_UNIT_SYMBOL[named as TorqueUnit]} above, or enter the figure in ${sym}`,
      );
    }
  }
  return Number(num);
}

/**
 * A torque field's state: the text shown, its unit, and — after a unit switch — the exact N·m the
 * switch converted, which stands behind `text` for as long as the text is the one the switch wrote.
 */
export interface TorqueEntry {
  text: string;
  unit: TorqueUnit;
  exact: { nm: number; text: string } | null;
}

/**
 * The torque a field stands for, in N·m: the exact value behind a converted text, otherwise the text
 * read in the field's unit. `null` for an empty field; throws like {@link parseTorqueEntry}.
 *
 * @example
 * torqueEntryNm({ text: "18", unit: "ftlb", exact: null }, "Maker's torque (ft·lb)"); // ≈ 24.4047
 */
export function torqueEntryNm(entry: TorqueEntry, field: string): number | null {
  if (entry.text.trim() === "") return null;
  if (entry.exact && entry.exact.text === entry.text) return entry.exact.nm;
  return torqueToNm(parseTorqueEntry(entry.text, entry.unit, field), entry.unit);
}

/**
 * Switches a torque field to another unit, converting its figure (NIST SP 811 B.9) and keeping the
 * exact N·m behind the rounded text, so 18 ft·lb → 24.4 N·m → 18 ft·lb, not 17.99. An empty field
 * just changes unit; a field that cannot be read throws (named by `field`, its label before the
 * switch) rather than have its text relabelled in a unit it was not typed in.
 *
 * @example
 * const e = switchTorqueUnit({ text: "18", unit: "ftlb", exact: null }, "nm", "Maker's torque (ft·lb)");
 * e.text; // "24.4"
 * switchTorqueUnit(e, "ftlb", "Maker's torque (N·m)").text; // "18"
 */
export function switchTorqueUnit(entry: TorqueEntry, to: TorqueUnit, field: string): TorqueEntry {
  if (to === entry.unit) return entry;
  const nm = torqueEntryNm(entry, field);
  if (nm === null) return { text: entry.text, unit: to, exact: null };
  const text = formatTorqueEntry(nm, to);
  return { text, unit: to, exact: { nm, text } };
}
