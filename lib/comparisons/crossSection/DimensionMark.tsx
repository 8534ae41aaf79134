import type { PlacedDimension } from "@/lib/fitment/crossSectionLayout";
import type { Pt } from "@/lib/fitment/wheelSection";
import { Label } from "./Label";
import { type SideStyle, MUTED, dashOf } from "./style";
import { linePath, r2 } from "./svg";

/**
 * One dimension: extension lines from the features, the dimension line with an oblique tick at
 * each end (drafting's architectural tick: it reads at any length, where arrowheads would not fit
 * a 13 mm flange allowance), its continuation to a label set beside it, and the label.
 */
export function DimensionMark({
  d,
  style,
  mmPerPx,
  fontMm,
}: {
  d: PlacedDimension;
  style: SideStyle | null;
  mmPerPx: number;
  fontMm: number;
}) {
  const stroke = style?.stroke ?? MUTED;
  const t = 0.3 * fontMm;
  const tick = (p: Pt) => linePath({ x: p.x - t, y: p.y - t }, { x: p.x + t, y: p.y + t });
  return (
    <g data-dimension={d.id}>
      {d.extensions.map(([a, b], i) => (
        <path key={i} d={linePath(a, b)} stroke={stroke} strokeOpacity={0.55} strokeWidth={r2(0.75 * mmPerPx)} fill="none" />
      ))}
      <path
        d={linePath(d.line[0], d.line[1])}
        stroke={stroke}
        strokeWidth={r2(1.25 * mmPerPx)}
        strokeDasharray={dashOf(style?.dashPx ?? null, mmPerPx)}
        fill="none"
      />
      {d.run && <path d={linePath(...d.run)} stroke={stroke} strokeWidth={r2(0.75 * mmPerPx)} fill="none" />}
      <path d={`${tick(d.line[0])} ${tick(d.line[1])}`} stroke={stroke} strokeWidth={r2(1.5 * mmPerPx)} fill="none" />
      <Label
        id={d.id}
        box={d.label}
        text={d.text}
        fontMm={fontMm}
        fill={stroke}
        italic={style?.fontStyle === "italic"}
        rotated={d.rotated}
      />
    </g>
  );
}
