"use client";
import { useMemo } from "react";
import { TrailAngleTable } from "@/components/comparison/TrailAngleTable";
import { measureFields } from "@/components/comparison/measureFields";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { type DisplayPrefs, formatNumber } from "@/lib/comparisons/format";
import { measureUnit, readMeasure } from "@/lib/comparisons/measureEntry";
import { TRAIL_SPEC, type TrailField, type TrailLabels, planTrail } from "@/lib/comparisons/trailPlan";
import { useMeasureEntries } from "./useMeasureEntries";
import { WorkspacePanel } from "./WorkspacePanel";

const FIELDS: TrailField[] = ["frontHeight", "frontAhead", "rearHeight", "rearBehind", "wheelbase", "midHeight", "lift"];
const QUANTITIES = Object.fromEntries(FIELDS.map((k) => [k, "length"])) as Record<TrailField, "length">;
const SPEC = TRAIL_SPEC;
const BASE: Record<TrailField, string> = {
  frontHeight: "Front corner height",
  frontAhead: "Front corner ahead of the front axle",
  rearHeight: "Rear corner height",
  rearBehind: "Rear corner behind the rear axle",
  wheelbase: "Wheelbase",
  midHeight: "Lowest point midway, height",
  lift: "Suspension lift (optional)",
};
const HINT: Partial<Record<TrailField, string>> = {
  frontHeight: "The lowest point of the front overhang (bumper, air dam), from the ground, on the current tires.",
  rearHeight: "The lowest point behind the rear axle (bumper, hitch, tank), from the ground.",
  midHeight: "The lowest point of the underbody halfway between the axles (frame, skid plate), from the ground.",
  lift: "Raises every body point measured here; leave empty for none.",
};

const INTRO =
  "Measure on level ground with the current tires, at normal load. The planned figures raise every point by the tire's radius " +
  "change and the lift. A lift changes steering and driveline angles too: follow the lift maker's instructions and have the " +
  "alignment checked.";

/** Labels for a display choice; messages name each field by this same text. */
export function trailLabels(prefs: DisplayPrefs): TrailLabels {
  const u = measureUnit("length", prefs);
  return Object.fromEntries(FIELDS.map((k) => [k, `${BASE[k]} (${u})`])) as TrailLabels;
}

/**
 * Trail angles with the current and the planned tires (SAE J1100 definitions, the engine's), with
 * a lift, and the brake torque the same stop asks of the brakes. Computes in the browser.
 */
export function TrailAnglesPanel({ result, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  const { entries, set, note } = useMeasureEntries(QUANTITIES, prefs);
  const labels = trailLabels(prefs);
  const currentDiameterMm = result.current.overallDiameterMm;
  const plannedDiameterMm = result.planned.overallDiameterMm;
  const { angles, errors } = useMemo(() => {
    const labels = trailLabels(prefs);
    const errs: Partial<Record<TrailField, string>> = {};
    const v: Partial<Record<TrailField, number>> = {};
    for (const k of FIELDS) {
      const r = readMeasure(entries[k], SPEC[k], prefs, labels[k]);
      if ("error" in r) errs[k] = r.error;
      else if ("value" in r) v[k] = r.value;
    }
    const ok = (...ks: TrailField[]) => ks.every((k) => v[k] !== undefined) && !ks.some((k) => errs[k]);
    const plan = planTrail(
      {
        currentDiameterMm,
        plannedDiameterMm,
        frontHeightMm: ok("frontHeight", "frontAhead") ? v.frontHeight! : null,
        frontAheadMm: v.frontAhead ?? null,
        rearHeightMm: ok("rearHeight", "rearBehind") ? v.rearHeight! : null,
        rearBehindMm: v.rearBehind ?? null,
        wheelbaseMm: ok("wheelbase", "midHeight") ? v.wheelbase! : null,
        midHeightMm: v.midHeight ?? null,
        liftMm: v.lift ?? 0,
      },
      labels,
    );
    // A refused lift computes nothing planned.
    return errs.lift ? { angles: [], errors: errs } : { angles: plan.angles, errors: { ...plan.errors, ...errs } };
  }, [entries, prefs, currentDiameterMm, plannedDiameterMm]);

  const ratio = result.engine.brakeTorqueRatio;
  const field = measureFields({ prefix: "trail", labels, hints: HINT, entries, set, errors, note });
  return (
    <WorkspacePanel titleId="trail-title" title="Trail angles" intro={INTRO}>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">{FIELDS.map(field)}</div>
      <div aria-live="polite">
        {angles.length > 0 ? (
          <TrailAngleTable angles={angles} />
        ) : (
          <p className="text-sm text-basalt-600">Enter a body point and its distance from the axle to see its angle.</p>
        )}
      </div>
      <p className="rounded-lg bg-tight-100 px-3 py-2 text-sm text-tight-800" data-testid="brake-torque">
        Brakes: the planned tire asks {formatNumber((ratio - 1) * 100, 1, { signed: true })} % brake torque for the same stop (ratio{" "}
        {formatNumber(ratio, 3)}, planned ÷ current rolling radius), before any added wheel and tire weight. Stopping distances grow;
        consider brakes rated for the larger tire and follow the brake maker&apos;s guidance.
      </p>
    </WorkspacePanel>
  );
}
