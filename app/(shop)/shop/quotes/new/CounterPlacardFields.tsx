"use client";
import { MeasureField } from "@/components/comparison/MeasureField";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { VehicleKindChoice } from "@/components/comparison/VehicleKindChoice";
import { TextField } from "@/components/ui/TextField";
import { PROFILE_SPEC, profileLabels } from "@/lib/garage/loadProfile";
import { BODY_KEYS } from "@/lib/shop/customers/counterBodyPoints";
import { PLACARD_KEYS } from "@/lib/shop/customers/counterPlacard";
import { BodyPointsDrawing } from "@/components/garage/BodyPointsDrawing";
import type { CounterPlacardState } from "./useCounterPlacard";

/**
 * The door placard at the counter (optional): with it and the axle weights or ratings, the quote
 * and the work order give the cold pressure to set for the quoted tire. The body points (optional)
 * give the quote's approach, departure and breakover angles.
 */
export function CounterPlacardFields({ placard }: { placard: CounterPlacardState }) {
  const { prefs } = placard;
  const labels = profileLabels(prefs.units);
  const field = (k: (typeof PLACARD_KEYS)[number] | (typeof BODY_KEYS)[number]) => (
    <MeasureField
      key={k}
      label={labels[k]}
      name={`placard-${k}`}
      entry={placard.entries[k]}
      onText={(t) => placard.edit(k, t)}
      error={placard.message(k)}
      hint={`Optional; e.g. ${PROFILE_SPEC[k].example[prefs.units]}`}
    />
  );
  return (
    <div className="flex flex-col gap-4">
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-1 text-sm font-semibold">Door placard and axle loads (optional)</legend>
        <p className="text-sm text-basalt-600 sm:col-span-2">
          For the cold pressure to set on the quote and the work order: the placard&apos;s size and pressures, and the axle weights from a
          scale ticket or the axle ratings (GAWR).
        </p>
        <div className="sm:col-span-2">
          <DisplayToggle prefs={prefs} onChange={placard.setPrefs} />
        </div>
        <TextField
          label={labels.placardTire}
          name="placard-placardTire"
          autoComplete="off"
          value={placard.placardTire}
          onChange={(ev) => placard.edit("placardTire", ev.target.value)}
          error={placard.message("placardTire")}
          hint="As printed on the door placard, with its load index (e.g. P265/70R17 113S)."
        />
        <VehicleKindChoice name="placard-vehicleKind" value={placard.vehicleKind} onChange={placard.setVehicleKind} />
        {PLACARD_KEYS.map(field)}
      </fieldset>
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-1 text-sm font-semibold">Body points, measured with the current tires (optional)</legend>
        <p className="text-sm text-basalt-600 sm:col-span-2">
          For the approach, departure and breakover angles on the quote: on level ground at normal load, as the drawing shows.
        </p>
        <div className="sm:col-span-2">
          <BodyPointsDrawing />
        </div>
        {BODY_KEYS.map(field)}
      </fieldset>
    </div>
  );
}
