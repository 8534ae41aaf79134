"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { FieldFrame } from "@/components/ui/FieldFrame";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { formatBoltPattern, formatLength, parseBoltPattern } from "@/lib/fitment";
import { marginText } from "@/lib/garage/format";
import type { Vehicle } from "@/lib/garage/types";
import { FRONT_SUSPENSION_LABEL, type GarageVehicleForm, type GarageVehicleValues, garageVehicleSchema } from "@/lib/garage/schema";
import { EMPTY_SETUP_FORM, setupToForm } from "@/lib/setup/schema";
import { SetupFields } from "@/components/setup/SetupFields";

const FIELDS = [
  "name",
  "year",
  "make",
  "model",
  "trim",
  "frontSuspension",
  "boltPattern",
  "hubBoreMm",
  "liftHeightMm",
  "kingpinInclinationDeg",
  "axleRatio",
  "transmissionRatio",
  "clearanceMarginMm",
  "notes",
] as const;

/** The figures a vehicle may go without: each typed as a plain number (lift in inches, fractions too). */
const OPTIONAL_FIGURES = [
  { name: "hubBoreMm", label: "Hub bore (mm)", hint: "Optional, e.g. 106.1" },
  { name: "liftHeightMm", label: "Lift height (in)", hint: "Optional, in inches; fractions work, e.g. 2-1/2, 2½ or 2.5" },
  { name: "kingpinInclinationDeg", label: "Kingpin inclination (°)", hint: "Optional, from the maker's data, e.g. 8" },
  { name: "axleRatio", label: "Axle ratio", hint: "Optional, e.g. 3.73" },
  { name: "transmissionRatio", label: "Top-gear ratio", hint: "Optional, e.g. 0.72 (overdrive) or 1.00" },
] as const satisfies readonly { name: (typeof FIELDS)[number]; label: string; hint: string }[];

function toForm(v: Vehicle | null): GarageVehicleForm {
  if (!v) {
    return {
      name: "",
      year: "",
      make: "",
      model: "",
      trim: "",
      frontSuspension: "independent",
      boltPattern: "",
      hubBoreMm: "",
      stockSetup: EMPTY_SETUP_FORM,
      currentSetup: EMPTY_SETUP_FORM,
      liftHeightMm: "",
      kingpinInclinationDeg: "",
      axleRatio: "",
      transmissionRatio: "",
      clearanceMarginMm: "1/2 in",
      notes: "",
    };
  }
  const n = (x: number | null) => (x === null ? "" : String(x));
  return {
    name: v.name,
    year: n(v.year),
    make: v.make ?? "",
    model: v.model ?? "",
    trim: v.trim ?? "",
    frontSuspension: v.frontSuspension,
    boltPattern: v.boltPattern,
    hubBoreMm: n(v.hubBoreMm),
    stockSetup: setupToForm(v.stockSetup),
    currentSetup: setupToForm(v.currentSetup),
    liftHeightMm: v.liftHeightMm === null ? "" : formatLength(v.liftHeightMm, { unit: "in", fraction: 16 }),
    kingpinInclinationDeg: n(v.kingpinInclinationDeg),
    axleRatio: n(v.axleRatio),
    transmissionRatio: n(v.transmissionRatio),
    notes: v.notes,
    clearanceMarginMm: marginText(v.clearanceMarginMm),
  };
}

/** Create or edit a vehicle; the same zod schema as the route handlers. */
export function VehicleForm({ vehicle }: { vehicle: Vehicle | null }) {
  const router = useRouter();
  const qc = useQueryClient();
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm<GarageVehicleForm, unknown, GarageVehicleValues>({
    resolver: zodResolver(garageVehicleSchema),
    defaultValues: toForm(vehicle),
    mode: "onBlur",
  });
  const { register, handleSubmit, setError, formState, getValues, reset } = form;
  const e = formState.errors;
  const field = fieldBinder(form);
  const bolt = useWatch({ control: form.control, name: "boltPattern" });
  let boltNote: string | undefined;
  try {
    const bp = typeof bolt === "string" && bolt.trim() ? parseBoltPattern(bolt) : null;
    if (bp) boltNote = `Reads as ${formatBoltPattern(bp, "in")} in = ${formatBoltPattern(bp, "mm")} mm.`;
  } catch {
    boltNote = undefined;
  }

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      const res = vehicle
        ? await api<{ vehicle: Vehicle }>(`/api/vehicles/${vehicle.id}`, { method: "PATCH", body: values })
        : await api<{ vehicle: Vehicle }>("/api/vehicles", { body: values });
      await qc.invalidateQueries({ queryKey: queryKeys.garage.vehicle(res.vehicle.id) });
      router.push(`/garage/${res.vehicle.id}`);
      router.refresh();
    } catch (err) {
      setFailure(applyFieldErrors(err, setError, [...FIELDS]) ?? "Some fields need attention.");
    }
  });

  const copyStock = () => {
    const all = getValues();
    reset({ ...all, currentSetup: structuredClone(all.stockSetup) }, { keepErrors: false });
  };

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
      <Card className="grid grid-cols-[minmax(0,1fr)] gap-3 sm:grid-cols-2">
        <h2 className="text-lg font-semibold sm:col-span-2">The vehicle</h2>
        <TextField label="Name" hint="Your own name for it, e.g. Gravel hauler" {...field("name")} className="sm:col-span-2" />
        <TextField label="Year" inputMode="numeric" {...field("year")} />
        <TextField label="Make" hint="Free text" {...field("make")} />
        <TextField label="Model" hint="Free text" {...field("model")} />
        <TextField label="Trim" hint="Free text" {...field("trim")} />
        <SelectField
          label="Front suspension"
          options={Object.entries(FRONT_SUSPENSION_LABEL).map(([value, label]) => ({ value, label }))}
          {...field("frontSuspension")}
        />
        <TextField
          label="Bolt pattern"
          hint={boltNote ?? "e.g. 6x5.5 or 6x139.7 — inch and mm forms of one pattern are the same"}
          {...field("boltPattern")}
        />
        {OPTIONAL_FIGURES.map(({ name, label, hint }) => (
          <TextField key={name} label={label} hint={hint} {...field(name)} />
        ))}
        <TextField
          label="Clearance margin"
          hint="The gap you want kept at every measured point; 1/2 in if left empty (common practice, no source). Give the unit, e.g. 3/4 in or 15 mm"
          {...field("clearanceMarginMm")}
        />
        <FieldFrame label="Notes" name="notes" error={e.notes?.message} className="sm:col-span-2">
          {/* The frame gives the box its label, ids and message; the box keeps the plainer look it has always had. */}
          {(control) => (
            <textarea {...control} rows={3} className="rounded-lg border border-basalt-300 bg-white px-3 py-2" {...register("notes")} />
          )}
        </FieldFrame>
      </Card>
      <div className="grid gap-4 lg:grid-cols-2">
        <SetupFields form={form} name="stockSetup" legend="Stock setup (as it left the factory)" />
        <div className="flex flex-col gap-2">
          <SetupFields form={form} name="currentSetup" legend="Current setup (fitted now)" />
          <Button type="button" variant="ghost" onClick={copyStock} className="self-start">
            Copy the stock setup here
          </Button>
        </div>
      </div>
      <div className="flex gap-3">
        <Button type="submit" pending={formState.isSubmitting}>
          {vehicle ? "Save changes" : "Add vehicle"}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
