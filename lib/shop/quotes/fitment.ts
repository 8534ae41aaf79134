/**
 * The counter's reading of the engine's comparison: every number comes from
 * `compareSetups` / `setupGeometry` in lib/fitment; this module only decides which of those
 * numbers deserve a caution and how picks are ranked. Pure.
 *
 * Thresholds (common practice, no source — a shop's rule of thumb, shown as such):
 * - poke: tire reaching more than 25 mm further outboard → check fender clearance;
 * - inner clearance: more than 10 mm closer inboard → check control arms, frame, sway bar at full lock;
 * - height: more than 50 mm (about 2 in) taller → a lift or levelling is usually needed;
 * - alignment: diameter change of 25.4 mm (1 in) or more, or the wheel plane moving 12.7 mm
 *   (1/2 in) or more per side;
 * - regear: suggested when the effective axle ratio falls by 5 % or more.
 */
import { FitmentInputError, compareSetups, mmToIn, parseTireSize, setupGeometry, type SetupComparison, type SetupGeometry } from "@/lib/fitment";
import { checkWheelOnHub, hubRefusal } from "./hubFit";

export const THRESHOLDS = Object.freeze({
  pokeMm: 25,
  innerLossMm: 10,
  heightGainMm: 50,
  alignmentDiameterMm: 25.4,
  alignmentShiftMm: 12.7,
  regearDropFraction: 0.05,
});

export interface CurrentSetup {
  boltPattern: string;
  tireSize: string;
  wheel: { diameterIn: number; widthIn: number; offsetMm: number };
  axleRatio?: number | null;
  /** The hub's pilot diameter, when known: wheels with a smaller bore are left out. */
  hubBoreMm?: number | null;
}

export interface WheelCandidate {
  id: string;
  diameterIn: number;
  widthIn: number;
  offsetMm: number;
  boltPattern: string;
  beadlock: boolean;
  centerBoreMm?: number | null;
}

export interface TireCandidate {
  id: string;
  size: string;
}

