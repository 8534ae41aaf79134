import { DESCENT_EM } from "@/lib/fitment/crossSectionLayout";
import type { Box } from "@/lib/fitment/crossSectionLayout";
import { r2, sx, sy } from "./svg";

/**
 * A text label in its laid-out box. A white halo behind the glyphs interrupts any line that runs
 * under the text (drafting breaks a line at its text), so a crossing extension line never makes
 * a figure unreadable. `rotated`: read bottom to top (the heights at the right).
 */
export function Label({
  id,
  box,
  text,
  fontMm,
  fill,
  italic = false,
  rotated = false,
  bold = false,
}: {
  id: string;
  box: Box;
  text: string;
  fontMm: number;
  fill: string;
  italic?: boolean;
  rotated?: boolean;
  bold?: boolean;
}) {
  // Baseline: the descent above the box's bottom (or its right side, turned), centred in the box.
  const inset = (DESCENT_EM + 0.02) * fontMm;
  const common = {
    fontSize: r2(fontMm),
    fill,
    fontStyle: italic ? "italic" : undefined,
    fontWeight: bold ? 600 : undefined,
    textAnchor: "middle" as const,
    stroke: "#ffffff",
    strokeWidth: r2(0.3 * fontMm),
    strokeLinejoin: "round" as const,
    paintOrder: "stroke",
    "data-label": id,
  };
  if (rotated) {
    const x = sx(box.x + box.w - inset);
    const y = sy(box.y + box.h / 2);
    return (
      <text x={x} y={y} transform={`rotate(-90 ${x} ${y})`} {...common}>
        {text}
      </text>
    );
  }
  return (
    <text x={sx(box.x + box.w / 2)} y={sy(box.y + inset)} {...common}>
      {text}
    </text>
  );
}
