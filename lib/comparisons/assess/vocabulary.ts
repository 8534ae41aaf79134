/**
 * The words of a comparison's reading, defined once: what is judged (kinds), how much it matters
 * (levels, with the label and colour every screen gives them) and what a finding holds. Pure and
 * client-safe: the workspace bundle carries it.
 */
import type { ClearanceDirection, ClearanceStatus, SuspensionState } from "@/lib/fitment";

/** The things a change of setup is judged on, in the order findings are listed. */
export const FINDING_KINDS = [
  "rim-width",
  "poke",
  "outer-reach",
  "scrub",
  "speedometer",
  "regear",
  "inner-reach",
  "diameter",
  "alignment",
  "spacer",
  "clearance",
  "load",
] as const;
export type FindingKind = (typeof FINDING_KINDS)[number];

/** "note": worth checking; "caution": to act on before the change is made. */
export type FindingLevel = "note" | "caution";

/** What each level is called (screen readers hear it before the statement). */
export const LEVEL_LABEL: Readonly<Record<FindingLevel, string>> = Object.freeze({ note: "Note", caution: "Caution" });

/** The colour family (tailwind.config palette) each level is shown in. */
export type FindingTone = "steel" | "tight";
export const LEVEL_TONE: Readonly<Record<FindingLevel, FindingTone>> = Object.freeze({ note: "steel", caution: "tight" });

/** The numbers behind each kind of finding (mm, in, %, ratios as the engine gives them). */
interface FindingFigures {
  /** The wheel against the rim widths suited to the tire (the engine's measuring rim ± band). */
  "rim-width": { widthIn: number; minIn: number; maxIn: number; measuringRimIn: number; tire: string };
  /** The tire's outer reach past the fender line the user measured from the hub face. */
  poke: { pastMm: number; fenderLineMm: number };
  /** How much further outboard the planned tire reaches than the current one. */
  "outer-reach": { changeMm: number };
  /** Scrub radius increase. */
  scrub: { changeMm: number };
  /** Speedometer calibrated on the current tire: actual = indicated × ratio. */
  speedometer: { ratio: number; trueAbovePct: number };
  /** Gearing with the planned tire; gapPct = ratioToRestore / axleRatio − 1, in %. */
  regear: { axleRatio: number; effectiveRatio: number; ratioToRestore: number; suggestedRatio: number; gapPct: number };
  /** How much further inboard the planned tire reaches (positive). */
  "inner-reach": { reachMm: number };
  /** Overall diameter change, planned − current (signed). */
  diameter: { changeMm: number };
  /** What calls for an alignment: the diameter change and the wheel-plane shift per side (signed). */
  alignment: { diameterChangeMm: number; shiftPerSideMm: number };
  /** A wheel spacer on one setup. */
  spacer: { spacerMm: number };
  /** A measured point on the vehicle, predicted with the planned setup against the margin. */
  clearance: {
    pointId: string;
    label: string;
    direction: ClearanceDirection;
    state: SuspensionState;
    status: Exclude<ClearanceStatus, "clear">;
    measuredMm: number;
    predictedMm: number;
    marginMm: number;
    shortfallMm: number;
  };
  /** What the planned tire carries per tire (ISO 4000-1) and its load range's highest pressure. */
  load: { index: number | null; kg: number | null; loadRange: string | null; maxPressurePsi: number | null; maxPressureKpa: number | null };
}

/** One judgement of a change: what, how much it matters, the numbers, and where the threshold comes from. */
export type Finding = {
  [K in FindingKind]: {
    kind: K;
    level: FindingLevel;
    /** Which setup it concerns, when only one. */
    setup: "current" | "planned" | null;
    figures: FindingFigures[K];
    /** The threshold or rule and its source, as a sentence. */
    basis: string;
  };
}[FindingKind];

export type FindingOf<K extends FindingKind> = Extract<Finding, { kind: K }>;

/**
 * The findings of one kind, typed by it.
 *
 * @example
 * findingsOf(assessChange(c, {}), "regear")[0]?.figures.suggestedRatio; // 4.1
 */
export function findingsOf<K extends FindingKind>(findings: readonly Finding[], kind: K): FindingOf<K>[] {
  return findings.filter((f): f is FindingOf<K> => f.kind === kind);
}
