import { WorkOrderButton } from "@/components/bookings/WorkOrderButton";
import { Card } from "@/components/ui/Card";

/** The booked quote's way into the bay: its work order, made on first open. */
export function OpenWorkOrder({ quoteId, workOrderId }: { quoteId: string; workOrderId: string | null }) {
  return (
    <Card className="mt-5 flex flex-col gap-2" role="region" aria-label="Work order">
      <h2 className="text-lg font-semibold">Work order</h2>
      <p className="text-sm text-basalt-600">The sheet the technician signs step by step in the bay; it prints too.</p>
      <WorkOrderButton quoteId={quoteId} workOrderId={workOrderId} />
    </Card>
  );
}
