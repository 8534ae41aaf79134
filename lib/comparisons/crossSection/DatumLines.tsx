import type { CrossSectionModel } from "@/lib/fitment/crossSection";
import { INK, MUTED, SIDE_STYLE, dashOf } from "./style";
import { linePath, r2 } from "./svg";

/**
 * The references everything is measured from: the axle line (shared by both setups), the hub
 * mounting face (x = 0), and each setup's ground, solid for the current one and dashed for the
 * planned one (a taller tire's ground lies lower: the vehicle rises by the ground-clearance change).
 */
export function DatumLines({ model, mmPerPx }: { model: CrossSectionModel; mmPerPx: number }) {
  const e = model.extents;
  const w = (px: number) => r2(px * mmPerPx);
  const hub = Math.max(model.current.pad.outerRadiusMm, model.planned.pad.outerRadiusMm) + 15;
  return (
    <g fill="none">
      <path
        d={linePath({ x: e.minX, y: model.axleY }, { x: e.maxX, y: model.axleY })}
        stroke={MUTED}
        strokeWidth={w(0.75)}
        strokeDasharray={`${w(12)} ${w(3)} ${w(2)} ${w(3)}`}
      />
      <path
        data-testid="hub-face"
        d={linePath({ x: 0, y: model.axleY - hub }, { x: 0, y: model.axleY + hub })}
        stroke={INK}
        strokeWidth={w(2.5)}
      />
      {(["current", "planned"] as const).map((side) => {
        const y = model[side].groundY;
        const st = SIDE_STYLE[side];
        return (
          <path
            key={side}
            data-ground={side}
            d={linePath({ x: e.minX, y }, { x: e.maxX, y })}
            stroke={st.stroke}
            strokeWidth={w(1.5)}
            strokeDasharray={dashOf(st.dashPx, mmPerPx)}
          />
        );
      })}
    </g>
  );
}
