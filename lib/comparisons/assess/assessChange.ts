/**
 * One reading of a comparison. The engine compares two setups (compareSetups in lib/fitment);
 * this module judges that comparison against the thresholds in thresholds.ts and returns typed
 * findings. The workspace (lib/comparisons/warnings.ts), the shop counter
 * (lib/shop/quotes/fitment.ts) and the install checklist (lib/garage/checklist.ts) each word the
 * findings their own way; none of them judges a number itself. Pure and client-safe.
 *
 * Rules, each a threshold from thresholds.ts unless said otherwise:
 * - rim-width (per setup): the wheel outside the engine's band around the measuring rim;
 * - poke (per setup, with a fender line): the tire's outer reach past the line the user measured;
 * - outer-reach: the planned tire reaching more than OUTER_REACH_WARN_MM further outboard;
 * - scrub: scrub radius growing by more than SCRUB_WARN_MM;
 * - speedometer: actual speed more than SPEEDO_WARN_PCT off the indicated one;
 * - regear: the restoring ratio REGEAR_WARN_PCT or more from the axle ratio, and a different
 *   common ratio nearer than the current one;
 * - inner-reach: any reach further inboard (note); more than INNER_REACH_WARN_MM (caution);
 * - diameter: the overall diameter changing by more than DIAMETER_CHANGE_WARN_MM;
 * - alignment: diameter change from ALIGNMENT_DIAMETER_MM or wheel-plane shift per side from
 *   ALIGNMENT_SHIFT_MM;
 * - spacer (per setup): any spacer;
 * - clearance (per measured point, when given): the engine's prediction is tight or contact
 *   against the vehicle's margin;
 * - load: the planned tire's load index and load range, always (a note to check against the
 *   axle ratings).
 */
import { RIM_WIDTH_TOLERANCE_IN } from "@/lib/fitment/dimensions";
import type { ClearancePrediction } from "@/lib/fitment/clearance";
import type { SetupComparison } from "@/lib/fitment/compare";
import type { SetupGeometry } from "@/lib/fitment/geometry";
import { loadIndexKg } from "@/lib/fitment/loadSpeed";
import { loadRangeInfo } from "@/lib/fitment/loadRange";
import {
  ALIGNMENT_DIAMETER_MM,
  ALIGNMENT_SHIFT_MM,
  DIAMETER_CHANGE_WARN_MM,
  INNER_REACH_WARN_MM,
  OUTER_REACH_WARN_MM,
  REGEAR_WARN_PCT,
  SCRUB_WARN_MM,
  SPEEDO_WARN_PCT,
} from "./thresholds";
import type { Finding, FindingKind, FindingOf } from "./vocabulary";

/** A measured point of the vehicle and the engine's prediction of it with the planned setup. */
interface PointPrediction {
  id: string;
  label: string;
  prediction: ClearancePrediction;
}

/** What the comparison alone does not hold. */
export interface AssessContext {
  /** Hub face to the fender line, mm, as the user measured it; null or left out when not entered. */
  fenderLineMm?: number | null;
  /** The vehicle's measured points, predicted with the planned setup (lib/garage/predict.ts). */
  points?: readonly PointPrediction[];
}

type Side = "current" | "planned";

/** A caution about the change as a whole, not one setup: a figure past its threshold. */
function changeCaution<K extends FindingKind>(kind: K, figures: FindingOf<K>["figures"], basis: string): FindingOf<K> {
  return { kind, level: "caution", setup: null, figures, basis } as FindingOf<K>;
}

