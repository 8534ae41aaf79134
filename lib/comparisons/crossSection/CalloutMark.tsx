import type { PlacedCallout } from "@/lib/fitment/crossSectionLayout";
import { Label } from "./Label";
import { MUTED } from "./style";
import { linePath, r2, sx, sy } from "./svg";

/** A feature's name above the drawing, joined to the feature by a leader with a dot on it. */
export function CalloutMark({
  c,
  fill,
  mmPerPx,
  fontMm,
  bold = false,
}: {
  c: PlacedCallout;
  fill: string;
  mmPerPx: number;
  fontMm: number;
  bold?: boolean;
}) {
  return (
    <g data-callout={c.id}>
      <path d={linePath(c.leader[0], c.leader[1])} stroke={MUTED} strokeOpacity={0.6} strokeWidth={r2(0.75 * mmPerPx)} fill="none" />
      <circle cx={sx(c.leader[0].x)} cy={sy(c.leader[0].y)} r={r2(1.6 * mmPerPx)} fill={MUTED} />
      <Label id={c.id} box={c.label} text={c.text} fontMm={fontMm} fill={fill} bold={bold} />
    </g>
  );
}
