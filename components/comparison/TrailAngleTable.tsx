import { formatNumber } from "@/lib/comparisons/format";
import { TRAIL_ANGLE_NAME as NAME, type TrailAngle } from "@/lib/comparisons/trailPlan";
import { ColumnHeads } from "./ColumnHeads";

/** Approach, departure and breakover with the current and the planned tires, and the change (degrees in every unit system). */
export function TrailAngleTable({ angles }: { angles: TrailAngle[] }) {
  return (
    <table className="w-full text-sm" data-testid="trail-angles">
      <thead>
        <ColumnHeads names={["Angle", "Current", "Planned", "Change"]} />
      </thead>
      <tbody>
        {angles.map((a) => (
          <tr key={a.kind} className="border-t border-basalt-100" data-testid={`angle-${a.kind}`}>
            <th scope="row" className="py-2 pr-3 text-left font-semibold">
              {NAME[a.kind]}
            </th>
            <td className="py-2 pr-3">{formatNumber(a.currentDeg, 1)}°</td>
            <td className="py-2 pr-3">{formatNumber(a.plannedDeg, 1)}°</td>
            <td className="py-2">{formatNumber(a.plannedDeg - a.currentDeg, 1, { signed: true })}°</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
