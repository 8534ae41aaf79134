import { type FigureColumn, FigureTable } from "@/components/ui/FigureTable";
import { formatNumber } from "@/lib/comparisons/format";
import { TRAIL_ANGLE_NAME as NAME, type TrailAngle } from "@/lib/comparisons/trailPlan";

const COLUMNS: FigureColumn<TrailAngle>[] = [
  { id: "angle", header: "Angle", cell: (a) => NAME[a.kind] },
  { id: "current", header: "Current", cell: (a) => `${formatNumber(a.currentDeg, 1)}°` },
  { id: "planned", header: "Planned", cell: (a) => `${formatNumber(a.plannedDeg, 1)}°` },
  { id: "change", header: "Change", cell: (a) => `${formatNumber(a.plannedDeg - a.currentDeg, 1, { signed: true })}°` },
];

/** Approach, departure and breakover with the current and the planned tires, and the change (degrees in every unit system). */
export function TrailAngleTable({ angles }: { angles: TrailAngle[] }) {
  return (
    <FigureTable
      look="quiet"
      columns={COLUMNS}
      rows={angles}
      rowKey={(a) => a.kind}
      rowTestId={(a) => `angle-${a.kind}`}
      testId="trail-angles"
    />
  );
}