function rimWidth(g: SetupGeometry, side: Side): FindingOf<"rim-width"> | null {
  if (g.rimWidthSuitable) return null;
  return {
    kind: "rim-width",
    level: side === "planned" ? "caution" : "note",
    setup: side,
    figures: {
      widthIn: g.wheel.widthIn,
      minIn: g.rimWidthMinIn,
      maxIn: g.rimWidthMaxIn,
      measuringRimIn: g.measuringRimWidthIn,
      tire: g.tire.text,
    },
    basis: `Measuring rim ${g.measuringRimWidthIn} in ± ${RIM_WIDTH_TOLERANCE_IN} in (measuring rim factor from memory of the UN R30/ETRTO rule; the ± ${RIM_WIDTH_TOLERANCE_IN} in band is common practice, no source).`,
  };
}

function poke(g: SetupGeometry, side: Side, fenderLineMm: number): FindingOf<"poke"> | null {
  const pastMm = g.outerSwingMm - fenderLineMm;
  if (!(pastMm > 0)) return null;
  return {
    kind: "poke",
    level: side === "planned" ? "caution" : "note",
    setup: side,
    figures: { pastMm, fenderLineMm },
    basis: "Your fender-line measurement compared with the tire's outer reach from the hub face (the engine's outer swing).",
  };
}

/**
 * The diameter finding alone, for readers that hold only the figure (a quote stored before its
 * findings were kept).
 *
 * @example
 * diameterChange(70)?.level; // "caution" (more than 50 mm; common practice, no source)
 * diameterChange(50);        // null
 */
export function diameterChange(changeMm: number): FindingOf<"diameter"> | null {
  if (!(Math.abs(changeMm) > DIAMETER_CHANGE_WARN_MM)) return null;
  return changeCaution(
    "diameter",
    { changeMm },
    `Overall diameter changing by more than ${DIAMETER_CHANGE_WARN_MM} mm (about 2 in) usually involves a lift or levelling (common practice, no source).`,
  );
}

function spacer(g: SetupGeometry, side: Side): FindingOf<"spacer"> | null {
  if (!(g.spacerMm > 0)) return null;
  return {
    kind: "spacer",
    level: "note",
    setup: side,
    figures: { spacerMm: g.spacerMm },
    basis: "Common practice, no source; the spacer and wheel makers' instructions win.",
  };
}

function clearance(p: PointPrediction): FindingOf<"clearance"> | null {
  const { prediction: x } = p;
  if (x.status === "clear") return null;
  return {
    kind: "clearance",
    level: x.status === "contact" ? "caution" : "note",
    setup: "planned",
    figures: {
      pointId: p.id,
      label: p.label,
      direction: x.direction,
      state: x.state,
      status: x.status,
      measuredMm: x.measuredMm,
      predictedMm: x.predictedMm,
      marginMm: x.marginMm,
      shortfallMm: x.shortfallMm,
    },
    basis:
      "Your measurement carried to the planned setup by the engine (lib/fitment/clearance.ts), against the margin you set: contact at 0 mm or less, tight below the margin.",
  };
}

function load(g: SetupGeometry): FindingOf<"load"> {
  const t = g.tire;
  const info = t.loadRange === null || t.system === "numeric" ? null : loadRangeInfo(t.loadRange, t.system);
  return {
    kind: "load",
    level: "note",
    setup: "planned",
    figures: {
      index: t.loadIndex,
      kg: t.loadIndex === null ? null : loadIndexKg(t.loadIndex),
      loadRange: info?.loadRange ?? t.loadRange,
      maxPressurePsi: info?.maxPressurePsi ?? null,
      maxPressureKpa: info?.maxPressureKpa ?? null,
    },
    basis:
      "Load index per tire from the ISO 4000-1 table; the load range's highest pressure from memory of TRA practice (the sidewall marking wins).",
  };
}

/**
 * Judges the engine's comparison of the current and the planned setup; findings come in the
 * order of FINDING_KINDS (per-setup kinds: current first, except poke: planned first).
 *
 * @example
 * const c = compareSetups(
 *   { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } },
 *   { tire: "315/70R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } },
 * );
 * assessChange(c, {}).map((f) => f.kind);
 * // ["outer-reach", "scrub", "speedometer", "regear", "diameter", "alignment", "load"]
 */
