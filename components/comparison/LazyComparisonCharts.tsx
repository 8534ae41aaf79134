"use client";
import dynamic from "next/dynamic";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { CHART_HEIGHT_RESERVED } from "./chartSize";

function ChartsPlaceholder() {
  return (
    <div className="grid gap-3 md:grid-cols-3" role="status" aria-label="Loading charts">
      {[0, 1, 2].map((i) => (
        <div key={i} className="animate-pulse rounded-lg bg-basalt-50 ring-1 ring-basalt-100" style={{ height: CHART_HEIGHT_RESERVED }} />
      ))}
    </div>
  );
}

const Charts = dynamic(() => import("./ComparisonCharts"), { ssr: false, loading: ChartsPlaceholder });

/** The charts, loaded after the page (recharts is not in the first-load JavaScript); space is reserved meanwhile. */
export function LazyComparisonCharts({ result, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  return <Charts result={result} prefs={prefs} />;
}
