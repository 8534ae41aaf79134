"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { type ChangeEvent, useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/Button";
import { FailureRegion } from "@/components/ui/FailureRegion";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import {
  CLEARANCE_DIRECTION_LABEL,
  type ClearanceFormValues,
  type ClearanceValues,
  SUSPENSION_STATE_LABEL,
  clearanceSchema,
  distanceForUnit,
} from "@/lib/garage/schema";

/**
 * The form that records a measured gap. The unit select applies to a distance typed without
 * one; switching it converts such a figure (1.5 in → 38.1 mm) so the number typed is never
 * relabelled in a unit it was not measured in.
 */
export function AddPoint({ vehicleId }: { vehicleId: string }) {
  const qc = useQueryClient();
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm<ClearanceFormValues, unknown, ClearanceValues>({
    resolver: zodResolver(clearanceSchema),
    defaultValues: { label: "", direction: "inboard", distance: "", unit: "in", suspensionState: "ride-height" },
  });
  const { register, handleSubmit, formState, setError, reset, getValues, setValue } = form;
  const unitField = register("unit");
  const e = formState.errors;
  const field = fieldBinder(form);
  const onSubmit = handleSubmit(async () => {
    setFailure(null);
    try {
      await api(`/api/vehicles/${vehicleId}/clearances`, { body: getValues() });
      reset({ ...getValues(), label: "", distance: "" });
      await qc.invalidateQueries({ queryKey: queryKeys.garage.vehicle(vehicleId) });
    } catch (err) {
      setFailure(applyFieldErrors(err, setError, ["label", "direction", "distance", "unit", "suspensionState"]));
    }
  });
  const switchUnit = (ev: ChangeEvent<HTMLSelectElement>) => {
    const from = getValues("unit") ?? "in";
    const to = ev.target.value === "mm" ? "mm" : "in";
    const distance = String(getValues("distance") ?? "");
    void unitField.onChange(ev);
    const next = distanceForUnit(distance, from, to);
    if (next !== distance) setValue("distance", next, { shouldDirty: true });
  };
  const select = (name: "direction" | "suspensionState" | "unit", label: string, options: Record<string, string>) => (
    <div className="flex flex-col gap-1">
      <label htmlFor={`f-point-${name}`} className="text-sm font-medium text-basalt-800">
        {label}
      </label>
      <select
        id={`f-point-${name}`}
        className="min-h-10 w-full min-w-0 rounded-lg border border-basalt-300 bg-white px-3"
        {...(name === "unit" ? { ...unitField, onChange: switchUnit } : register(name))}
        aria-describedby={`f-point-${name}-error`}
      >
        {Object.entries(options).map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
      <p id={`f-point-${name}-error`} aria-live="polite" className="text-sm text-contact-600">
        {e[name]?.message}
      </p>
    </div>
  );
  return (
    <form onSubmit={onSubmit} noValidate className="no-print mt-5 border-t border-basalt-100 pt-4">
      <h3 className="font-semibold">Add a measured point</h3>
      <FailureRegion message={failure} alertClassName="mt-2" />
      <div className="mt-2 grid grid-cols-[minmax(0,1fr)] gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <TextField id="f-point-label" label="Point" hint='e.g. "frame rail, full left lock"' {...field("label")} />
        {select("direction", "Direction", CLEARANCE_DIRECTION_LABEL)}
        {select("suspensionState", "Suspension state", SUSPENSION_STATE_LABEL)}
        <TextField id="f-point-distance" label="Distance" hint="e.g. 1-1/2, 1.5 in or 38 mm" {...field("distance")} />
        {select("unit", "Unit (when the distance has none)", { in: "inches", mm: "millimetres" })}
      </div>
      <p className="mt-1 text-xs text-basalt-500">Recorded as measured with the current setup.</p>
      <Button type="submit" className="mt-3" pending={formState.isSubmitting}>
        Add point
      </Button>
    </form>
  );
}
