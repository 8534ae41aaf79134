"use client";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";
import type { WorkOrder } from "@/lib/shop/workOrders/api";

/** The status moves a technician makes: into the bay, then done (the server checks every step is signed). */
export function StatusBar({ workOrder, onChange }: { workOrder: WorkOrder; onChange: (w: WorkOrder) => void }) {
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (workOrder.status === "done") return null;
  const to = workOrder.status === "booked" ? "in_bay" : "done";
  const move = async () => {
    setPending(true);
    setError(null);
    try {
      const r = await api<{ workOrder: WorkOrder }>(`/api/shop/work-orders/${workOrder.id}/status`, { method: "POST", body: { to } });
      onChange(r.workOrder);
    } catch (e) {
      setError((e as Error).message);
    }
    setPending(false);
  };
  return (
    <div className="flex flex-col gap-2 print:hidden">
      <Button type="button" className="self-start" pending={pending} onClick={() => void move()}>
        {to === "in_bay" ? "Start: the truck is in the bay" : "Mark the work order done"}
      </Button>
      <div aria-live="assertive">{error && <Alert tone="error">{error}</Alert>}</div>
    </div>
  );
}
