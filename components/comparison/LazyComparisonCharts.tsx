"use client";
import { useRef } from "react";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { CHART_HEIGHT_RESERVED } from "./chartSize";
import { useVisibleAndIdle } from "@/components/ui/useVisibleAndIdle";
import { clientLazy } from "@/components/ui/clientLazy";

function ChartsPlaceholder() {
  return (
    <div className="grid gap-3 md:grid-cols-3" role="status" aria-label="Loading charts">
      {[0, 1, 2].map((i) => (
        <div key={i} className="animate-pulse rounded-lg bg-basalt-50 ring-1 ring-basalt-100" style={{ height: CHART_HEIGHT_RESERVED }} />
      ))}
    </div>
  );
}

const Charts = clientLazy(() => import("./ComparisonCharts").then((m) => m.default), ChartsPlaceholder);

/**
 * The charts, loaded only when they come near the viewport and the browser is idle: recharts is
 * neither in the first-load JavaScript nor parsed and drawn while the page is becoming
 * interactive (it was most of the workspace's blocking time). The placeholder has the charts'
 * exact height (chartSize.ts), so nothing moves when they arrive.
 */
export function LazyComparisonCharts({ result, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  const box = useRef<HTMLDivElement>(null);
  const ready = useVisibleAndIdle(box);
  return <div ref={box}>{ready ? <Charts result={result} prefs={prefs} /> : <ChartsPlaceholder />}</div>;
}
