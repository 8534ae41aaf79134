"use client";
import { useFormContext } from "react-hook-form";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import type { BaysSetupInput } from "@/lib/shop/bookings/schema";
import { WEEKDAY_LABEL } from "@/lib/shop/bookings/vocabulary";

/** One row per weekday: open or not, and from when to when on the shop's clock. */
export function WeekdayHoursFields() {
  const { register, watch, formState } = useFormContext<BaysSetupInput>();
  const days = watch("weekdays");
  return (
    <Card>
      <h2 className="text-lg font-semibold">Opening hours</h2>
      <p className="text-sm text-basalt-600">A whole job fits within one day&apos;s hours; untick a day the shop is shut every week.</p>
      <ul className="mt-3 flex flex-col gap-2">
        {days.map((d, i) => {
          const name = WEEKDAY_LABEL[d.weekday]!;
          const err = formState.errors.weekdays?.[i];
          return (
            <li key={d.weekday} className="grid items-start gap-2 sm:grid-cols-[10rem_1fr_1fr]">
              <label className="flex min-h-10 items-center gap-2 text-sm font-medium">
                <input type="checkbox" {...register(`weekdays.${i}.open`)} className="size-4" />
                Open on {name}
              </label>
              <TextField
                label={`${name} opens`}
                type="time"
                disabled={!d.open}
                {...register(`weekdays.${i}.opens`)}
                error={err?.opens?.message}
              />
              <TextField
                label={`${name} closes`}
                type="time"
                disabled={!d.open}
                {...register(`weekdays.${i}.closes`)}
                error={err?.closes?.message}
              />
            </li>
          );
        })}
      </ul>
    </Card>
  );
}
