"use client";
import { useFieldArray, useFormContext } from "react-hook-form";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import type { BaysSetupInput } from "@/lib/shop/bookings/schema";

/** Dates the shop is shut besides its weekly closed days (holidays, stock counts). */
export function ClosedDaysFields() {
  const { control, register, formState } = useFormContext<BaysSetupInput>();
  const { fields, append, remove } = useFieldArray({ control, name: "closedDays" });
  return (
    <Card>
      <h2 className="text-lg font-semibold">Closed days</h2>
      {fields.length === 0 && <p className="mt-2 text-sm text-basalt-600">No closed dates set.</p>}
      <ul className="mt-3 flex flex-col gap-2">
        {fields.map((f, i) => {
          const err = formState.errors.closedDays?.[i];
          return (
            <li key={f.id} className="grid items-start gap-2 sm:grid-cols-[12rem_1fr_auto]">
              <TextField label={`Closed day ${i + 1}`} type="date" {...register(`closedDays.${i}.day`)} error={err?.day?.message} />
              <TextField
                label={`Why closed (day ${i + 1})`}
                {...register(`closedDays.${i}.note`)}
                error={err?.note?.message}
                placeholder="e.g. Holiday"
              />
              <Button type="button" variant="ghost" className="sm:mt-6" onClick={() => remove(i)} aria-label={`Remove closed day ${i + 1}`}>
                Remove
              </Button>
            </li>
          );
        })}
      </ul>
      <Button type="button" variant="secondary" className="mt-3" onClick={() => append({ day: "", note: "" })}>
        Add a closed day
      </Button>
    </Card>
  );
}
