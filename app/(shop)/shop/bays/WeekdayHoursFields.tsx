"use client";
import { useFormContext } from "react-hook-form";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import type { BaysSetupInput } from "@/lib/shop/bookings/schema";
import { WEEKDAY_LABEL } from "@/lib/shop/bookings/vocabulary";

/** One row per weekday: open or not, and from when to when on the shop's clock. */
export function WeekdayHoursFields() {
  const form = useFormContext<BaysSetupInput>();
  const { register, watch } = form;
  const field = fieldBinder(form);
  const days = watch("weekdays");
  return (
    <Card>
      <h2 className="text-lg font-semibold">Opening hours</h2>
      <p className="text-sm text-basalt-600">A whole job fits within one day&apos;s hours; untick a day the shop is shut every week.</p>
      <ul className="mt-3 flex flex-col gap-2">
        {days.map((d, i) => {
          const name = WEEKDAY_LABEL[d.weekday]!;
          return (
            <li key={d.weekday} className="grid items-start gap-2 sm:grid-cols-[10rem_1fr_1fr]">
              <label className="flex min-h-10 items-center gap-2 text-sm font-medium">
                <input type="checkbox" {...register(`weekdays.${i}.open`)} className="size-4" />
                Open on {name}
              </label>
              <TextField label={`${name} opens`} type="time" disabled={!d.open} {...field(`weekdays.${i}.opens`)} />
              <TextField label={`${name} closes`} type="time" disabled={!d.open} {...field(`weekdays.${i}.closes`)} />
            </li>
          );
        })}
      </ul>
    </Card>
  );
}
