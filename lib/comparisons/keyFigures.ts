/**
 * The key figures of a comparison that saved-comparison lists show, search and sort by, as
 * stored beside the input (columns of `comparisons`). Pure: the server computes them on every
 * write; the demo seed uses the same function.
 */
import type { ComparisonFigures } from "@/lib/comparisons/api";
import { computeComparison } from "./compute";
import type { ComparisonInput } from "./schema";

/**
 * @example
 * keyFigures(DEFAULT_INPUT).diameterChangeMm; // 137 (939.8 mm − 802.8 mm)
 */
export function keyFigures(input: ComparisonInput): ComparisonFigures {
  const r = computeComparison(input);
  return {
    currentTire: r.current.tireText,
    plannedTire: r.planned.tireText,
    diameterChangeMm: r.changes.diameterMm,
    groundClearanceChangeMm: r.changes.groundClearanceMm,
    pokeChangeMm: r.changes.outerPokeMm,
    scrubChangeMm: r.changes.scrubRadiusMm,
    // Stored as how far actual speed is above the indicated one, % of the indicated (r − 1);
    // lists must say so (the speedometer itself reads (1 − 1/r) low: see speedometer.ts).
    speedometerErrorPct: r.speedometer.trueAbovePct,
    suggestedRatio: r.gearing.suggestedRatio,
    warningCount: r.warnings.length,
  };
}

/** The same figures under their column names. */
export function keyFigureColumns(input: ComparisonInput) {
  const f = keyFigures(input);
  return {
    current_tire: f.currentTire,
    planned_tire: f.plannedTire,
    diameter_change_mm: f.diameterChangeMm,
    ground_clearance_change_mm: f.groundClearanceChangeMm,
    poke_change_mm: f.pokeChangeMm,
    scrub_change_mm: f.scrubChangeMm,
    speedometer_error_pct: f.speedometerErrorPct,
    suggested_ratio: f.suggestedRatio,
    warning_count: f.warningCount,
  };
}
