/**
 * The counter's summary of a fitment: every number comes from `compareSetups` /
 * `setupGeometry` in lib/fitment, every judgement from `assessChange`
 * (lib/comparisons/assess, thresholds defined there once). This module words the findings the
 * counter's way (warnings and modifications) and ranks the picks. Pure.
 */
import {
  DEFAULT_AXLE_RATIO,
  FitmentInputError,
  compareSetups,
  mmToIn,
  parseTireSize,
  setupGeometry,
  type SetupComparison,
  type SetupGeometry,
} from "@/lib/fitment";
import { assessChange } from "@/lib/comparisons/assess/assessChange";
import { type Finding, type FindingKind, type FindingOf, findingsOf } from "@/lib/comparisons/assess/vocabulary";
import { type QuotePressure, axlePressureWords } from "@/lib/shop/customers/counterPlacard";
import { type QuoteAngles, angleRows } from "@/lib/shop/customers/counterBodyPoints";
import type { Setup } from "@/lib/setup/model";
import { checkWheelOnHub, hubRefusal } from "./hubFit";

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
  /**
   * The findings the warnings and modifications were worded from. Stored with the quote; quotes
   * drafted before they were kept have none, so a reader of a stored summary that needs a
   * judgement takes it from the figures above (see cautions.ts).
   */
  findings?: Finding[];
  /**
   * The two setups the figures were computed from, for the drawing (quote PDF). Summaries stored
   * before it was kept have none: the drawing then reads the wheel texts above (drawing.ts).
   */
  setups?: { current: Setup; planned: Setup };
  /** The cold pressure to set per axle, when the counter took the vehicle's door placard (lib/shop/customers/counterPlacard.ts). */
  pressure?: QuotePressure;
  /** The trail angles now and with the quoted tires, when the counter measured the body points (lib/shop/customers/counterBodyPoints.ts). */
  angles?: QuoteAngles;
}

/** A summary just computed: its findings and setups are there. */
type FitmentReading = FitmentSummary & { findings: Finding[]; setups: { current: Setup; planned: Setup } };

/** A setup as the engine computed it: the offset it used (spacer apart) and the spacer. */
const setupOf = (g: SetupGeometry): Setup => ({
  tire: g.tire.text,
  wheelDiameterIn: g.wheel.diameterIn,
  wheelWidthIn: g.wheel.widthIn,
  position: { mode: "offset", offsetMm: g.wheel.offsetMm },
  spacerMm: g.spacerMm,
});

const r1 = (x: number) => Math.round(x * 10) / 10;
const inches = (mm: number) => `${r1(mmToIn(Math.abs(mm)))} in`;
const wheelText = (w: { diameterIn: number; widthIn: number; offsetMm: number }) =>
  `${w.diameterIn}x${w.widthIn} ${w.offsetMm >= 0 ? "+" : ""}${r1(w.offsetMm)} mm`;

/** Summary of the planned tire on the planned wheel against the current setup. */
export function summarize(
  current: CurrentSetup,
  tire: string,
  wheel: Omit<WheelCandidate, "id" | "boltPattern"> & { boltPattern?: string },
): FitmentReading {
  const cur = setupGeometry({ tire: current.tireSize, wheel: current.wheel });
  const plan = setupGeometry({ tire, wheel: { diameterIn: wheel.diameterIn, widthIn: wheel.widthIn, offsetMm: wheel.offsetMm } });
  const axle = current.axleRatio ?? undefined;
  const cmp = compareSetups(cur, plan, axle ? { axleRatio: axle } : {});
  return fromComparison(cmp, cur, plan, wheel.beadlock, axle !== undefined);
}

/** A finding in the counter's words; null when the counter has nothing to say about it. */
type Words<K extends FindingKind> = { [k in K]: (f: FindingOf<k>) => string | null };

/**
 * The clearance warnings, in this order: cautions about the planned wheel and tire (a note, or
 * the current wheel's rim width, is not the counter's to warn about).
 */
const WARNINGS: Words<"outer-reach" | "inner-reach" | "rim-width" | "diameter"> = {
  "outer-reach": ({ figures: x }) =>
    `Reaches ${Math.round(x.changeMm)} mm (${inches(x.changeMm)}) further outboard: check fender clearance.`,
  "inner-reach": ({ level, figures: x }) =>
    level === "caution" ? `${Math.round(x.reachMm)} mm closer inboard: check control arms, frame and sway bar at full lock.` : null,
  "rim-width": ({ setup, figures: x }) =>
    setup === "planned" ? `Rim width ${x.widthIn} in is outside ${x.minIn}–${x.maxIn} in suited to ${x.tire}.` : null,
  // A much shorter tire is left to the cautions (cautions.ts); the counter warns of a taller one.
  diameter: ({ figures: x }) =>
    x.changeMm > 0
      ? `${Math.round(x.changeMm)} mm (${inches(x.changeMm)}) taller: check clearance at full lock and full compression.`
      : null,
};

