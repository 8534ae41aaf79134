"use client";
import { useFieldArray, useFormContext } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { labelOptions } from "@/components/ui/labelOptions";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import type { BaysSetupInput } from "@/lib/shop/bookings/schema";
import { BAY_KIND_LABEL } from "@/lib/shop/bookings/vocabulary";

const KIND_OPTIONS = labelOptions(BAY_KIND_LABEL);

/** The shop's bays, in the order slots try them. A removed bay keeps its past bookings. */
export function BayListFields() {
  const { control, register, formState } = useFormContext<BaysSetupInput>();
  const { fields, append, remove } = useFieldArray({ control, name: "bays" });
  return (
    <Card>
      <h2 className="text-lg font-semibold">Bays</h2>
      <p className="text-sm text-basalt-600">
        A job takes one bay of each kind its work needs, one after the other: fabrication bay, then lift bay, then alignment rack.
      </p>
      <Alert tone="warning" className="mt-2">
        Lifting a truck is the lift maker&apos;s and your local code&apos;s business: list only bays whose lift is rated for the trucks you
        book into it.
      </Alert>
      {fields.length === 0 && <p className="mt-2 text-sm text-basalt-600">No bays yet: customers cannot book until you add one.</p>}
      <ul className="mt-3 flex flex-col gap-2">
        {fields.map((f, i) => {
          const err = formState.errors.bays?.[i];
          return (
            <li key={f.id} className="grid items-start gap-2 sm:grid-cols-[1fr_14rem_auto]">
              <input type="hidden" {...register(`bays.${i}.id`)} />
              <TextField
                label={`Bay ${i + 1} name`}
                {...register(`bays.${i}.name`)}
                error={err?.name?.message ?? err?.id?.message}
                placeholder="e.g. Lift 1"
              />
              <SelectField label={`Bay ${i + 1} kind`} options={KIND_OPTIONS} {...register(`bays.${i}.kind`)} error={err?.kind?.message} />
              <Button type="button" variant="ghost" className="sm:mt-6" onClick={() => remove(i)} aria-label={`Remove bay ${i + 1}`}>
                Remove
              </Button>
            </li>
          );
        })}
      </ul>
      <Button type="button" variant="secondary" className="mt-3" onClick={() => append({ id: "", name: "", kind: "lift_bay" })}>
        Add a bay
      </Button>
    </Card>
  );
}
