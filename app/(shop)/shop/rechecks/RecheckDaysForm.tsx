"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { recheckSettingSchema } from "@/lib/shop/workOrders/schema";

type Values = z.input<typeof recheckSettingSchema>;

/** The owner's number of days between the work done and the re-check mail. */
export function RecheckDaysForm({ days }: { days: number }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Values>({
    resolver: zodResolver(recheckSettingSchema),
    defaultValues: { days: String(days) },
  });
  const save = handleSubmit(async (values) => {
    setMessage(null);
    try {
      const r = await api<{ days: number }>("/api/shop/rechecks", { method: "PUT", body: values });
      setMessage({ tone: "success", text: `Saved: customers are e-mailed ${r.days} days after their work is done.` });
      router.refresh();
    } catch (e) {
      const rest = applyFieldErrors(e, setError, ["days"]);
      if (rest) setMessage({ tone: "error", text: rest });
    }
  });
  return (
    <Card>
      <form className="flex flex-wrap items-end gap-3" onSubmit={(e) => void save(e)} noValidate>
        <TextField
          className="w-48"
          label="Re-check after (days)"
          inputMode="numeric"
          hint="Roughly the first 50–100 miles of driving (common practice, no source)"
          error={formState.errors.days?.message}
          {...register("days")}
        />
        <Button type="submit" pending={formState.isSubmitting} className="mb-6">
          Save
        </Button>
      </form>
      <div aria-live="polite">{message && <Alert tone={message.tone}>{message.text}</Alert>}</div>
    </Card>
  );
}