/** The modifications, in this order. */
const modifications = (axleGiven: boolean): Words<"outer-reach" | "diameter" | "regear" | "speedometer" | "alignment"> => ({
  "outer-reach": () => "Fender trimming or flares may be needed for the extra poke.",
  diameter: ({ figures: x }) =>
    x.changeMm > 0 ? "A lift or levelling kit is usually needed for this much extra diameter; follow the lift maker's instructions." : null,
  regear: ({ figures: x }) =>
    `Regear from ${x.axleRatio.toFixed(2)} to about ${x.suggestedRatio.toFixed(2)} to restore the effective ratio${axleGiven ? "" : ` (assuming a ${DEFAULT_AXLE_RATIO.toFixed(2)} axle; enter the vehicle's ratio)`}.`,
  speedometer: () => "Recalibrate the speedometer.",
  alignment: () => "Wheel alignment after fitting.",
});

/** The findings `words` has words for, in the order of its keys. */
function worded<K extends FindingKind>(findings: readonly Finding[], words: Words<K>): string[] {
  const out: string[] = [];
  for (const kind of Object.keys(words) as K[]) {
    const say = words[kind] as (f: Finding) => string | null;
    for (const f of findings) {
      const text = f.kind === kind ? say(f) : null;
      if (text !== null) out.push(text);
    }
  }
  return out;
}

function fromComparison(
  cmp: SetupComparison,
  cur: SetupGeometry,
  plan: SetupGeometry,
  beadlock: boolean,
  axleGiven: boolean,
): FitmentReading {
  const findings = assessChange(cmp, {});
  const [regearFinding] = findingsOf(findings, "regear");
  const at60 = cmp.speedometer.rows.find((r) => r.indicatedMph === 60)?.actualMph ?? 60 * cmp.speedometer.ratio;
  return {
    current: { tire: cur.tire.text, wheel: wheelText(cur.wheel), overallDiameterMm: cur.overallDiameterMm },
    planned: {
      tire: plan.tire.text,
      wheel: wheelText(plan.wheel),
      overallDiameterMm: plan.overallDiameterMm,
      beadlock,
      rimWidthSuitable: plan.rimWidthSuitable,
    },
    diameterChangeMm: cmp.diameterChangeMm,
    groundClearanceChangeMm: cmp.groundClearanceChangeMm,
    outerPokeChangeMm: cmp.outerPokeChangeMm,
    innerClearanceChangeMm: cmp.innerClearanceChangeMm,
    trackWidthChangeMm: cmp.trackWidthChangeMm,
    scrubRadiusChangeMm: cmp.scrubRadiusChangeMm,
    actualMphAt60: at60,
    regear: regearFinding
      ? {
          axleRatio: regearFinding.figures.axleRatio,
          effectiveRatio: regearFinding.figures.effectiveRatio,
          suggestedRatio: regearFinding.figures.suggestedRatio,
        }
      : null,
    alignmentSuggested: findings.some((f) => f.kind === "alignment"),
    modifications: worded(findings, modifications(axleGiven)),
    warnings: worded(findings, WARNINGS),
    findings,
    setups: { current: setupOf(cur), planned: setupOf(plan) },
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
  if (fit.regear)
    rows.push([
      "Effective axle ratio",
      `${fit.regear.axleRatio.toFixed(2)} → ${fit.regear.effectiveRatio.toFixed(2)}; regear to about ${fit.regear.suggestedRatio.toFixed(2)}`,
    ]);
  // Only with the placard the counter took; its caution (cautions.ts) says how it was found and its limits.
  if (fit.pressure && "axles" in fit.pressure) rows.push(["Cold pressure to set", axlePressureWords(fit.pressure)]);
  // Only with the body points the counter measured; their caution (cautions.ts) says how they were found.
  if (fit.angles) rows.push(...angleRows(fit.angles));
  return rows;
}

export interface Pick {
  tireId: string;
  wheelId: string;
  summary: FitmentReading;
}

/**
 * Every tire × wheel pair that mounts (wheel bolt pattern equivalent to the vehicle's, centre
 * bore not smaller than a known hub — lib/shop/quotes/hubFit.ts —, wheel diameter equal to the
 * tire's rim), compared with the current setup and ranked: fewest warnings first, then the
 * larger diameter gain, then the smaller change in poke. A wheel that needs hub-centric rings
 * says so among its modifications.
 */
export function rankPicks(
  current: CurrentSetup,
  tires: readonly TireCandidate[],
  wheels: readonly WheelCandidate[],
  limit = 30,
): { picks: Pick[]; wheelsFitting: number; pairs: number } {
  const cur = setupGeometry({ tire: current.tireSize, wheel: current.wheel });
  const axle = current.axleRatio ?? undefined;
  const hub = (w: WheelCandidate) =>
    checkWheelOnHub(
      { boltPattern: current.boltPattern, hubBoreMm: current.hubBoreMm ?? null },
      { boltPattern: w.boltPattern, centerBoreMm: w.centerBoreMm ?? null },
    );
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
