"use client";
import { useFormContext } from "react-hook-form";
import { Card } from "@/components/ui/Card";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import type { BaysSetupInput } from "@/lib/shop/bookings/schema";
import { SLOT_STEPS } from "@/lib/shop/bookings/vocabulary";

/** A few zones a shop in the US is likely in; any IANA name is accepted. */
const ZONES = [
  "America/New_York",
  "America/Chicago",
  "America/Denver",
  "America/Phoenix",
  "America/Los_Angeles",
  "America/Anchorage",
  "Pacific/Honolulu",
];

export function ScheduleFields() {
  const field = fieldBinder(useFormContext<BaysSetupInput>());
  return (
    <Card>
      <h2 className="text-lg font-semibold">Clock</h2>
      <div className="mt-3 grid gap-3 sm:grid-cols-2">
        <TextField
          label="Time zone"
          list="bays-time-zones"
          autoComplete="off"
          {...field("timeZone")}
          hint="Opening hours, closed days and every booking are on this clock, e.g. America/Denver."
        />
        <datalist id="bays-time-zones">
          {ZONES.map((z) => (
            <option key={z} value={z} />
          ))}
        </datalist>
        <SelectField
          label="Offer start times every"
          options={SLOT_STEPS.map((s) => ({ value: String(s), label: `${s} minutes` }))}
          {...field("slotStepMinutes")}
          hint="Counted from the opening time."
        />
      </div>
    </Card>
  );
}
