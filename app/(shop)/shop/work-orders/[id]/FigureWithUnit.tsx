"use client";
import { labelOptions } from "@/components/ui/labelOptions";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { TORQUE_UNIT_SYMBOL } from "@/lib/fitment";
import { FIELD_LABEL, PRESSURE_UNITS } from "@/lib/shop/workOrders/vocabulary";
import type { StepFieldGroupProps } from "./stepForm";

/** The units each unit field offers: psi and kPa for the pressure, ft·lb and N·m for the torque. */
const UNIT_OPTIONS = {
  pressureUnit: PRESSURE_UNITS.map((u) => ({ value: u, label: u })),
  unit: labelOptions(TORQUE_UNIT_SYMBOL),
} as const;

/** The unit select beside a figure: its field in the step's form, the unit chosen, and the select's width. */
export interface UnitChoice<U extends string> {
  name: keyof typeof UNIT_OPTIONS;
  value: U;
  className: string;
  /** Converts the figure typed into the new unit (the caller's rule) rather than relabelling it. */
  onChange: (to: U) => void;
}

/**
 * A measured figure typed beside its unit, as the pressure and torque steps take them: a decimal
 * field registered in the step's form, then the unit select. Each field's id is the step's
 * prefix and the field's name, as the step's other fields have theirs.
 */
export function FigureWithUnit<U extends string>({
  form,
  idPrefix,
  name,
  label,
  hint,
  placeholder,
  error,
  unit,
}: StepFieldGroupProps & {
  name: "pressure" | "torque";
  label: string;
  hint: string;
  placeholder?: string;
  error: string | undefined;
  unit: UnitChoice<U>;
}) {
  // Tops aligned: a long hint under the figure would otherwise push its unit select down, away from the figure.
  return (
    <div className="flex flex-wrap items-start gap-3">
      <TextField
        id={`${idPrefix}-${name}`}
        className="w-48"
        label={label}
        inputMode="decimal"
        autoComplete="off"
        placeholder={placeholder}
        hint={hint}
        error={error}
        {...form.register(name)}
      />
      <SelectField
        id={`${idPrefix}-${unit.name}`}
        className={unit.className}
        label={FIELD_LABEL[unit.name]}
        name={unit.name}
        value={unit.value}
        onChange={(e) => unit.onChange(e.target.value as U)}
        options={UNIT_OPTIONS[unit.name]}
      />
    </div>
  );
}
