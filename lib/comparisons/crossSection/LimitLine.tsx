import type { CrossSectionModel } from "@/lib/fitment/crossSection";
import { LIMIT } from "./style";
import { r2, sy } from "./svg";

/**
 * A vertical limit over the drawing's height: the vehicle's inner limit and fender lip (nearest
 * measured parts, drawn where they are), or the fender line typed in the comparison. Its x is the
 * figure itself in mm, unrounded, so the line sits exactly at the number the reader entered.
 */
export function LimitLine({
  limit,
  model,
  mmPerPx,
}: {
  limit: CrossSectionModel["limits"][number];
  model: CrossSectionModel;
  mmPerPx: number;
}) {
  const e = model.extents;
  const dash = limit.id === "fender-line" ? [3, 4] : [8, 3];
  return (
    <line
      data-testid={limit.id}
      x1={limit.x}
      x2={limit.x}
      y1={sy(e.minY)}
      y2={sy(e.maxY)}
      stroke={LIMIT}
      strokeWidth={r2((limit.id === "fender-line" ? 1.25 : 1.75) * mmPerPx)}
      strokeDasharray={dash.map((v) => r2(v * mmPerPx)).join(" ")}
    />
  );
}
