/**
 * Everything the cross-section draws, worked out once per comparison: the engine's geometry
 * (lib/fitment/crossSection.ts) and the labels laid out for a phone's width
 * (lib/fitment/crossSectionLayout.ts). Pure, no browser API: the same drawing renders on the
 * server, in the browser and (later) in the share image and the quote PDF.
 */
import type { ComparisonResult } from "@/lib/comparison/compute";
import type { DisplayPrefs } from "@/lib/comparison/format";
import { type CrossSectionModel, type PartInput, type Side, crossSection } from "@/lib/fitment/crossSection";
import { type CrossSectionLayout, layoutCrossSection } from "@/lib/fitment/crossSectionLayout";
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
  layout: CrossSectionLayout;
  description: string;
}

/** How a setup's backspacing is shown: as entered, or to the flange edge (0.5 in allowance) when an offset was entered. */
function choiceOf(r: ComparisonResult, side: Side): BackspacingChoice {
  const p = r.input[side].position;
  return p.mode === "backspacing" ? { reference: p.reference, flangeIn: p.flangeIn } : { reference: "flange", flangeIn: r[side].flangeAllowanceIn };
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
  const layout = layoutCrossSection(
    {
      extents: model.extents,
      dimensions: model.dimensions.map((d) => ({ id: d.id, axis: d.axis, band: d.band, from: d.from, to: d.to, ends: d.ends, text: dimensionText(d, prefs) })),
      callouts: model.anchors.map((a) => ({ id: a.id, at: a.at, text: anchorText(a, model) })),
      legend: (["current", "planned"] as const).map((side) => ({ id: `legend-${side}`, text: legendText(side, r) })),
    },
    { widthPx: DESIGN_WIDTH_PX, fontPx: FONT_PX },
  );
  return { model, layout, description: describe(r, model, prefs) };
}
