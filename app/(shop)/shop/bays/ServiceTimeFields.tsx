"use client";
import { useFormContext } from "react-hook-form";
import { Card } from "@/components/ui/Card";
import { labelOptions } from "@/components/ui/labelOptions";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import type { ServiceTime } from "@/lib/shop/bookings/api";
import type { BaysSetupInput } from "@/lib/shop/bookings/schema";
import { BAY_KIND_LABEL, SERVICE_UNIT_WORD } from "@/lib/shop/bookings/vocabulary";

const KIND_OPTIONS = labelOptions(BAY_KIND_LABEL);

/** How long each catalog service keeps the truck, per unit it is sold in, and in which kind of bay. */
export function ServiceTimeFields({ services }: { services: ServiceTime[] }) {
  const { register, formState } = useFormContext<BaysSetupInput>();
  return (
    <Card>
      <h2 className="text-lg font-semibold">Service times</h2>
      <p className="text-sm text-basalt-600">
        A booking is as long as its quote&apos;s services: minutes per wheel, per vehicle, or per hour quoted. Times not set yet show a rule
        of thumb (common practice, no source): replace them with your own.
      </p>
      {services.length === 0 && <p className="mt-2 text-sm text-basalt-600">Your catalog has no services yet.</p>}
      <ul className="mt-3 flex flex-col gap-3">
        {services.map((s, i) => {
          const err = formState.errors.serviceTimes?.[i];
          const per = s.unit ? SERVICE_UNIT_WORD[s.unit] : "job";
          return (
            <li key={s.catalogItemId} className="grid items-start gap-2 sm:grid-cols-[1fr_12rem_14rem]">
              <p className="text-sm sm:pt-7">
                <span className="font-medium">{s.description}</span> <span className="text-basalt-500">({s.sku})</span>
                {s.isDefault && <span className="ml-1 text-xs text-tight-800">rule of thumb</span>}
              </p>
              <input type="hidden" {...register(`serviceTimes.${i}.catalogItemId`)} />
              <TextField
                label={`${s.description}: minutes per ${per}`}
                inputMode="numeric"
                {...register(`serviceTimes.${i}.minutes`)}
                error={err?.minutes?.message ?? err?.catalogItemId?.message}
              />
              <SelectField
                label={`${s.description}: bay`}
                options={KIND_OPTIONS}
                {...register(`serviceTimes.${i}.bayKind`)}
                error={err?.bayKind?.message}
              />
            </li>
          );
        })}
      </ul>
    </Card>
  );
}
