/**
 * The workspace's words for the findings of a comparison (assess/assessChange.ts): each finding
 * it lists becomes a title, a reason and the finding's basis. Which findings it lists is decided
 * here, by kind; whether something is found, and how much it matters, is decided by the finding.
 * Pure: computeComparison calls it once per result.
 */
import type { Finding, FindingKind, FindingLevel, FindingOf } from "./assess/vocabulary";
import { type SpeedSystem, type SpeedUnit, readingPhrase, trueSpeedPhrase } from "./speedometer";

/** The kinds the workspace lists (outer reach, diameter, alignment, points and load it shows as figures). */
const LISTED = ["rim-width", "poke", "scrub", "speedometer", "regear", "inner-reach", "spacer"] as const satisfies readonly FindingKind[];
type WarningKind = (typeof LISTED)[number];

/** A finding in the workspace's words, with its reason and where its threshold comes from. */
export interface ComparisonWarning {
  kind: WarningKind;
  level: FindingLevel;
  /** Which setup it concerns, when only one. */
  setup: "current" | "planned" | null;
  /** Short statement; `{len}` stands for `lengthMm` in the reader's units (see format.ts `warningTitle`). */
  title: string;
  /** The statement per unit system, where it quotes speeds (format.ts `warningTitle` picks one); else null. */
  titleBySystem: Record<SpeedSystem, string> | null;
  lengthMm: number | null;
  why: string;
  basis: string;
}

/** The length placeholder of warning titles; `warningTitle` in format.ts fills it in the user's units. */
export const LENGTH_TOKEN = "{len}";

/** What the words quote beyond the findings: the headline speeds and whether a kingpin inclination was entered. */
interface WarningSource {
  speedometer: { bySystem: Record<SpeedSystem, { unit: SpeedUnit; headline: { indicated: number; actual: number } }> };
  kingpinInclinationDeg: number | null;
}

const sideWord = (s: "current" | "planned" | null) => (s === "planned" ? "Planned" : "Current");

type Words = Pick<ComparisonWarning, "title" | "titleBySystem" | "lengthMm" | "why">;

const words: { [K in WarningKind]: (f: FindingOf<K>, r: WarningSource) => Words } = {
  "rim-width": ({ setup, figures: x }) => ({
    title: `${sideWord(setup)} wheel width ${x.widthIn} in is outside the usual ${x.minIn}–${x.maxIn} in for ${x.tire}`,
    titleBySystem: null,
    lengthMm: null,
    why:
      x.widthIn < x.minIn
        ? "On a rim that narrow the tread crowns and the sidewall rolls under load and in corners; the bead is pinched at an angle it was not made for. Check the tire maker's approved rim widths."
        : "On a rim that wide the sidewall is stretched straight, the bead and rim edge are exposed to rocks, and the bead can unseat at low pressure. Check the tire maker's approved rim widths.",
  }),
  poke: ({ setup, figures: x }) => ({
    title: `${sideWord(setup)} tire reaches ${LENGTH_TOKEN} past the fender line you entered`,
    titleBySystem: null,
    lengthMm: x.pastMm,
    why: "Tread outside the fender throws stones, mud and water at the body and at other road users, and many places require the tread to be covered. Check the rules where you drive; flares or a different offset bring it back in.",
  }),
  scrub: ({ figures: x }, r) => ({
    title: `Scrub radius grows by ${LENGTH_TOKEN}`,
    titleBySystem: null,
    lengthMm: x.changeMm,
    why:
      "The contact patch moves further from the steering axis: heavier steering, more kickback over bumps and under braking, and more load on wheel bearings, ball joints and the steering box." +
      (r.kingpinInclinationDeg === null ? " Kingpin inclination is not entered, so this is the wheel-plane shift alone." : ""),
  }),
  speedometer: ({ figures: x }, r) => {
    const titleOf = (system: SpeedSystem) => {
      const { unit, headline: h } = r.speedometer.bySystem[system];
      return `Speedometer ${readingPhrase(x.ratio)}: at an indicated ${h.indicated} ${unit} you are actually going ${h.actual.toFixed(1)} ${unit} (${trueSpeedPhrase(x.ratio)})`;
    };
    const titleBySystem = { imperial: titleOf("imperial"), metric: titleOf("metric") };
    return {
      title: titleBySystem.imperial,
      titleBySystem,
      lengthMm: null,
      why:
        x.trueAbovePct > 0
          ? "The taller tire covers more ground per turn than the speedometer was set for, so it reads low — you are faster than it shows — and the odometer under-counts. Recalibrate it for the new tire."
          : "The shorter tire covers less ground per turn, so the speedometer reads high and the odometer over-counts. Recalibrate it for the new tire.",
    };
  },
  regear: ({ figures: x }) => ({
    title: `Regear advised: ${x.suggestedRatio.toFixed(2)} comes closest to the engine speeds of ${x.axleRatio.toFixed(2)} on the current tire`,
    titleBySystem: null,
    lengthMm: null,
    why:
      x.gapPct > 0
        ? `The taller tire acts like a ${x.effectiveRatio.toFixed(2)} axle: the engine turns slower at the same speed, pulls weaker in top gear and on grades, an automatic hunts between gears and runs hotter.`
        : `The shorter tire acts like a ${x.effectiveRatio.toFixed(2)} axle: the engine turns faster at every road speed.`,
  }),
  "inner-reach": ({ figures: x }) => ({
    title: `Planned tire reaches ${LENGTH_TOKEN} further inboard`,
    titleBySystem: null,
    lengthMm: x.reachMm,
    why: "Check the room to the control arms, leaf springs, frame and sway bar at full lock and full droop and compression.",
  }),
  spacer: ({ setup, figures: x }) => ({
    title: `${sideWord(setup)} setup uses a ${LENGTH_TOKEN} spacer`,
    titleBySystem: null,
    lengthMm: x.spacerMm,
    why: "Use hub-centric spacers rated for the vehicle, follow the spacer maker's fitting instructions and torque, and re-check the nuts after the first run. Spacers also add leverage on the wheel bearings.",
  }),
};

const listed = (f: Finding): f is FindingOf<WarningKind> => (LISTED as readonly FindingKind[]).includes(f.kind);

/**
 * The findings the workspace lists, in the findings' order, in its words.
 *
 * @example
 * workspaceWarnings(assessChange(result.engine, { fenderLineMm: null }), result).map((w) => w.kind);
 * // ["scrub", "speedometer", "regear"] for the demo comparison
 */
export function workspaceWarnings(findings: readonly Finding[], r: WarningSource): ComparisonWarning[] {
  return findings.filter(listed).map((f) => {
    const say = words[f.kind] as (f: FindingOf<WarningKind>, r: WarningSource) => Words;
    return { kind: f.kind, level: f.level, setup: f.setup, basis: f.basis, ...say(f, r) };
  });
}
