import type { PlacedLegendItem } from "@/lib/fitment/crossSectionLayout";
import { Label } from "./Label";
import { type SideStyle, dashOf } from "./style";
import { linePath, r2 } from "./svg";

/** A legend entry: a stroke drawn as the setup's lines are (solid or dashed), and its words. */
export function LegendMark({
  item,
  style,
  mmPerPx,
  fontMm,
}: {
  item: PlacedLegendItem;
  style: SideStyle;
  mmPerPx: number;
  fontMm: number;
}) {
  return (
    <g data-legend={item.id}>
      <path
        d={linePath(item.swatch[0], item.swatch[1])}
        stroke={style.stroke}
        strokeWidth={r2(2.5 * mmPerPx)}
        strokeDasharray={dashOf(style.dashPx, mmPerPx)}
        fill="none"
      />
      <Label
        id={item.id}
        box={item.label}
        text={item.text}
        fontMm={fontMm}
        fill={style.stroke}
        italic={style.fontStyle === "italic"}
        bold
      />
    </g>
  );
}
