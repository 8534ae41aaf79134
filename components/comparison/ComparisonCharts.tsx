"use client";
import { Bar, BarChart, CartesianGrid, Cell, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { type DisplayPrefs, formatNumber } from "@/lib/comparisons/format";
import { mmToIn } from "@/lib/fitment";
import { speedCharts } from "./chartData";
import { CHART_HEIGHT_RESERVED } from "./chartSize";
import { SpeedLineChart } from "./SpeedLineChart";

/**
 * The comparison's charts (recharts): the changes as bars, indicated vs true speed, engine speed
 * vs road speed for both setups. Read-only; load it through LazyComparisonCharts so recharts
 * stays out of the page's first-load JavaScript.
 */
const STEEL = "#245a88";
const EMBER = "#bd460f";
const BASALT = "#56616f";
export const CHART_HEIGHT = 240;

function ChartFrame({ title, children, id }: { title: string; children: React.ReactNode; id: string }) {
  return (
    <figure
      className="min-w-0 rounded-lg bg-white p-3 ring-1 ring-basalt-100"
      aria-labelledby={id}
      style={{ height: CHART_HEIGHT_RESERVED }}
    >
      <figcaption id={id} className="mb-1 truncate text-sm font-semibold text-basalt-800">
        {title}
      </figcaption>
      <div style={{ height: CHART_HEIGHT }}>{children}</div>
    </figure>
  );
}

export default function ComparisonCharts({ result: r, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  const metric = prefs.units === "metric";
  const lenUnit = metric ? "mm" : "in";
  const len = (mm: number) => (metric ? Math.round(mm * 10) / 10 : Math.round(mmToIn(mm) * 100) / 100);
  const { speeds, rpm, ...axis } = speedCharts(r, prefs);
  const speedUnit = axis.unit;
  const changes = [
    { name: "Diameter", value: len(r.changes.diameterMm) },
    { name: "Ground clr.", value: len(r.changes.groundClearanceMm) },
    { name: "Inner clr.", value: len(r.changes.innerClearanceMm) },
    { name: "Poke", value: len(r.changes.outerPokeMm) },
    { name: "Scrub", value: len(r.changes.scrubRadiusMm) },
    { name: "Track", value: len(r.changes.trackWidthMm) },
  ];
  const tick = { fontSize: 12, fill: "#434c58" };
  return (
    <div className="grid gap-3 md:grid-cols-3" data-testid="charts">
      <ChartFrame id="chart-changes" title={`Changes, planned minus current (${lenUnit})`}>
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={changes} layout="vertical" margin={{ left: 8, right: 16, top: 4, bottom: 4 }}>
            <CartesianGrid strokeDasharray="3 3" horizontal={false} />
            <XAxis type="number" tick={tick} />
            <YAxis type="category" dataKey="name" width={76} tick={tick} />
            <ReferenceLine x={0} stroke={BASALT} />
            <Tooltip formatter={(v) => `${formatNumber(Number(v), metric ? 1 : 2, { signed: true })} ${lenUnit}`} />
            <Bar dataKey="value" name="Change" isAnimationActive={false}>
              {changes.map((c) => (
                <Cell key={c.name} fill={c.value >= 0 ? EMBER : STEEL} />
              ))}
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </ChartFrame>
      <ChartFrame id="chart-speed" title={`True speed vs speedometer (${speedUnit})`}>
        <SpeedLineChart
          data={speeds}
          xKey="indicated"
          axis={axis}
          yWidth={40}
          tooltipPrefix="Speedometer shows"
          series={[
            { key: "shown", name: "As shown (current tire)", stroke: STEEL },
            { key: "true", name: "True (planned tire)", stroke: EMBER, dash: "6 4" },
          ]}
        />
      </ChartFrame>
      <ChartFrame id="chart-rpm" title={`Engine speed vs road speed (rpm, ${speedUnit})`}>
        <SpeedLineChart
          data={rpm}
          xKey="speed"
          axis={axis}
          yWidth={44}
          series={[
            { key: "current", name: "Current", stroke: STEEL },
            { key: "planned", name: "Planned", stroke: EMBER, dash: "6 4" },
            { key: "regeared", name: `Planned, ${r.gearing.suggestedRatio.toFixed(2)} gears`, stroke: BASALT, width: 1.5, dash: "2 3" },
          ]}
        />
      </ChartFrame>
    </div>
  );
}