export interface FitmentSummary {
  current: { tire: string; wheel: string; overallDiameterMm: number };
  planned: { tire: string; wheel: string; overallDiameterMm: number; beadlock: boolean; rimWidthSuitable: boolean };
  diameterChangeMm: number;
  groundClearanceChangeMm: number;
  outerPokeChangeMm: number;
  innerClearanceChangeMm: number;
  trackWidthChangeMm: number;
  scrubRadiusChangeMm: number;
  /** Road speed at 60 mph indicated, speedometer calibrated on the current tire. */
  actualMphAt60: number;
  regear: { axleRatio: number; effectiveRatio: number; suggestedRatio: number } | null;
  alignmentSuggested: boolean;
  /** Things that must or may need to change on the vehicle. */
  modifications: string[];
  /** Clearance warnings (the count ranks the picks). */
  warnings: string[];
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const inches = (mm: number) => `${r1(mmToIn(Math.abs(mm)))} in`;
const wheelText = (w: { diameterIn: number; widthIn: number; offsetMm: number }) => `${w.diameterIn}x${w.widthIn} ${w.offsetMm >= 0 ? "+" : ""}${r1(w.offsetMm)} mm`;

/** Summary of the planned tire on the planned wheel against the current setup. */
export function summarize(current: CurrentSetup, tire: string, wheel: Omit<WheelCandidate, "id" | "boltPattern"> & { boltPattern?: string }): FitmentSummary {
  const cur = setupGeometry({ tire: current.tireSize, wheel: current.wheel });
  const plan = setupGeometry({ tire, wheel: { diameterIn: wheel.diameterIn, widthIn: wheel.widthIn, offsetMm: wheel.offsetMm } });
  const axle = current.axleRatio ?? undefined;
  const cmp = compareSetups(cur, plan, axle ? { axleRatio: axle } : {});
  return fromComparison(cmp, cur, plan, wheel.beadlock, axle !== undefined);
}

function fromComparison(cmp: SetupComparison, cur: SetupGeometry, plan: SetupGeometry, beadlock: boolean, axleGiven: boolean): FitmentSummary {
  const warnings: string[] = [];
  const modifications: string[] = [];
  if (cmp.outerPokeChangeMm > THRESHOLDS.pokeMm) {
    warnings.push(`Reaches ${Math.round(cmp.outerPokeChangeMm)} mm (${inches(cmp.outerPokeChangeMm)}) further outboard: check fender clearance.`);
    modifications.push("Fender trimming or flares may be needed for the extra poke.");
  }
  if (cmp.innerClearanceChangeMm < -THRESHOLDS.innerLossMm) {
    warnings.push(`${Math.round(-cmp.innerClearanceChangeMm)} mm closer inboard: check control arms, frame and sway bar at full lock.`);
  }
  if (!plan.rimWidthSuitable) {
    warnings.push(`Rim width ${plan.wheel.widthIn} in is outside ${plan.rimWidthMinIn}–${plan.rimWidthMaxIn} in suited to ${plan.tire.text}.`);
  }
  if (cmp.diameterChangeMm > THRESHOLDS.heightGainMm) {
    warnings.push(`${Math.round(cmp.diameterChangeMm)} mm (${inches(cmp.diameterChangeMm)}) taller: check clearance at full lock and full compression.`);
    modifications.push("A lift or levelling kit is usually needed for this much extra diameter; follow the lift maker's instructions.");
  }
  const g = cmp.gearing;
  const drop = 1 - g.effectiveRatio / g.axleRatio;
  const regear = drop >= THRESHOLDS.regearDropFraction ? { axleRatio: g.axleRatio, effectiveRatio: g.effectiveRatio, suggestedRatio: g.suggestedRatio } : null;
  if (regear) modifications.push(`Regear from ${g.axleRatio.toFixed(2)} to about ${g.suggestedRatio.toFixed(2)} to restore the effective ratio${axleGiven ? "" : " (assuming a 3.73 axle; enter the vehicle's ratio)"}.`);
  if (Math.abs(cmp.speedometer.ratio - 1) >= 0.03) modifications.push("Recalibrate the speedometer.");
  const alignmentSuggested = Math.abs(cmp.diameterChangeMm) >= THRESHOLDS.alignmentDiameterMm || Math.abs(cmp.trackWidthChangeMm / 2) >= THRESHOLDS.alignmentShiftMm;
  if (alignmentSuggested) modifications.push("Wheel alignment after fitting.");
  const at60 = cmp.speedometer.rows.find((r) => r.indicatedMph === 60)?.actualMph ?? 60 * cmp.speedometer.ratio;
  return {
    current: { tire: cur.tire.text, wheel: wheelText(cur.wheel), overallDiameterMm: cur.overallDiameterMm },
    planned: { tire: plan.tire.text, wheel: wheelText(plan.wheel), overallDiameterMm: plan.overallDiameterMm, beadlock, rimWidthSuitable: plan.rimWidthSuitable },
    diameterChangeMm: cmp.diameterChangeMm,
    groundClearanceChangeMm: cmp.groundClearanceChangeMm,
    outerPokeChangeMm: cmp.outerPokeChangeMm,
    innerClearanceChangeMm: cmp.innerClearanceChangeMm,
    trackWidthChangeMm: cmp.trackWidthChangeMm,
    scrubRadiusChangeMm: cmp.scrubRadiusChangeMm,
    actualMphAt60: at60,
    regear,
    alignmentSuggested,
    modifications,
    warnings,
  };
}

const signed = (x: number, d = 0) => `${x > 0 ? "+" : x < 0 ? "−" : "±"}${Math.abs(x).toFixed(d)}`;
const mmIn = (mm: number) => `${signed(mm)} mm (${signed(mmToIn(mm), 1)} in)`;

/**
 * The summary's changes as label/value rows, shared by the quote page and the PDF (which turns
 * the typographic signs into plain ones for its standard font).
 * @example fitmentChangeRows(summarize(current, "315/70R17", wheel))[0]; // ["Overall diameter", "+70 mm (+2.8 in)"] from 265/70R17
 */
export function fitmentChangeRows(fit: FitmentSummary): [string, string][] {
  const rows: [string, string][] = [
    ["Overall diameter", mmIn(fit.diameterChangeMm)],
    ["Ground clearance under the axle", mmIn(fit.groundClearanceChangeMm)],
    ["Poke (outer edge of the tire)", mmIn(fit.outerPokeChangeMm)],
    ["Room inboard", mmIn(fit.innerClearanceChangeMm)],
    ["Track width", mmIn(fit.trackWidthChangeMm)],
    ["At 60 mph indicated", `${fit.actualMphAt60.toFixed(1)} mph actual`],
  ];
  if (fit.regear) rows.push(["Effective axle ratio", `${fit.regear.axleRatio.toFixed(2)} → ${fit.regear.effectiveRatio.toFixed(2)}; regear to about ${fit.regear.suggestedRatio.toFixed(2)}`]);
  return rows;
}

export interface Pick {
  tireId: string;
  wheelId: string;
  summary: FitmentSummary;
}

/**
 * Every tire × wheel pair that mounts (wheel bolt pattern equivalent to the vehicle's, centre
 * bore not smaller than a known hub — lib/shop/quotes/hubFit.ts —, wheel diameter equal to the
 * tire's rim), compared with the current setup and ranked: fewest warnings first, then the
 * larger diameter gain, then the smaller change in poke. A wheel that needs hub-centric rings
 * says so among its modifications.
 */
export function rankPicks(current: CurrentSetup, tires: readonly TireCandidate[], wheels: readonly WheelCandidate[], limit = 30): { picks: Pick[]; wheelsFitting: number; pairs: number } {
  const cur = setupGeometry({ tire: current.tireSize, wheel: current.wheel });
  const axle = current.axleRatio ?? undefined;
  const hub = (w: WheelCandidate) => checkWheelOnHub({ boltPattern: current.boltPattern, hubBoreMm: current.hubBoreMm ?? null }, { boltPattern: w.boltPattern, centerBoreMm: w.centerBoreMm ?? null });
  const fitting = wheels.filter((w) => {
    const f = hub(w);
    // An unreadable drilling is a caution in the check; here only a known match is offered.
    return hubRefusal(f) === null && f.some((x) => x.code === "bolt-pattern-matches");
  });
  const parsed = tires.flatMap((t) => {
    try {
      return [{ t, size: parseTireSize(t.size) }];
    } catch {
      return [];
    }
  });
  const picks: Pick[] = [];
  for (const w of fitting) {
    for (const { t, size } of parsed) {
      if (size.rimDiameterIn !== w.diameterIn) continue;
      try {
        const plan = setupGeometry({ tire: size, wheel: { diameterIn: w.diameterIn, widthIn: w.widthIn, offsetMm: w.offsetMm } });
        const cmp = compareSetups(cur, plan, axle ? { axleRatio: axle } : {});
        const summary = fromComparison(cmp, cur, plan, w.beadlock, axle !== undefined);
        const rings = hub(w).find((f) => f.code === "needs-rings");
        if (rings) summary.modifications.push(rings.message);
        picks.push({ tireId: t.id, wheelId: w.id, summary });
      } catch (e) {
        if (!(e instanceof FitmentInputError)) throw e;
      }
    }
  }
  picks.sort(
    (a, b) =>
      a.summary.warnings.length - b.summary.warnings.length ||
      b.summary.diameterChangeMm - a.summary.diameterChangeMm ||
      Math.abs(a.summary.outerPokeChangeMm) - Math.abs(b.summary.outerPokeChangeMm),
  );
  return { picks: picks.slice(0, limit), wheelsFitting: fitting.length, pairs: picks.length };
}
