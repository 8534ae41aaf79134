"use client";
import { useState } from "react";
import type { UseFormReturn } from "react-hook-form";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { FitmentInputError, requireTorqueNm, switchTorqueUnit, torqueEntryNm, type TorqueUnit } from "@/lib/fitment";
import { torqueFieldLabel } from "@/lib/shop/workOrders/schema";
import { FIELD_LABEL } from "@/lib/shop/workOrders/vocabulary";
import { type StepValues, errorAt } from "./stepForm";
import { TorquePlanView } from "./TorquePlanView";

/**
 * The maker's torque with its unit. Switching the unit converts the figure typed (NIST SP 811
 * B.9, through lib/fitment) rather than relabelling it; a figure that cannot be read keeps its
 * unit and says why. Below, the engine's passes and order for that figure.
 */
export function TorqueFields({
  form,
  idPrefix,
  boltCount,
  what,
}: {
  form: UseFormReturn<StepValues>;
  idPrefix: string;
  boltCount: number | null;
  what: string;
}) {
  const [switchError, setSwitchError] = useState<string | null>(null);
  const unit = form.watch("unit") as TorqueUnit;
  const text = form.watch("torque") as string;
  const label = torqueFieldLabel(unit);
  let nm: number | null = null;
  try {
    const read = torqueEntryNm({ text, unit, exact: null }, label);
    nm = read === null ? null : requireTorqueNm(read, unit, label);
  } catch {
    nm = null;
  }
  const onUnit = (to: TorqueUnit) => {
    try {
      const next = switchTorqueUnit({ text, unit, exact: null }, to, label);
      form.setValue("torque", next.text);
      form.setValue("unit", to);
      setSwitchError(null);
    } catch (e) {
      setSwitchError(`${e instanceof FitmentInputError ? e.message : label}. The unit stays until the figure reads as one number.`);
    }
  };
  const error = errorAt(form.formState.errors, "torque") ?? switchError ?? undefined;
  return (
    <>
      <div className="flex flex-wrap items-end gap-3">
        <TextField
          id={`${idPrefix}-torque`}
          className="w-48"
          label={label}
          inputMode="decimal"
          autoComplete="off"
          placeholder="from the maker"
          hint={what}
          error={error}
          {...form.register("torque")}
        />
        <SelectField
          id={`${idPrefix}-unit`}
          className="w-32"
          label={FIELD_LABEL.unit}
          name="unit"
          value={unit}
          onChange={(e) => onUnit(e.target.value as TorqueUnit)}
          options={[
            { value: "ftlb", label: "ft·lb" },
            { value: "nm", label: "N·m" },
          ]}
        />
      </div>
      <TorquePlanView boltCount={boltCount} torqueNm={nm} unit={unit} />
    </>
  );
}
