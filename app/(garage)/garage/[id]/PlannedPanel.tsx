"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useEffect, useMemo } from "react";
import { useForm, useWatch } from "react-hook-form";
import { z } from "zod";
import { PredictionTable } from "@/components/garage/PredictionTable";
import { Alert } from "@/components/ui/Alert";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { TextField } from "@/components/ui/TextField";
import { DEFAULT_CLEARANCE_MARGIN_MM, compareSetups } from "@/lib/fitment";
import { bothUnits, marginText, signedLen } from "@/lib/garage/format";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { formatLen } from "@/lib/comparisons/format";
import { vehicleWorkspaceUrl } from "@/lib/garage/links";
import { setupQuery, urlNumber } from "@/lib/setup/url";
import type { VehicleDetail } from "@/lib/garage/types";
import { marginField } from "@/lib/garage/schema";
import { type Setup, type SetupForm, toEngineSetup } from "@/lib/setup/model";
import { setupSchema, setupToForm } from "@/lib/setup/schema";
import { SetupFields } from "@/components/setup/SetupFields";
import { predictPoints, steeringAxisOf } from "@/lib/garage/predict";
import type { LoadProfile } from "@/lib/garage/loadProfile";
import { PlannedLoadTrail } from "./PlannedLoadTrail";

/** The margin as this panel labels it, so its messages name it so. */
const MARGIN_LABEL = "Safety margin";
const marginSchema = marginField(MARGIN_LABEL);
const plannedFormSchema = z.object({ planned: setupSchema, margin: marginSchema });
type PlannedForm = { planned: SetupForm; margin: string };

/** A planned setup typed in, and what every measured point is predicted to become with it. */
export function PlannedPanel({
  detail,
  initialPlanned,
  loadProfile,
}: {
  detail: VehicleDetail;
  initialPlanned: Setup | null;
  loadProfile?: LoadProfile | null;
}) {
  const { vehicle: v, clearances } = detail;
  // The page's Units switch (on the placard card): the changes and predictions follow it.
  const [prefs] = useDisplayPrefs();
  const len = (mm: number) => bothUnits(mm, prefs);
  const signed = (mm: number) => signedLen(mm, prefs);
  const form = useForm<PlannedForm>({
    resolver: zodResolver(plannedFormSchema) as never,
    mode: "onChange",
    defaultValues: { planned: setupToForm(initialPlanned ?? v.currentSetup), margin: marginText(v.clearanceMarginMm) },
  });
  const values = useWatch({ control: form.control }) as PlannedForm;
  const planned = setupSchema.safeParse(values.planned);
  const margin = marginSchema.safeParse(values.margin);
  const plannedKey = planned.success ? setupQuery("p", planned.data) : null;

  useEffect(() => {
    void form.trigger();
  }, [form]);
  useEffect(() => {
    if (plannedKey) window.history.replaceState(window.history.state, "", `?${plannedKey}`);
  }, [plannedKey]);

  const result = useMemo(() => {
    if (!planned.success || !margin.success) return null;
    const p = toEngineSetup(planned.data);
    const cmp = compareSetups(toEngineSetup(v.currentSetup), p, {
      kingpinInclinationDeg: v.kingpinInclinationDeg ?? undefined,
      axleRatio: v.axleRatio ?? undefined,
      transmissionRatio: v.transmissionRatio ?? undefined,
    });
    const predictions = predictPoints(clearances, planned.data, margin.data, v);
    return { cmp, predictions, axis: steeringAxisOf(v) };
    // plannedKey and the margin text stand for the parsed values
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [plannedKey, values.margin, clearances, v]);

  return (
    <Card>
      <h2 className="text-lg font-semibold">Plan a setup</h2>
      <p className="mt-1 text-sm text-basalt-600">Enter the setup you are considering; every measured point is predicted as you type.</p>
      <div className="mt-4 grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.3fr)]">
        <div className="flex flex-col gap-3">
          <SetupFields form={form} name="planned" legend="Planned setup" tone="ember" />
          <TextField
            id="f-margin"
            label={MARGIN_LABEL}
            hint={`This vehicle's margin is ${marginText(v.clearanceMarginMm)} (set it when editing the vehicle; 1/2 in = ${DEFAULT_CLEARANCE_MARGIN_MM} mm is the common-practice default, no source). Try another here; a point closer than this is tight.`}
            {...form.register("margin")}
            error={form.formState.errors.margin?.message}
          />
        </div>
        <div className="flex min-w-0 flex-col gap-4" aria-live="polite">
          {!result ? (
            <Alert tone="info">Complete the planned setup to see the predictions.</Alert>
          ) : (
            <>
              <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
                {[
                  ["Diameter", signed(result.cmp.diameterChangeMm)],
                  ["Radius (upward)", signed(result.cmp.groundClearanceChangeMm)],
                  ["Inner clearance", signed(result.cmp.innerClearanceChangeMm)],
                  ["Poke", signed(result.cmp.outerPokeChangeMm)],
                ].map(([k, val]) => (
                  <div key={k} className="rounded-lg bg-dune-100 p-2">
                    <dt className="text-xs text-basalt-600">{k}</dt>
                    <dd className="font-semibold">{val}</dd>
                  </div>
                ))}
              </dl>
              {clearances.length === 0 ? (
                <p className="text-sm text-basalt-700">Add measured points above to see what this setup would touch.</p>
              ) : (
                <PredictionTable
                  points={clearances}
                  predictions={result.predictions}
                  len={len}
                  signed={signed}
                  noteLen={(mm) => formatLen(mm, prefs, { decimals: prefs.units === "metric" ? 1 : undefined })}
                  caption="Predicted clearance at each measured point"
                  testId="predictions"
                  axisInboardMm={result.axis}
                />
              )}
              {planned.success && <PlannedLoadTrail vehicle={v} planned={planned.data} profile={loadProfile ?? null} />}
              {planned.success && (
                <div className="no-print flex flex-wrap gap-2">
                  <Link
                    href={vehicleWorkspaceUrl(v.currentSetup, planned.data, v)}
                    className={buttonClass("secondary")}
                    data-testid="open-workspace"
                  >
                    Open current vs planned in the workspace
                  </Link>
                  <Link
                    href={`/garage/${v.id}/checklist?${plannedKey}${margin.success && margin.data !== v.clearanceMarginMm ? `&m=${urlNumber(margin.data)}` : ""}`}
                    className={buttonClass("primary")}
                  >
                    Install checklist
                  </Link>
                </div>
              )}
            </>
          )}
        </div>
      </div>
    </Card>
  );
}
