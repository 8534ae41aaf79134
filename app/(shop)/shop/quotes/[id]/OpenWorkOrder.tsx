"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";

/** The booked quote's way into the bay: its work order, made on first open. */
export function OpenWorkOrder({ quoteId, workOrderId }: { quoteId: string; workOrderId: string | null }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const open = async () => {
    setPending(true);
    setError(null);
    try {
      const r = await api<{ id: string }>("/api/shop/work-orders", { body: { quoteId } });
      router.push(`/shop/work-orders/${r.id}`);
    } catch (e) {
      setError((e as Error).message);
      setPending(false);
    }
  };
  return (
    <Card className="mt-5 flex flex-col gap-2" role="region" aria-label="Work order">
      <h2 className="text-lg font-semibold">Work order</h2>
      <p className="text-sm text-basalt-600">The sheet the technician signs step by step in the bay; it prints too.</p>
      {workOrderId ? (
        <Link className={buttonClass("secondary", "self-start")} href={`/shop/work-orders/${workOrderId}`}>
          Open the work order
        </Link>
      ) : (
        <Button type="button" variant="secondary" className="self-start" pending={pending} onClick={() => void open()}>
          Open the work order
        </Button>
      )}
      <div aria-live="assertive">{error && <Alert tone="error">{error}</Alert>}</div>
    </Card>
  );
}
