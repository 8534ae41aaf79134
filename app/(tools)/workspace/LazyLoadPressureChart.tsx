"use client";
import { clientLazy } from "@/components/ui/clientLazy";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import type { LoadPlan } from "@/lib/comparisons/loadPlan";
import { LOAD_CHART_HEIGHT } from "./loadChartSize";

function ChartPlaceholder() {
  return (
    <div
      className="animate-pulse rounded-lg bg-basalt-50 ring-1 ring-basalt-100"
      style={{ height: LOAD_CHART_HEIGHT + 46 }}
      role="status"
      aria-label="Loading the load and pressure chart"
    />
  );
}

const Chart = clientLazy(() => import("./LoadPressureChart").then((m) => m.default), ChartPlaceholder);

/** The load–pressure chart, loaded after the page (recharts is not in the first-load JavaScript); space is reserved meanwhile. */
export function LazyLoadPressureChart({ plan, prefs }: { plan: LoadPlan; prefs: DisplayPrefs }) {
  return <Chart plan={plan} prefs={prefs} />;
}
