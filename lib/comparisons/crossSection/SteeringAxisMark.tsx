import type { CrossSectionModel } from "@/lib/fitment/crossSection";
import { INK } from "./style";
import { linePath, r2 } from "./svg";

/**
 * The steering axis as lib/fitment/clearance.ts places it: through the current tire's contact
 * centre (zero scrub assumed) and leaning inboard by the kingpin inclination entered, crossing
 * the axle height `steeringAxisInboardMm` inboard of the hub face. Its label says the angle.
 */
export function SteeringAxisMark({ axis, mmPerPx }: { axis: NonNullable<CrossSectionModel["steeringAxis"]>; mmPerPx: number }) {
  const w = (px: number) => r2(px * mmPerPx);
  return (
    <path
      data-testid="steering-axis"
      d={linePath(axis.bottom, axis.top)}
      stroke={INK}
      strokeWidth={w(1.25)}
      strokeDasharray={`${w(14)} ${w(4)} ${w(3)} ${w(4)}`}
      fill="none"
    />
  );
}