export function assessChange(c: SetupComparison, context: AssessContext): Finding[] {
  const out: (Finding | null)[] = [rimWidth(c.current, "current"), rimWidth(c.planned, "planned")];
  const fender = context.fenderLineMm;
  if (fender !== null && fender !== undefined) out.push(poke(c.planned, "planned", fender), poke(c.current, "current", fender));

  if (c.outerPokeChangeMm > OUTER_REACH_WARN_MM) {
    out.push(
      changeCaution(
        "outer-reach",
        { changeMm: c.outerPokeChangeMm },
        `More than ${OUTER_REACH_WARN_MM} mm further outboard than the current tire (common practice, no source).`,
      ),
    );
  }

  if (c.scrubRadiusChangeMm > SCRUB_WARN_MM) {
    out.push(
      changeCaution(
        "scrub",
        { changeMm: c.scrubRadiusChangeMm },
        `More than ${SCRUB_WARN_MM} mm (1 in) of increase (common practice, no source).`,
      ),
    );
  }

  const ratio = c.speedometer.ratio;
  const trueAbovePct = (ratio - 1) * 100;
  if (Math.abs(trueAbovePct) > SPEEDO_WARN_PCT) {
    out.push(
      changeCaution(
        "speedometer",
        { ratio, trueAbovePct },
        `Actual speed more than ${SPEEDO_WARN_PCT} % off the indicated one (common practice, no source); both percentages come from the ratio of overall diameters (unloaded).`,
      ),
    );
  }

  const g = c.gearing;
  const gapPct = (g.ratioToRestore / g.axleRatio - 1) * 100;
  if (Math.abs(gapPct) >= REGEAR_WARN_PCT && g.suggestedRatio !== g.axleRatio) {
    out.push(
      changeCaution(
        "regear",
        {
          axleRatio: g.axleRatio,
          effectiveRatio: g.effectiveRatio,
          ratioToRestore: g.ratioToRestore,
          suggestedRatio: g.suggestedRatio,
          gapPct,
        },
        `Restoring ratio ${g.ratioToRestore.toFixed(2)} is ${Math.abs(gapPct).toFixed(1)} % from the axle ratio; advised from ${REGEAR_WARN_PCT} % (common practice, no source). Suggested = nearest common ratio.`,
      ),
    );
  }

  const reachMm = -c.innerClearanceChangeMm;
  if (reachMm > 0) {
    const caution = reachMm > INNER_REACH_WARN_MM;
    out.push({
      kind: "inner-reach",
      level: caution ? "caution" : "note",
      setup: "planned",
      figures: { reachMm },
      basis: caution
        ? `Inner swing from the hub face, current minus planned (engine); more than ${INNER_REACH_WARN_MM} mm further inboard is a caution (common practice, no source).`
        : "Inner swing from the hub face, current minus planned (engine).",
    });
  }

  out.push(diameterChange(c.diameterChangeMm));

  const shiftPerSideMm = c.trackWidthChangeMm / 2;
  if (Math.abs(c.diameterChangeMm) >= ALIGNMENT_DIAMETER_MM || Math.abs(shiftPerSideMm) >= ALIGNMENT_SHIFT_MM) {
    out.push({
      kind: "alignment",
      level: "note",
      setup: null,
      figures: { diameterChangeMm: c.diameterChangeMm, shiftPerSideMm },
      basis: `Diameter change of ${ALIGNMENT_DIAMETER_MM} mm (1 in) or more, or the wheel plane moving ${ALIGNMENT_SHIFT_MM} mm (1/2 in) or more per side (common practice, no source).`,
    });
  }

  out.push(spacer(c.current, "current"), spacer(c.planned, "planned"));
  for (const p of context.points ?? []) out.push(clearance(p));
  out.push(load(c.planned));
  return out.filter((f): f is Finding => f !== null);
}
