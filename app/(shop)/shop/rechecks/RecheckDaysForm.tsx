"use client";
import { recheckSettingSchema } from "@/lib/shop/workOrders/schema";
import { NumberSettingForm } from "./NumberSettingForm";

/** The owner's number of days between the work done and the re-check mail. */
export function RecheckDaysForm({ days }: { days: number }) {
  return (
    <NumberSettingForm
      name="days"
      value={days}
      label="Re-check after (days)"
      hint="Roughly the first 50–100 miles of driving (common practice, no source)"
      schema={recheckSettingSchema}
      url="/api/shop/rechecks"
      saved={(n) => `Saved: customers are e-mailed ${n} days after their work is done.`}
    />
  );
}
