/**
 * The cross-section's words, in the reader's units: dimension labels, feature labels, the
 * legend, and the sentence that describes the drawing. Lengths go through `formatLen` (inches to
 * 0.01 or in sixteenths, whole millimetres); offsets stay in mm as wheels are stamped, as in the
 * detail table; a spacer is given as bought (`formatPartThickness`).
 */
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { type DisplayPrefs, formatLen, formatNumber, formatPartThickness } from "@/lib/comparisons/format";
import type { Anchor, CrossSectionModel, Dimension, PlacedPart, Side } from "@/lib/fitment/crossSection";

/** Longest text kept in a label drawn on the picture; the data table holds the full text. */
export const LABEL_MAX_CHARS = 22;

/** Shortens a name to `max` characters with an ellipsis. */
export function clip(text: string, max = LABEL_MAX_CHARS): string {
  const chars = [...text.trim()];
  return chars.length <= max ? chars.join("") : `${chars.slice(0, max - 1).join("")}…`;
}

export const SIDE_WORD: Record<Side, string> = { current: "Current", planned: "Planned" };

export const len = (mm: number, prefs: DisplayPrefs) => formatLen(mm, prefs);
export const signedLen = (mm: number, prefs: DisplayPrefs) => formatLen(mm, prefs, { signed: true });
/** An offset as stamped: whole mm, or to 0.1 mm when it came from a backspacing. */
export const offsetText = (mm: number) => `${formatNumber(mm, Number.isInteger(mm) ? 0 : 1, { signed: true })} mm`;

/** The label of a dimension line: what it measures and its value (the setup is told by the line style and the legend). */
export function dimensionText(d: Dimension, prefs: DisplayPrefs): string {
  switch (d.kind) {
    case "reach-inboard":
      return `inboard ${len(d.valueMm, prefs)}`;
    case "reach-outboard":
      return `outboard ${len(d.valueMm, prefs)}`;
    case "backspacing":
      return `backspacing ${len(d.valueMm, prefs)}${d.reference === "bead-seat" ? " (bead seat)" : ""}`;
    case "flange-allowance":
      return `flange ${len(d.valueMm, prefs)}`;
    case "offset":
      return `offset ${offsetText(d.valueMm)}`;
    case "spacer":
      return `spacer ${formatPartThickness(d.valueMm, prefs)}`;
    case "diameter":
      return `diameter ${len(d.valueMm, prefs)}`;
    case "ground-change":
      return `ground clearance ${signedLen(d.valueMm, prefs)}`;
  }
}

const STATUS_WORD: Record<PlacedPart["status"], string> = { clear: "clear", tight: "tight", contact: "contact" };

/** The label of a feature the drawing points at. */
export function anchorText(a: Anchor, m: CrossSectionModel): string {
  switch (a.kind) {
    case "tire":
      return SIDE_WORD[a.setup ?? "current"];
    case "hub-face":
      return "hub face";
    case "axle":
      return "axle";
    case "inner-limit":
      return "inner limit";
    case "fender-lip":
      return "fender lip";
    case "fender-line":
      return "fender line";
    case "steering-axis":
      return `steering axis ${formatNumber(m.steeringAxis?.deg ?? 0, 1)}°`;
    case "part": {
      const p = m.parts.find((x) => x.id === a.id);
      return p ? `${clip(p.label, 14)}: ${STATUS_WORD[p.status]}` : "part";
    }
  }
}

/** A legend entry: the setup and its tire. */
export function legendText(side: Side, r: ComparisonResult): string {
  return `${SIDE_WORD[side]} ${clip(r[side].tireText, 24)}`;
}

/** One sentence per setup and one for the ground: the drawing's description for screen readers. */
export function describe(r: ComparisonResult, m: CrossSectionModel, prefs: DisplayPrefs): string {
  const one = (side: Side) => {
    const f = r[side];
    const s = m[side];
    const bs = `${len(s.backspacing.valueMm, prefs)} to the ${s.backspacing.reference === "flange" ? "flange edge" : "bead seat"}`;
    return `${SIDE_WORD[side]}: ${f.tireText} on a ${f.wheelDiameterIn} × ${f.wheelWidthIn} in wheel, offset ${offsetText(f.offsetMm)}, backspacing ${bs}${f.spacerMm > 0 ? `, on a ${formatPartThickness(f.spacerMm, prefs)} spacer` : ""}; the tire reaches ${len(f.innerSwingMm, prefs)} inboard and ${len(f.outerSwingMm, prefs)} outboard of the hub face and is ${len(f.overallDiameterMm, prefs)} tall.`;
  };
  const g = m.groundChangeMm;
  const ground =
    g === 0
      ? "Ground clearance is unchanged."
      : `The planned setup sits ${len(Math.abs(g), prefs)} ${g > 0 ? "higher" : "lower"} (ground clearance ${signedLen(g, prefs)}).`;
  return `${one("current")} ${one("planned")} ${ground}`;
}
