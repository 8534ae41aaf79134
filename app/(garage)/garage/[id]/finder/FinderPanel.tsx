"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useMemo, useRef, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { LinkButton } from "@/components/ui/LinkButton";
import { PageHeader } from "@/components/ui/PageHeader";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import { type FinderResult, formatLength } from "@/lib/fitment";
import { FINDER_LABEL, type FinderGoalsForm, finderBaseline, finderGoalsSchema, finderPlan } from "@/lib/garage/finderGoals";
import type { FinderJob, FinderReply } from "@/lib/garage/finderJob";
import type { Vehicle, VehicleClearance } from "@/lib/garage/types";
import { ExcludedList } from "./ExcludedList";
import { FinderTable } from "./FinderTable";
import { useFinderLoad } from "./useFinderLoad";

const mm = (v: number) => formatLength(v, { unit: "mm" });

export function FinderPanel({ vehicle, clearances }: { vehicle: Vehicle; clearances: VehicleClearance[] }) {
  const hasPoints = clearances.length > 0;
  const load = useFinderLoad(vehicle);
  const form = useForm<FinderGoalsForm>({
    resolver: zodResolver(finderGoalsSchema) as never,
    mode: "onChange",
    defaultValues: {
      targetDiameterMm: "",
      minDiameterMm: "",
      maxDiameterMm: "",
      wheelDiameters: String(vehicle.currentSetup.wheelDiameterIn),
      maxPokeMm: "1 in",
      usePoints: hasPoints,
      minWidthIn: "",
      maxWidthIn: "",
      margin: "1/2 in",
    },
  });
  const values = useWatch({ control: form.control }) as FinderGoalsForm;
  const parsed = finderGoalsSchema.safeParse(values);
  const plan = parsed.success ? finderPlan(parsed.data, vehicle, clearances) : null;
  // The hints quote the vehicle, not the goals: a goal that does not read must not blank them.
  const baseline = useMemo(() => finderBaseline(vehicle), [vehicle]);
  const planKey = plan ? JSON.stringify([plan.constraints, plan.wheelWidthsIn]) : null;

  const worker = useRef<Worker | null>(null);
  const jobId = useRef(0);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const [result, setResult] = useState<{ result: FinderResult; ms: number } | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  useEffect(() => {
    void form.trigger();
  }, [form]);
  useEffect(() => () => worker.current?.terminate(), []);

  useEffect(() => {
    if (!plan || !planKey) return;
    const t = setTimeout(() => {
      // A search still running for older goals is stopped by replacing its worker.
      if (progress !== null && worker.current) {
        worker.current.terminate();
        worker.current = null;
      }
      if (!worker.current) {
        const w = new Worker(new URL("./finder.worker.ts", import.meta.url));
        w.onmessage = (e: MessageEvent<FinderReply>) => {
          const m = e.data;
          if (m.id !== jobId.current) return;
          if (m.type === "progress") setProgress({ done: m.done, total: m.total });
          else if (m.type === "done") {
            setProgress(null);
            setFailure(null);
            setResult({ result: m.result, ms: m.ms });
          } else {
            setProgress(null);
            setFailure(m.message);
          }
        };
        worker.current = w;
      }
      const job: FinderJob = {
        id: ++jobId.current,
        constraints: plan.constraints,
        wheelWidthsIn: plan.wheelWidthsIn,
        limit: 200,
        excludedLimit: 200,
      };
      setProgress({ done: 0, total: 1 });
      worker.current.postMessage(job);
    }, 250);
    return () => clearTimeout(t);
    // planKey stands for the plan
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [planKey]);

  const field = fieldBinder(form);
  const reg = form.register;
  return (
    <>
      <PageHeader
        title={`Fitment finder — ${vehicle.name}`}
        lead={`Tire sizes × wheel widths × offsets for ${vehicle.boltPattern}, ranked by the engine. The search runs in the background as you type.`}
        actions={
          <LinkButton href={`/garage/${vehicle.id}`} variant="secondary">
            Back to the vehicle
          </LinkButton>
        }
      />
      {/* Goals above the results, never beside them: the results table then has the page's whole
          width, and all its columns, links included, show at 1280 px without scrolling sideways. */}
      <div className="flex flex-col gap-6">
        <Card className="flex flex-col gap-3">
          <h2 className="text-lg font-semibold">Goals</h2>
          <div className="grid items-start gap-x-4 gap-y-3 md:grid-cols-2 xl:grid-cols-3">
            <TextField
              label={FINDER_LABEL.targetDiameterMm}
              hint="Optional, e.g. 35 or 890 mm; ranks nearest first"
              {...field("targetDiameterMm")}
            />
            <div className="grid grid-cols-2 gap-2">
              <TextField label={FINDER_LABEL.minDiameterMm} hint="e.g. 33" {...field("minDiameterMm")} />
              <TextField label={FINDER_LABEL.maxDiameterMm} hint="e.g. 35-1/2" {...field("maxDiameterMm")} />
            </div>
            <TextField label={FINDER_LABEL.wheelDiameters} hint="e.g. 17, 18 — empty for any" {...field("wheelDiameters")} />
            <div className="grid grid-cols-2 gap-2">
              <TextField label={FINDER_LABEL.minWidthIn} hint="e.g. 8" {...field("minWidthIn")} />
              <TextField label={FINDER_LABEL.maxWidthIn} hint="e.g. 10" {...field("maxWidthIn")} />
            </div>
            <TextField
              label={FINDER_LABEL.maxPokeMm}
              hint={`Beyond the current setup's ${mm(baseline.currentOuterSwingMm)} outboard reach; e.g. 25 or 1 in; empty for no limit`}
              {...field("maxPokeMm")}
            />
            <label className="flex items-start gap-2 text-sm">
              <input type="checkbox" className="mt-1" {...reg("usePoints")} disabled={!hasPoints} aria-describedby="f-usePoints-hint" />
              <span>
                Keep the margin at every measured point
                <span id="f-usePoints-hint" className="block text-xs text-basalt-500">
                  {!hasPoints
                    ? "No points measured yet."
                    : `${clearances.length} point${clearances.length === 1 ? "" : "s"}, each predicted for every combination exactly as on the vehicle page (full-lock points turn about a steering axis ${mm(baseline.steeringAxisInboardMm)} inboard of the hub face).`}
                </span>
              </span>
            </label>
            <TextField label={FINDER_LABEL.margin} hint="Default 1/2 in — common practice, no source" {...field("margin")} />
          </div>
          <p className="text-xs text-basalt-500">
            Bolt pattern from the vehicle: {vehicle.boltPattern}. Wheel diameter is the tire&apos;s rim diameter.
          </p>
        </Card>
        <div className="flex min-w-0 flex-col gap-3">
          <div aria-live="polite" className="min-h-12">
            {progress ? (
              <div>
                <progress
                  className="h-2 w-full accent-ember-600"
                  max={progress.total}
                  value={progress.done}
                  aria-label="Search progress"
                  data-testid="finder-progress"
                />
                <p className="text-sm text-basalt-600">Searching… {Math.round((progress.done / progress.total) * 100)}%</p>
              </div>
            ) : result ? (
              <p className="text-sm text-basalt-700" data-testid="finder-summary">
                {result.result.matched.toLocaleString("en-US")} fits among {result.result.evaluated.toLocaleString("en-US")} combinations in{" "}
                {result.ms.toFixed(0)} ms
                {result.result.matched > result.result.results.length ? ` — the best ${result.result.results.length} shown` : ""}.
                {result.result.excludedCount > 0 &&
                  ` ${result.result.excludedCount.toLocaleString("en-US")} more were excluded by the measured points or the poke limit${
                    result.result.excludedSizes > 0
                      ? `, ${result.result.excludedSizes} tire size${result.result.excludedSizes === 1 ? "" : "s"} entirely (listed below)`
                      : ""
                  }.`}
              </p>
            ) : null}
          </div>
          {failure && <Alert tone="error">{failure}</Alert>}
          {!plan && <Alert tone="info">Fix the highlighted goals to search.</Alert>}
          {result && <FinderTable rows={result.result.results} vehicle={vehicle} extraColumns={load.columns} />}
          {result && load.note}
          {result && result.result.excluded.length > 0 && (
            <ExcludedList rows={result.result.excluded} total={result.result.excludedSizes} vehicle={vehicle} />
          )}
        </div>
      </div>
    </>
  );
}
