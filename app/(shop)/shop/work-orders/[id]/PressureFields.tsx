"use client";
import { kpaToPsi, psiToKpa } from "@/lib/fitment";
import { PRESSURE_EXAMPLE, pressureFieldLabel, readDecimal } from "@/lib/shop/workOrders/schema";
import { FIELD_LABEL, type PressureEntryUnit } from "@/lib/shop/workOrders/vocabulary";
import { type TirePressureLimits, isBelowRoadMinimum, toSetWords } from "@/lib/shop/workOrders/pressureLimit";
import { pressureWords } from "@/lib/shop/workOrders/signedText";
import { PRESSURE_CAUTION } from "@/lib/comparisons/pressureText";
import { CheckField } from "./CheckField";
import { FigureWithUnit } from "./FigureWithUnit";
import { type StepFieldGroupProps, errorAt } from "./stepForm";

/**
 * The cold pressure set, in psi or kPa; switching the unit converts the figure (NIST SP 811 B.8)
 * instead of relabelling it. A figure below the road minimum brings up the tick for the tire
 * maker's load table (pressureLimit.ts says why); without it the form and the server refuse it.
 */
export function PressureFields({
  form,
  idPrefix,
  limits = null,
}: StepFieldGroupProps & {
  /** The quoted tire's highest pressure and road minimum, shown beside the field; both are held to (pressureRefusal). */
  limits?: TirePressureLimits | null;
}) {
  const unit = form.watch("pressureUnit") as PressureEntryUnit;
  const typed = readDecimal(form.watch("pressure") as string, pressureFieldLabel(unit), 0, 10_000, PRESSURE_EXAMPLE[unit]);
  const below = typeof typed === "number" && isBelowRoadMinimum(unit === "kPa" ? typed : psiToKpa(typed), unit, limits);
  const ticked = form.watch("makerTable") === true;
  const onUnit = (to: PressureEntryUnit) => {
    const text = form.getValues("pressure") as string;
    if (text.trim() !== "") {
      const n = readDecimal(text, pressureFieldLabel(unit), 0, 10_000, PRESSURE_EXAMPLE[unit]);
      // A figure that cannot be read keeps its unit: relabelling it would claim a reading nobody took.
      if (typeof n === "string")
        return form.setError("pressure", { type: "unit", message: `${n} The unit stays ${unit} until it reads as one number.` });
      form.setValue("pressure", to === "kPa" ? String(Math.round(psiToKpa(n))) : String(Math.round(kpaToPsi(n) * 10) / 10));
    }
    form.setValue("pressureUnit", to);
  };
  return (
    <>
      <FigureWithUnit
        form={form}
        idPrefix={idPrefix}
        name="pressure"
        label={pressureFieldLabel(unit)}
        hint={`${
          limits?.toSet ? `Cold pressure to set (from the door placard on the quote): ${toSetWords(limits.toSet, unit)}. ` : ""
        }Cold, to the figure for this tire and load (door placard or the tire maker's load table).${
          limits
            ? ` ${limits.tire}: at most ${pressureWords(limits.maxKpa, unit)}, road minimum ${pressureWords(limits.minimumKpa, unit)}.`
            : ""
        } ${PRESSURE_CAUTION}`}
        error={errorAt(form.formState.errors, "pressure")}
        unit={{ name: "pressureUnit", value: unit, className: "w-28", onChange: onUnit }}
      />
      {(below || ticked) && (
        <CheckField
          id={`${idPrefix}-makerTable`}
          label={FIELD_LABEL.makerTable}
          error={errorAt(form.formState.errors, "makerTable")}
          {...form.register("makerTable")}
        />
      )}
    </>
  );
}
