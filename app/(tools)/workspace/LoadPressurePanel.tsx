"use client";
import { useMemo, useState } from "react";
import { VehicleKindChoice } from "@/components/comparison/VehicleKindChoice";
import { TextField } from "@/components/ui/TextField";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { LOAD_SPEC, type LoadErrors, type LoadField, type LoadLabels, planLoad } from "@/lib/comparisons/loadPlan";
import { measureUnit, readMeasure } from "@/lib/comparisons/measureEntry";
import type { VehicleKind } from "@/lib/fitment";
import { AiredDownGuidance } from "./AiredDownGuidance";
import { LazyLoadPressureChart } from "./LazyLoadPressureChart";
import { LoadPressureFigures } from "@/components/comparison/LoadPressureFigures";
import { measureFields } from "@/components/comparison/measureFields";
import { useMeasureEntries } from "./useMeasureEntries";
import { WorkspacePanel } from "./WorkspacePanel";

const QUANTITIES = {
  placardFront: "pressure",
  placardRear: "pressure",
  frontAxle: "load",
  rearAxle: "load",
  plannedMaxLoad: "load",
  plannedMaxPressure: "pressure",
} as const;
type MeasureKey = keyof typeof QUANTITIES;

const SPEC = LOAD_SPEC;
const OPTIONAL: ReadonlySet<MeasureKey> = new Set(["plannedMaxLoad", "plannedMaxPressure"]);

/** The panel's labels for a display choice; messages name each field by this same text. */
export function loadLabels(prefs: DisplayPrefs): LoadLabels {
  const p = measureUnit("pressure", prefs);
  const l = measureUnit("load", prefs);
  return {
    placardTire: "Placard tire size",
    placardFront: `Placard pressure, front (${p})`,
    placardRear: `Placard pressure, rear (${p})`,
    frontAxle: `Front axle load (${l})`,
    rearAxle: `Rear axle load (${l})`,
    plannedTire: "Planned tire",
    plannedMaxLoad: `Planned tire's maximum load, sidewall (${l}, optional)`,
    plannedMaxPressure: `Planned tire's maximum pressure, sidewall (${p}, optional)`,
  };
}

const HINT: Record<MeasureKey, string> = {
  placardFront: "Cold pressure on the door placard for the front tires.",
  placardRear: "Cold pressure on the door placard for the rear tires.",
  frontAxle: "From a scale ticket (loaded as you drive), or the placard's front axle rating (GAWR).",
  rearAxle: "From a scale ticket, or the placard's rear axle rating (GAWR).",
  plannedMaxLoad: "Only if the size has no load index: “max load … at …” on the sidewall.",
  plannedMaxPressure: "Only if the size has no load range: the pressure of “max load … at …”.",
};

const INTRO =
  "A bigger or different tire carries the same load at another pressure. Enter the door placard and the axle loads; the planned " +
  "tire's pressure follows. The vehicle's placard, the tire maker's load tables and the wheel maker's limits take precedence over " +
  "any figure here; never exceed the pressure on the sidewall or the wheel.";

/**
 * Load and pressure for the planned tire: the vehicle's placard and axle loads in, the pressure to
 * set per axle out, with the chart and the cautions. Computes in the browser; the figures' units
 * follow the workspace's toggle and are converted, never relabelled, when it switches.
 */
export function LoadPressurePanel({ currentTire, plannedTire, prefs }: { currentTire: string; plannedTire: string; prefs: DisplayPrefs }) {
  const { entries, set, note } = useMeasureEntries(QUANTITIES, prefs);
  // The placard size follows the current setup's tire until it is typed over.
  const [placardTire, setPlacardTire] = useState<string | null>(null);
  const [vehicle, setVehicle] = useState<VehicleKind>("light-truck");
  const labels = loadLabels(prefs);
  const placard = placardTire ?? currentTire;

  const { plan, errors } = useMemo(() => {
    const labels = loadLabels(prefs);
    const errs: LoadErrors = {};
    const values: Partial<Record<MeasureKey, number>> = {};
    for (const k of Object.keys(QUANTITIES) as MeasureKey[]) {
      const r = readMeasure(entries[k], SPEC[k], prefs, labels[k]);
      if ("error" in r) errs[k] = r.error;
      else if ("value" in r) values[k] = r.value;
      else if (!OPTIONAL.has(k)) errs[k] = `${labels[k]}: enter it, e.g. ${SPEC[k].example[prefs.units]}.`;
    }
    if (placard.trim() === "") errs.placardTire = `${labels.placardTire}: enter the size on the door placard, e.g. P265/70R17 113S.`;
    const touched = (Object.keys(QUANTITIES) as MeasureKey[]).some((k) => entries[k].text.trim() !== "");
    if (!touched) return { plan: null, errors: {} as LoadErrors };
    if (Object.keys(errs).length > 0) return { plan: null, errors: errs };
    return planLoad(
      {
        placardTire: placard,
        plannedTire,
        vehicle,
        placardFrontKpa: values.placardFront!,
        placardRearKpa: values.placardRear!,
        frontAxleKg: values.frontAxle!,
        rearAxleKg: values.rearAxle!,
        plannedMaxLoadKg: values.plannedMaxLoad,
        plannedMaxPressureKpa: values.plannedMaxPressure,
      },
      labels,
      prefs,
    );
  }, [entries, prefs, placard, plannedTire, vehicle]);

  const measureField = measureFields({ prefix: "load", labels, hints: HINT, entries, set, errors, note });
  const fieldErrors = (Object.keys(errors) as LoadField[]).length;

  return (
    <WorkspacePanel titleId="load-title" title="Load and pressure" intro={INTRO}>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <TextField
          label={labels.placardTire}
          name="load-placardTire"
          autoComplete="off"
          value={placard}
          onChange={(ev) => setPlacardTire(ev.target.value)}
          error={errors.placardTire}
          hint="As printed on the placard, with its load index (e.g. P265/70R17 113S). Starts as your current tire."
        />
        {measureField("placardFront")}
        {measureField("placardRear")}
        {measureField("frontAxle")}
        {measureField("rearAxle")}
        <VehicleKindChoice name="load-vehicle" value={vehicle} onChange={setVehicle} />
      </div>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        <div className="flex flex-col gap-1 text-sm">
          <span className="font-medium text-basalt-800">{labels.plannedTire}</span>
          <span data-testid="load-planned-tire">{plannedTire}</span>
          {errors.plannedTire && (
            <p className="text-sm text-contact-700" role="alert">
              {errors.plannedTire}
            </p>
          )}
        </div>
        {measureField("plannedMaxLoad")}
        {measureField("plannedMaxPressure")}
      </div>
      <div aria-live="polite" className="flex flex-col gap-4">
        {plan ? (
          <>
            <LoadPressureFigures plan={plan} prefs={prefs} />
            <LazyLoadPressureChart plan={plan} prefs={prefs} />
          </>
        ) : (
          <p className="text-sm text-basalt-600" data-testid="load-status">
            {fieldErrors > 0
              ? "Nothing is computed until every field above reads: see the messages beside them."
              : "Enter the placard pressures and the axle loads to see the planned tire's pressure."}
          </p>
        )}
      </div>
      <AiredDownGuidance />
    </WorkspacePanel>
  );
}
