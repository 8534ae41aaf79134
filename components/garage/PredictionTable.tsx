import { PredictionNote } from "@/components/garage/PredictionNote";
import { Badge } from "@/components/ui/Badge";
import type { ClearancePrediction } from "@/lib/fitment";
import { CLEARANCE_BASIS_LABEL, CLEARANCE_DIRECTION_LABEL, CLEARANCE_STATUS_LABEL, SUSPENSION_STATE_LABEL } from "@/lib/garage/labels";
import type { VehicleClearance } from "@/lib/garage/types";

/**
 * Each measured point with its predicted gap, status and the geometry that decided it (the
 * vehicle page and the workspace), followed by the "how this is predicted" note. `len` and
 * `signed` format mm the way the page shows lengths; `axisInboardMm` is the steering axis the
 * caller placed (see lib/garage/predict.ts), for the note.
 */
export function PredictionTable({
  points,
  predictions,
  len,
  signed,
  caption,
  testId,
  axisInboardMm,
  noteLen,
}: {
  points: readonly Pick<VehicleClearance, "id" | "label" | "direction">[];
  predictions: readonly ClearancePrediction[];
  len: (mm: number) => string;
  signed: (mm: number) => string;
  caption: string;
  testId: string;
  axisInboardMm?: number | null;
  /** How the note writes the axis's distance (one unit, the reader's); millimetres when not given. */
  noteLen?: (mm: number) => string;
}) {
  return (
    <div>
      <div
        className="scroll-cue relative overflow-x-auto"
        tabIndex={0}
        role="region"
        aria-label="Predicted clearances (scrolls sideways on narrow screens)"
      >
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
                    <span className="block text-xs text-basalt-500">
                      {CLEARANCE_DIRECTION_LABEL[c.direction]} · {SUSPENSION_STATE_LABEL[p.state]}
                    </span>
                    <span className="block text-xs text-basalt-500">By: {CLEARANCE_BASIS_LABEL[p.basis]}</span>
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
      <PredictionNote axisInboardMm={axisInboardMm} len={noteLen} />
    </div>
  );
}
