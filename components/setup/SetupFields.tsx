"use client";
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
  return (
    <fieldset
      className={`rounded-card border p-4 ${tone === "ember" ? "border-ember-200 bg-ember-50/40" : "border-steel-200 bg-steel-50/40"}`}
    >
      <legend className="px-1 text-sm font-semibold text-basalt-900">{legend}</legend>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          id={id("tire")}
          label={L.tire}
          hint="e.g. 265/70R17, LT285/75R16 or 35x12.50R17LT"
          {...register(p("tire"))}
          error={err("tire")}
          className="sm:col-span-2"
        />
        <TextField
          id={id("d")}
          label={L.wheelDiameterIn}
          inputMode="decimal"
          {...register(p("wheelDiameterIn"))}
          error={err("wheelDiameterIn")}
        />
        <TextField
          id={id("w")}
          label={L.wheelWidthIn}
          hint="Fractions work: 8-1/2 or 8½"
          {...register(p("wheelWidthIn"))}
          error={err("wheelWidthIn")}
        />
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
          <TextField
            id={id("bs")}
            label={L["position.backspacingIn"]}
            hint="e.g. 4-1/2, 4½ or 4.5"
            {...register(p("position.backspacingIn"))}
            error={err("position.backspacingIn")}
          />
          <TextField
            id={id("flange")}
            label={L["position.flangeIn"]}
            hint="The flange lip beyond the bead seat; 1/2 in is usual (common practice)."
            {...register(p("position.flangeIn"))}
            error={err("position.flangeIn")}
          />
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
          <TextField
            id={id("offset")}
            label={L["position.offsetMm"]}
            hint="Positive when the mounting face is outboard of the rim centre, e.g. -12"
            {...register(p("position.offsetMm"))}
            error={err("position.offsetMm")}
          />
        </div>
      )}
      {spacer && (
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          <TextField
            id={id("spacer")}
            label={L.spacerMm}
            hint="Leave empty for none. In mm; inches need their unit, e.g. 1 in."
            {...register(p("spacerMm"))}
            error={err("spacerMm")}
          />
        </div>
      )}
    </fieldset>
  );
}
