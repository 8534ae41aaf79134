"use client";
import { useState } from "react";
import { FitmentInputError, requireTorqueNm, switchTorqueUnit, torqueEntryNm, torqueFromNm, type TorqueUnit } from "@/lib/fitment";
import { type TorqueStep, torqueBandRefusal, torqueFieldLabel } from "@/lib/shop/workOrders/schema";
import { FigureWithUnit } from "./FigureWithUnit";
import { type StepFieldGroupProps, errorAt } from "./stepForm";
import { TorquePlanView } from "./TorquePlanView";

/**
 * The maker's torque with its unit. Switching the unit converts the figure typed (NIST SP 811
 * B.9, through lib/fitment) rather than relabelling it; a figure that cannot be read keeps its
 * unit and says why. Below, the engine's passes and order for that figure, only for a figure the
 * step accepts (inside the fastener's band): no passes are drawn for a figure that will be refused.
 */
export function TorqueFields({
  form,
  idPrefix,
  boltCount,
  what,
  step,
}: StepFieldGroupProps & {
  boltCount: number | null;
  what: string;
  step: TorqueStep;
}) {
  const [switchError, setSwitchError] = useState<string | null>(null);
  const unit = form.watch("unit") as TorqueUnit;
  const text = form.watch("torque") as string;
  const label = torqueFieldLabel(unit);
  let nm: number | null = null;
  try {
    const read = torqueEntryNm({ text, unit, exact: null }, label);
    nm = read === null ? null : requireTorqueNm(read, unit, label);
    if (nm !== null && torqueBandRefusal(torqueFromNm(nm, unit), unit, step, label)) nm = null;
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
      <FigureWithUnit
        form={form}
        idPrefix={idPrefix}
        name="torque"
        label={label}
        placeholder="from the maker"
        hint={what}
        error={error}
        unit={{ name: "unit", value: unit, className: "w-32", onChange: onUnit }}
      />
      <TorquePlanView boltCount={boltCount} torqueNm={nm} unit={unit} />
    </>
  );
}
