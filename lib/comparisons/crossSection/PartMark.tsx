import type { PlacedPart } from "@/lib/fitment/crossSection";
import { STATUS_STROKE } from "./style";
import { linePath, r2, sx, sy } from "./svg";

/**
 * A measured part where the measurement puts it, its predicted status told by shape as well as
 * colour: a cross for predicted contact, a triangle for closer than the margin, a circle when
 * clear (the label beside says the word).
 */
export function PartMark({ p, mmPerPx }: { p: PlacedPart; mmPerPx: number }) {
  if (!p.at) return null;
  const s = 5 * mmPerPx;
  const c = p.at;
  const stroke = STATUS_STROKE[p.status];
  const common = { stroke, strokeWidth: r2(2 * mmPerPx), "data-part": p.id, "data-status": p.status };
  if (p.status === "contact") {
    return (
      <path
        d={`${linePath({ x: c.x - s, y: c.y - s }, { x: c.x + s, y: c.y + s })} ${linePath({ x: c.x - s, y: c.y + s }, { x: c.x + s, y: c.y - s })}`}
        fill="none"
        {...common}
      />
    );
  }
  if (p.status === "tight") {
    return (
      <path
        d={`${linePath({ x: c.x, y: c.y + s }, { x: c.x + s, y: c.y - s }, { x: c.x - s, y: c.y - s })} Z`}
        fill="#ffffff"
        {...common}
      />
    );
  }
  return <circle cx={sx(c.x)} cy={sy(c.y)} r={r2(s * 0.8)} fill="#ffffff" {...common} />;
}
