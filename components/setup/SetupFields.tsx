"use client";
import type { ComponentProps } from "react";
import { type FieldValues, type Path, type UseFormReturn, get, useWatch } from "react-hook-form";
import { TextField } from "@/components/ui/TextField";
import { SETUP_FIELD_LABEL as L } from "@/lib/setup/fields";

/**
 * The inputs of one setup (tire, wheel, offset or backspacing with its reference, spacer),
 * registered under `name` in any form whose schema nests lib/setup/schema.ts there: the garage's
 * vehicle and planned-setup forms and the shop counter's vehicle. `spacer={false}` leaves the
 * spacer out where the figures read none.
 */
export function SetupFields<T extends FieldValues>({
  form,
  name,
  legend,
  tone = "steel",
  spacer = true,
}: {
  form: UseFormReturn<T>;
  name: string;
  legend: string;
  tone?: "steel" | "ember";
  spacer?: boolean;
}) {
  const { register, formState } = form;
  const p = (k: string) => `${name}.${k}` as Path<T>;
  const err = (k: string) => (get(formState.errors, `${name}.${k}`) as { message?: string } | undefined)?.message;
  const mode = useWatch({ control: form.control, name: p("position.mode") }) as string | undefined;
  const reference = useWatch({ control: form.control, name: p("position.reference") }) as string | undefined;
  const id = (k: string) => `f-${name}-${k}`.replace(/\./g, "-");
  /** A registered figure: its label and message go by its field path, its id by a short name. */
  const field = (
    path: keyof typeof L,
    short: string,
    extra: Pick<ComponentProps<typeof TextField>, "inputMode" | "hint" | "className"> = {},
  ) => <TextField id={id(short)} label={L[path]} {...extra} {...register(p(path))} error={err(path)} />;
  return (
    <fieldset
      className={`rounded-card border p-4 ${tone === "ember" ? "border-ember-200 bg-ember-50/40" : "border-steel-200 bg-steel-50/40"}`}
    >
      <legend className="px-1 text-sm font-semibold text-basalt-900">{legend}</legend>
      <div className="grid gap-3 sm:grid-cols-2">
        {field("tire", "tire", { hint: "e.g. 265/70R17, LT285/75R16 or 35x12.50R17LT", className: "sm:col-span-2" })}
        {field("wheelDiameterIn", "d", { inputMode: "decimal" })}
        {field("wheelWidthIn", "w", { hint: "Fractions work: 8-1/2 or 8½" })}
      </div>
      <div role="radiogroup" aria-label={`${legend}: how the wheel position is given`} className="mt-3 flex flex-wrap gap-4 text-sm">
        <label className="flex items-center gap-2">
          <input type="radio" value="offset" {...register(p("position.mode"))} /> Offset (mm)
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" value="backspacing" {...register(p("position.mode"))} /> Backspacing (in)
        </label>
      </div>
      {mode === "backspacing" ? (
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          {field("position.backspacingIn", "bs", { hint: "e.g. 4-1/2, 4½ or 4.5" })}
          {field("position.flangeIn", "flange", { hint: "The flange lip beyond the bead seat; 1/2 in is usual (common practice)." })}
          <div role="radiogroup" aria-label={`${legend}: backspacing measured to`} className="flex flex-col gap-1 text-sm sm:col-span-2">
            <span className="font-medium text-basalt-800">{L["position.reference"]}</span>
            <label className="flex items-center gap-2">
              <input type="radio" value="flange" {...register(p("position.reference"))} /> the flange edge (a straightedge across the back
              of the wheel)
            </label>
            <label className="flex items-center gap-2">
              <input type="radio" value="bead-seat" {...register(p("position.reference"))} /> the bead seat (where the tire bead sits)
            </label>
            <p className="text-xs text-basalt-500">
              {reference === "bead-seat"
                ? "From the bead seat the figure leaves out the flange lip."
                : "To the flange edge the figure includes the flange lip, so it reads larger by the allowance."}
            </p>
          </div>
        </div>
      ) : (
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          {field("position.offsetMm", "offset", { hint: "Positive when the mounting face is outboard of the rim centre, e.g. -12" })}
        </div>
      )}
      {spacer && (
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          {field("spacerMm", "spacer", { hint: "Leave empty for none. In mm; inches need their unit, e.g. 1 in." })}
        </div>
      )}
    </fieldset>
  );
}
