import { Badge } from "@/components/ui/Badge";
import type { ClearancePrediction } from "@/lib/fitment";
import { CLEARANCE_DIRECTION_LABEL, CLEARANCE_STATUS_LABEL } from "@/lib/garage/labels";
import type { VehicleClearance } from "@/lib/garage/types";

/**
 * Each measured point with its predicted gap and status (the vehicle page and the workspace).
 * `len` and `signed` format mm the way the page shows lengths.
 */
export function PredictionTable({
  points,
  predictions,
  len,
  signed,
  caption,
  testId,
}: {
  points: readonly Pick<VehicleClearance, "id" | "label" | "direction">[];
  predictions: readonly ClearancePrediction[];
  len: (mm: number) => string;
  signed: (mm: number) => string;
  caption: string;
  testId: string;
}) {
  return (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Predicted clearances (scrolls sideways on narrow screens)">
      <table className="w-full min-w-[560px] text-left text-sm" data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead className="text-xs uppercase tracking-wide text-basalt-500">
          <tr>
            <th className="py-2">Point</th>
            <th>Measured</th>
            <th>Change</th>
            <th>Predicted</th>
            <th>Status</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-basalt-100 tabular-nums">
          {predictions.map((p, i) => {
            const c = points[i]!;
            return (
              <tr key={c.id}>
                <td className="py-2 pr-2">
                  <span className="font-medium">{c.label}</span>
                  <span className="block text-xs text-basalt-500">{CLEARANCE_DIRECTION_LABEL[c.direction]}</span>
                </td>
                <td>{len(p.measuredMm)}</td>
                <td>{signed(p.changeMm)}</td>
                <td>{len(p.predictedMm)}</td>
                <td>
                  <Badge tone={p.status}>{CLEARANCE_STATUS_LABEL[p.status]}</Badge>
                  {p.shortfallMm > 0 && <span className="block text-xs text-basalt-600">needs {len(p.shortfallMm)}</span>}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
