"use client";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { Alert } from "@/components/ui/Alert";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";

/** The booked quote's way into the bay: its work order, made on first open. */
export function OpenWorkOrder({ quoteId, workOrderId }: { quoteId: string; workOrderId: string | null }) {
  const router = useRouter();
  const open = useMutation({
    mutationFn: () => api<{ id: string }>("/api/shop/work-orders", { body: { quoteId } }),
    onSuccess: (r) => router.push(`/shop/work-orders/${r.id}`),
  });
  // Made, the button stays pending while the page moves to the work order.
  const pending = open.isPending || open.isSuccess;
  return (
    <Card className="mt-5 flex flex-col gap-2" role="region" aria-label="Work order">
      <h2 className="text-lg font-semibold">Work order</h2>
      <p className="text-sm text-basalt-600">The sheet the technician signs step by step in the bay; it prints too.</p>
      {workOrderId ? (
        <Link className={buttonClass("secondary", "self-start")} href={`/shop/work-orders/${workOrderId}`}>
          Open the work order
        </Link>
      ) : (
        <Button type="button" variant="secondary" className="self-start" pending={pending} onClick={() => open.mutate()}>
          Open the work order
        </Button>
      )}
      <div aria-live="assertive">{open.error && <Alert tone="error">{open.error.message}</Alert>}</div>
    </Card>
  );
}
