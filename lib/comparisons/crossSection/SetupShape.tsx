import type { Side } from "@/lib/fitment/crossSection";
import type { WheelSection } from "@/lib/fitment/wheelSection";
import { type SideStyle, WHEEL_FILL, dashOf } from "./style";
import { linePath, pathOf, r2 } from "./svg";

/**
 * One setup in section: the tire's two sections (below and above the axle) with the casing's inside, the rim with its
 * flanges, bead seats, humps and well, the disc, the mounting pad on the hub face, a spacer block
 * when there is one, and the rim centreline. The wheel is drawn over the tire, as the rim hides
 * the beads. Shapes and figures: lib/fitment/wheelSection.ts.
 */
export function SetupShape({ side, s, style, mmPerPx }: { side: Side; s: WheelSection; style: SideStyle; mmPerPx: number }) {
  const dash = dashOf(style.dashPx, mmPerPx);
  const w = (px: number) => r2(px * mmPerPx);
  return (
    <g data-setup={side} stroke={style.stroke} strokeDasharray={dash} strokeLinejoin="round">
      {s.shapes.tire.map((o, i) => (
        <path key={`t${i}`} d={pathOf(o)} fill={style.fill} strokeWidth={w(2)} />
      ))}
      {s.shapes.cavity.map((o, i) => (
        <path key={`c${i}`} d={pathOf(o)} fill="#ffffff" fillOpacity={0.55} stroke="none" />
      ))}
      {s.shapes.liner.map((o, i) => (
        <path key={`l${i}`} d={pathOf(o)} fill="none" strokeWidth={w(0.75)} />
      ))}
      {s.shapes.spacer.map((o, i) => (
        <path key={`s${i}`} d={pathOf(o)} fill={WHEEL_FILL} strokeWidth={w(1.25)} data-testid={i === 0 ? `spacer-${side}` : undefined} />
      ))}
      {[...s.shapes.disc, ...s.shapes.pad, ...s.shapes.rim].map((o, i) => (
        <path key={`w${i}`} d={pathOf(o)} fill={WHEEL_FILL} strokeWidth={w(1.25)} />
      ))}
      <path
        d={linePath(...s.shapes.centreline)}
        strokeWidth={w(0.75)}
        strokeDasharray={`${w(10)} ${w(3)} ${w(2)} ${w(3)}`}
        fill="none"
        data-centreline={side}
      />
    </g>
  );
}
