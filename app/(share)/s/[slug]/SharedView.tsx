"use client";
import Link from "next/link";
import { useMemo } from "react";
import { ChartsSection } from "@/components/comparison/ChartsSection";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { DrawingAndWarnings } from "@/components/comparison/DrawingAndWarnings";
import { HeadlineChanges } from "@/components/comparison/ResultsPanel";
import { LazySetupDetailTable } from "@/components/comparison/LazySetupDetailTable";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { buttonClass } from "@/components/ui/Button";
import { computeComparison } from "@/lib/comparisons/compute";
import { type DisplayPrefs, formatEnteredSpeed, formatLen, formatNumber } from "@/lib/comparisons/format";
import type { ComparisonInput } from "@/lib/comparisons/schema";
import { workspaceUrl } from "@/lib/comparisons/url";
import { ForumPostButton } from "./ForumPostButton";
import { SharedLoadTrail } from "./SharedLoadTrail";
import type { SetupFigures } from "@/lib/garage/loadFigures";

function VehicleSummary({ input, prefs }: { input: ComparisonInput; prefs: DisplayPrefs }) {
  const v = input.vehicle;
  const items: [string, string][] = [
    ["Kingpin inclination", v.kingpinInclinationDeg === null ? "not entered" : `${formatNumber(v.kingpinInclinationDeg, 1)}°`],
    ["Axle ratio", formatNumber(v.axleRatio, 2)],
    ["Top-gear ratio", formatNumber(v.transmissionRatio, 2)],
    ["Cruise speeds", v.cruiseSpeedsMph.map((s) => formatEnteredSpeed(s, prefs)).join(", ")],
    ["Fender line", v.fenderLineMm === null ? "not entered" : `${formatLen(v.fenderLineMm, prefs)} out from the hub face`],
  ];
  return (
    <section aria-labelledby="vehicle-title" className="rounded-card bg-white p-4 shadow-card ring-1 ring-basalt-100">
      <h2 id="vehicle-title" className="mb-2 text-lg font-semibold">
        Vehicle figures used
      </h2>
      <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2 lg:grid-cols-5">
        {items.map(([k, val]) => (
          <div key={k}>
            <dt className="text-basalt-500">{k}</dt>
            <dd className="font-medium tabular-nums text-basalt-900">{val}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

/** The whole comparison, read-only, in the reader's units (remembered like in the workspace). */
export function SharedView({
  name,
  slug,
  input,
  loadTrail = null,
}: {
  name: string;
  slug: string;
  input: ComparisonInput;
  /** The vehicle's pressure to set and angle changes, when it keeps a load profile (./loadTrail.ts). */
  loadTrail?: SetupFigures | null;
}) {
  const [prefs, setPrefs] = useDisplayPrefs();
  const result = useMemo(() => computeComparison(input), [input]);
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <DisplayToggle prefs={prefs} onChange={setPrefs} />
        <div className="flex flex-wrap items-center gap-2">
          <ForumPostButton result={result} prefs={prefs} name={name} path={`/s/${slug}`} />
          <Link href={workspaceUrl({ input })} className={buttonClass("secondary")}>
            Open a copy in the workspace
          </Link>
        </div>
      </div>
      <HeadlineChanges result={result} prefs={prefs} />
      <DrawingAndWarnings result={result} prefs={prefs} />
      <VehicleSummary input={input} prefs={prefs} />
      {loadTrail && <SharedLoadTrail figures={loadTrail} prefs={prefs} />}
      <ChartsSection result={result} prefs={prefs} />
      <LazySetupDetailTable result={result} prefs={prefs} />
      <p className="rounded-lg bg-tight-100 px-4 py-3 text-sm text-tight-800">
        Bigger tires and different offsets change braking, steering effort and the load on wheel bearings, ball joints and steering parts.
        Lift and steering work, wheel fitting and torque follow the vehicle, wheel and tire makers&apos; instructions and local rules; have
        a qualified shop check the result.
      </p>
    </div>
  );
}
