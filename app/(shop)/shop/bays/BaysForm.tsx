"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormProvider, useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import type { BaysSetup } from "@/lib/shop/bookings/api";
import { type BaysSetupInput, type BaysSetupValues, baysSetupSchema } from "@/lib/shop/bookings/schema";
import { BayListFields } from "./BayListFields";
import { ClosedDaysFields } from "./ClosedDaysFields";
import { ScheduleFields } from "./ScheduleFields";
import { ServiceTimeFields } from "./ServiceTimeFields";
import { WeekdayHoursFields } from "./WeekdayHoursFields";

/** The form's values from the server's setup (the services' labels stay beside, read-only). */
export function formValuesOf(setup: BaysSetup): BaysSetupInput {
  return {
    timeZone: setup.timeZone,
    slotStepMinutes: String(setup.slotStepMinutes),
    weekdays: setup.weekdays,
    closedDays: setup.closedDays,
    bays: setup.bays.map((b) => ({ id: b.id, name: b.name, kind: b.kind })),
    serviceTimes: setup.serviceTimes.map((s) => ({ catalogItemId: s.catalogItemId, minutes: String(s.minutes), bayKind: s.bayKind })),
  };
}

/** Every field key the server may name, so its errors land beside their fields. */
function fieldKeys(v: BaysSetupInput): string[] {
  return [
    "timeZone",
    "slotStepMinutes",
    ...v.weekdays.flatMap((_, i) => ["opens", "closes", "open"].map((f) => `weekdays.${i}.${f}`)),
    ...v.closedDays.flatMap((_, i) => ["day", "note"].map((f) => `closedDays.${i}.${f}`)),
    ...v.bays.flatMap((_, i) => ["id", "name", "kind"].map((f) => `bays.${i}.${f}`)),
    ...v.serviceTimes.flatMap((_, i) => ["catalogItemId", "minutes", "bayKind"].map((f) => `serviceTimes.${i}.${f}`)),
  ];
}

/** The owner's bays-and-hours form: one save for the week, the closed dates, the bays and the service times. */
export function BaysForm({ initial }: { initial: BaysSetup }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const form = useForm<BaysSetupInput, unknown, BaysSetupValues>({
    resolver: zodResolver(baysSetupSchema),
    defaultValues: formValuesOf(initial),
  });
  const onSubmit = form.handleSubmit(async () => {
    setMessage(null);
    // The text as typed goes to the server, which parses it with the same schema.
    const body = form.getValues();
    try {
      const { setup } = await api<{ setup: BaysSetup }>("/api/shop/bays", { method: "PUT", body });
      form.reset(formValuesOf(setup));
      setMessage({
        tone: "success",
        text: "Saved. New bookings follow these hours, bays and times; bookings already made keep their times.",
      });
      router.refresh();
    } catch (e) {
      const rest = applyFieldErrors(e, form.setError, fieldKeys(body));
      if (rest) setMessage({ tone: "error", text: rest });
    }
  });
  const invalid = Object.keys(form.formState.errors).length > 0;
  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
        <ScheduleFields />
        <WeekdayHoursFields />
        <ClosedDaysFields />
        <BayListFields />
        <ServiceTimeFields services={initial.serviceTimes} />
        <div aria-live="polite">
          {message && <Alert tone={message.tone}>{message.text}</Alert>}
          {!message && invalid && form.formState.isSubmitted && (
            <Alert tone="error">Some fields need attention: see the messages beside them.</Alert>
          )}
        </div>
        <Button type="submit" pending={form.formState.isSubmitting} className="self-start">
          Save bays and hours
        </Button>
      </form>
    </FormProvider>
  );
}
