/**
 * Everything the cross-section draws, worked out once per comparison: the engine's geometry
 * (lib/fitment/crossSection.ts) and the labels laid out for a phone's width
 * (lib/fitment/crossSectionLayout.ts). Pure, no browser API: the same drawing renders on the
 * server, in the browser and (later) in the share image and the quote PDF.
 */
import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type CrossSectionModel, type PartInput, type Side, crossSection } from "@/lib/fitment/crossSection";
import { type CrossSectionLayout, labelledDimension, layoutCrossSection } from "@/lib/fitment/crossSectionLayout";
import type { BackspacingChoice } from "@/lib/fitment/wheelSection";
import { anchorText, describe, dimensionText, legendText } from "./text";

/**
 * The labels are placed for this rendered width (a 375 px phone less its margins), at
 * {@link FONT_PX}. The drawing scales with the page: wider, the text grows with it (the figure
 * caps its width so it stays near this size); narrower, it shrinks, and nothing overlaps at any
 * width because everything scales alike.
 */
export const DESIGN_WIDTH_PX = 343;
export const FONT_PX = 12;
/**
 * Measured parts named on the picture, nearest to contact first; every part is still marked by
 * its status shape, and all of them are in the data table and the prediction table.
 */
export const MAX_NAMED_PARTS = 6;

const SEVERITY = { contact: 0, tight: 1, clear: 2 } as const;

/** The ids of the parts to name: by status (contact, tight, clear), then by the smallest predicted gap. */
export function namedParts(model: CrossSectionModel): Set<string> {
  const drawn = model.parts.filter((p) => p.at);
  drawn.sort((a, b) => SEVERITY[a.status] - SEVERITY[b.status] || a.predictedMm - b.predictedMm);
  return new Set(drawn.slice(0, MAX_NAMED_PARTS).map((p) => p.id));
}

/** What of a garage vehicle the workspace passes to the drawing (all from the engine). */
export interface DrawnLimits {
  /** Nearest inboard part, mm inboard of the hub face (clearanceLimits, margin 0). */
  innerMm: number | null;
  /** Nearest outboard part (the fender lip), mm outboard of the hub face. */
  outerMm: number | null;
  /** The measured points with their predictions for the planned setup. */
  parts?: readonly PartInput[];
}

export interface Drawing {
  model: CrossSectionModel;
  /** Parts named on the picture (see {@link MAX_NAMED_PARTS}). */
  named: Set<string>;
  layout: CrossSectionLayout;
  description: string;
}

/** How a setup's backspacing is shown: as entered, or to the flange edge (0.5 in allowance) when an offset was entered. */
function choiceOf(r: ComparisonResult, side: Side): BackspacingChoice {
  const p = r.input[side].position;
  return p.mode === "backspacing"
    ? { reference: p.reference, flangeIn: p.flangeIn }
    : { reference: "flange", flangeIn: r[side].flangeAllowanceIn };
}

export function buildDrawing(r: ComparisonResult, prefs: DisplayPrefs, limits?: DrawnLimits | null): Drawing {
  const model = crossSection(
    { geometry: r.engine.current, ...choiceOf(r, "current") },
    { geometry: r.engine.planned, ...choiceOf(r, "planned") },
    {
      kingpinInclinationDeg: r.kingpinInclinationDeg,
      fenderLineMm: r.fenderLineMm,
      innerLimitMm: limits?.innerMm ?? null,
      fenderLipMm: limits?.outerMm ?? null,
      parts: limits?.parts ?? [],
    },
    r.engine,
  );
  const named = namedParts(model);
  const layout = layoutCrossSection(
    {
      extents: model.extents,
      dimensions: model.dimensions.map((d) => labelledDimension(d, dimensionText(d, prefs))),
      callouts: model.anchors
        .filter((a) => a.kind !== "part" || named.has(a.id))
        .map((a) => ({ id: a.id, at: a.at, text: anchorText(a, model) })),
      legend: (["current", "planned"] as const).map((side) => ({ id: `legend-${side}`, text: legendText(side, r) })),
    },
    { widthPx: DESIGN_WIDTH_PX, fontPx: FONT_PX },
  );
  return { model, named, layout, description: describe(r, model, prefs) };
}
