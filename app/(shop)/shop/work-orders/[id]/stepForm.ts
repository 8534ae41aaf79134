import { type FieldErrors, type UseFormReturn, get } from "react-hook-form";
import type { StepPosition } from "@/lib/platform/db/types";
import type { WorkOrder } from "@/lib/shop/workOrders/api";
import type { StepKind } from "@/lib/shop/workOrders/vocabulary";

/** The sign-off form's values as typed: text and ticks, nested for the alignment readings. */
export type StepValues = Record<string, string | boolean | Record<string, string>>;

/** What a group of a step's fields is handed: the step's form, and the prefix of its fields' ids. */
export interface StepFieldGroupProps {
  form: UseFormReturn<StepValues>;
  idPrefix: string;
}

const READINGS = { camberLeft: "", camberRight: "", casterLeft: "", casterRight: "", toeTotal: "" };

/** A step's empty form: the tire and wheel from the quote, ft·lb and psi first (the units US shops quote in). */
export function emptyStep(step: StepKind, position: StepPosition, w: Pick<WorkOrder, "tireDescription" | "wheelDescription">): StepValues {
  const base = { step, position };
  switch (step) {
    case "fitted":
      return { ...base, dotCode: "", tire: w.tireDescription, wheel: w.wheelDescription };
    case "match_mount":
      return { ...base, method: "" };
    case "beadlock":
      return { ...base, ringBolts: "24", torque: "", unit: "ftlb", passesDone: false };
    case "bead_seat":
      return { ...base, acknowledged: false };
    case "pressure":
      return { ...base, pressure: "", pressureUnit: "psi", makerTable: false };
    case "balance":
      return { ...base, innerGrams: "", outerGrams: "" };
    case "lug_torque":
      return { ...base, torque: "", unit: "ftlb", passesDone: false };
    case "alignment":
      return { ...base, before: { ...READINGS }, after: { ...READINGS } };
    case "trimming":
      return { ...base, trimmed: false, note: "" };
  }
}

/** Every field path a step's form has, for putting the server's field errors in place. */
export const fieldPaths = (values: StepValues): string[] =>
  Object.entries(values).flatMap(([k, v]) => (typeof v === "object" ? Object.keys(v).map((n) => `${k}.${n}`) : [k]));

/** The message of the error at a field path ("before.camberLeft"), if any. */
export const errorAt = (errors: FieldErrors<StepValues>, path: string): string | undefined =>
  (get(errors, path) as { message?: string } | undefined)?.message;
