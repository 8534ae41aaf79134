/**
 * The quote's cross-section: the same drawing the workspace shows (CrossSectionSvg), of the
 * vehicle's current setup and the quoted wheel and tire, as SVG markup for the PDF. Pure.
 */
import { computeComparison } from "@/lib/comparisons/compute";
import { CrossSectionSvg } from "@/lib/comparisons/crossSection/CrossSectionSvg";
import { buildDrawing } from "@/lib/comparisons/crossSection/drawing";
import { type HostRewrite, svgMarkup } from "@/lib/comparisons/crossSection/markup";
import { DEFAULT_PREFS } from "@/lib/comparisons/format";
import { checkComparison } from "@/lib/comparisons/checkInput";
import { type ComparisonInput, DEFAULT_VEHICLE } from "@/lib/comparisons/model";
import type { Setup } from "@/lib/setup/model";
import type { FitmentSummary } from "./fitment";

/** The wheel as the summary words it (fitment.ts `wheelText`): "17x9 -12 mm". */
const WHEEL_TEXT = /^(\d+(?:\.\d+)?)x(\d+(?:\.\d+)?) ([+-]?\d+(?:\.\d+)?) mm$/;

/** A setup read back from a summary stored before the setups were kept; null when its wheel text is not ours. */
function fromTexts(s: { tire: string; wheel: string }): Setup | null {
  const m = WHEEL_TEXT.exec(s.wheel);
  if (!m) return null;
  return {
    tire: s.tire,
    wheelDiameterIn: Number(m[1]),
    wheelWidthIn: Number(m[2]),
    position: { mode: "offset", offsetMm: Number(m[3]) },
    spacerMm: 0,
  };
}

/**
 * The comparison the drawing is made of: the summary's setups (or, for an older summary, its
 * wheel and tire texts) and the default vehicle figures, which the drawing does not use (the
 * axle ratio is kept for completeness). Null when the setups cannot be read or no longer pass
 * the comparison's checks: the PDF then prints without a drawing rather than a wrong one.
 */
export function quoteComparison(fit: FitmentSummary): ComparisonInput | null {
  const current = fit.setups?.current ?? fromTexts(fit.current);
  const planned = fit.setups?.planned ?? fromTexts(fit.planned);
  if (!current || !planned) return null;
  const checked = checkComparison({
    current,
    planned,
    vehicle: { ...DEFAULT_VEHICLE, axleRatio: fit.regear?.axleRatio ?? DEFAULT_VEHICLE.axleRatio },
  });
  return checked.ok ? checked.value : null;
}

/**
 * Draws each text's white halo as a text of its own under it: SVG's `paint-order: stroke`, which
 * the PDF's SVG reader does not know (it would paint the halo over the glyphs).
 */
const haloUnder: HostRewrite = (type, p) =>
  type === "text" && p.paintOrder === "stroke"
    ? [
        { ...p, paintOrder: undefined, fill: p.stroke, "data-label": undefined },
        { ...p, paintOrder: undefined, stroke: undefined, strokeWidth: undefined, strokeLinejoin: undefined },
      ]
    : [p];

export interface QuoteDrawing {
  svg: string;
  /** Width over height of the drawing. */
  aspect: number;
}

/** The drawing of a quote as SVG markup for the PDF, in inches (a US shop's quote); null as {@link quoteComparison}. */
export function quoteDrawing(fit: FitmentSummary): QuoteDrawing | null {
  const input = quoteComparison(fit);
  if (!input) return null;
  const drawing = buildDrawing(computeComparison(input), DEFAULT_PREFS);
  const v = drawing.layout.viewBox;
  return {
    svg: svgMarkup(<CrossSectionSvg drawing={drawing} id="quote-xsec" fontFamily="Body" />, haloUnder),
    aspect: v.w / v.h,
  };
}
