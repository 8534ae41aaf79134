"use client";
import type { UseFormReturn } from "react-hook-form";
import { labelOptions } from "@/components/ui/labelOptions";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { FIELD_LABEL, MATCH_MOUNT_LABEL, MATCH_MOUNT_METHODS, type StepKind } from "@/lib/shop/workOrders/vocabulary";
import type { TirePressureLimits } from "@/lib/shop/workOrders/pressureLimit";
import { CheckField } from "./CheckField";
import { PressureFields } from "./PressureFields";
import { type StepValues, errorAt } from "./stepForm";
import { TorqueFields } from "./TorqueFields";

const READING_FIELDS = ["camberLeft", "camberRight", "casterLeft", "casterRight", "toeTotal"] as const;

/** The fields of one step's sign-off. */
export function StepFields({
  form,
  step,
  idPrefix,
  lugCount,
  pressureLimits = null,
}: {
  form: UseFormReturn<StepValues>;
  step: StepKind;
  idPrefix: string;
  lugCount: number;
  pressureLimits?: TirePressureLimits | null;
}) {
  const err = (path: string) => errorAt(form.formState.errors, path);
  const text = (
    name: string,
    label: string,
    extra: { hint?: string; inputMode?: "decimal" | "numeric" | "text"; className?: string } = {},
  ) => (
    <TextField
      id={`${idPrefix}-${name.replace(".", "-")}`}
      label={label}
      autoComplete="off"
      error={err(name)}
      className={extra.className ?? "w-48"}
      hint={extra.hint}
      inputMode={extra.inputMode}
      {...form.register(name)}
    />
  );
  const check = (name: string, label: string) => (
    <CheckField id={`${idPrefix}-${name}`} label={label} error={err(name)} {...form.register(name)} />
  );
  switch (step) {
    case "fitted":
      return (
        <div className="flex flex-wrap gap-3">
          {text("dotCode", FIELD_LABEL.dotCode, {
            inputMode: "numeric",
            hint: "Last four digits of the DOT code: week then year, e.g. 2326",
          })}
          {text("tire", FIELD_LABEL.tire, { className: "w-full sm:w-72" })}
          {text("wheel", FIELD_LABEL.wheel, { className: "w-full sm:w-72" })}
        </div>
      );
    case "match_mount":
      return (
        <SelectField
          id={`${idPrefix}-method`}
          label={FIELD_LABEL.method}
          error={err("method")}
          options={[{ value: "", label: "Pick what was lined up" }, ...labelOptions(MATCH_MOUNT_LABEL, { values: MATCH_MOUNT_METHODS })]}
          {...form.register("method")}
        />
      );
    case "beadlock": {
      const bolts = Number(form.watch("ringBolts"));
      return (
        <>
          {text("ringBolts", FIELD_LABEL.ringBolts, { inputMode: "numeric", hint: "Common: 16, 24, 30, 32" })}
          <TorqueFields
            form={form}
            idPrefix={idPrefix}
            boltCount={Number.isInteger(bolts) ? bolts : null}
            what="The ring maker's figure"
            step="beadlock"
          />
          {check("passesDone", FIELD_LABEL.passesDone)}
        </>
      );
    }
    case "bead_seat":
      return check("acknowledged", FIELD_LABEL.acknowledged);
    case "pressure":
      return <PressureFields form={form} idPrefix={idPrefix} limits={pressureLimits} />;
    case "balance":
      return (
        <div className="flex flex-wrap gap-3">
          {text("innerGrams", FIELD_LABEL.innerGrams, { inputMode: "decimal" })}
          {text("outerGrams", FIELD_LABEL.outerGrams, { inputMode: "decimal" })}
        </div>
      );
    case "lug_torque":
      return (
        <>
          <TorqueFields form={form} idPrefix={idPrefix} boltCount={lugCount} what="The vehicle maker's figure" step="lug_torque" />
          {check("passesDone", FIELD_LABEL.passesDone)}
        </>
      );
    case "alignment":
      return (
        <div className="grid gap-3 sm:grid-cols-2">
          {(["before", "after"] as const).map((when) => (
            <fieldset key={when} className="flex flex-col gap-2">
              <legend className="font-medium">{when === "before" ? "Before" : "After"}</legend>
              {READING_FIELDS.map((f) => text(`${when}.${f}`, FIELD_LABEL[f], { inputMode: "decimal" }))}
            </fieldset>
          ))}
        </div>
      );
    case "trimming":
      return (
        <>
          {check("trimmed", FIELD_LABEL.trimmed)}
          {text("note", FIELD_LABEL.note, { className: "w-full" })}
        </>
      );
  }
}
