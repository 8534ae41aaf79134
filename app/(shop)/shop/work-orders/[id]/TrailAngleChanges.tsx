import { Card } from "@/components/ui/Card";
import { FigureTable } from "@/components/ui/FigureTable";
import type { WorkOrder } from "@/lib/shop/workOrders/api";

type Angles = NonNullable<WorkOrder["trailAngles"]>;

/**
 * The quote's trail angles on the technician's sheet (and on paper): now, then with the tires
 * going on, with the same caution the quote carried, so the hand-back can mention them.
 */
export function TrailAngleChanges({ angles }: { angles: Angles }) {
  return (
    <Card className="flex flex-col gap-2 print:break-inside-avoid print:p-2 print:shadow-none" role="region" aria-label="Trail angles">
      <h2 className="text-lg font-semibold">Trail angles with these tires</h2>
      {angles.rows.length > 0 && (
        <FigureTable
          look="quiet"
          caption="As quoted, from the body points measured at the counter"
          rows={angles.rows}
          rowKey={(r) => r.label}
          rowTestId={(r) => `trail-${r.label}`}
          columns={[
            { id: "angle", header: "Angle", cell: (r) => r.label },
            { id: "change", header: "Now → with these tires", cell: (r) => r.change, align: "end" },
          ]}
        />
      )}
      {angles.notes.map((n) => (
        <p key={n} className="text-sm text-basalt-700">
          {n}
        </p>
      ))}
      <p className="text-xs text-basalt-600">{angles.caution}</p>
    </Card>
  );
}
