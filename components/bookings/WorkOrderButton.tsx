"use client";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { Alert } from "@/components/ui/Alert";
import { Button, buttonClass } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";

/**
 * "Open the work order" of a booked job: a link once it exists, else a button that makes it (any
 * of the shop's staff may) and goes there. The quote page and the calendar both offer it, so a
 * technician reaches the sheet of a job whose quote someone else wrote.
 */
export function WorkOrderButton({
  quoteId,
  workOrderId,
  variant = "secondary",
}: {
  quoteId: string;
  workOrderId: string | null;
  variant?: "primary" | "secondary";
}) {
  const router = useRouter();
  const open = useMutation({
    mutationFn: () => api<{ id: string }>("/api/shop/work-orders", { body: { quoteId } }),
    onSuccess: (r) => router.push(`/shop/work-orders/${r.id}`),
  });
  // Made, the button stays pending while the page moves to the work order.
  const pending = open.isPending || open.isSuccess;
  return (
    <>
      {workOrderId ? (
        <Link className={buttonClass(variant, "self-start")} href={`/shop/work-orders/${workOrderId}`}>
          Open the work order
        </Link>
      ) : (
        <Button type="button" variant={variant} className="self-start" pending={pending} onClick={() => open.mutate()}>
          Open the work order
        </Button>
      )}
      <div aria-live="assertive">{open.error && <Alert tone="error">{open.error.message}</Alert>}</div>
    </>
  );
}
