"use client";
import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { type DisplayPrefs, formatNumber } from "@/lib/comparisons/format";
import type { LoadPlan } from "@/lib/comparisons/loadPlan";
import { loadIn, pressureIn } from "@/lib/comparisons/pressureText";
import { pressureAxis } from "@/components/comparison/chartData";
import { LOAD_CHART_HEIGHT } from "./loadChartSize";

const STEEL = "#245a88";
const EMBER = "#bd460f";
const BASALT = "#56616f";

/**
 * Load one tire carries against its cold pressure, placard tire and planned tire (recharts; load
 * it through LazyLoadPressureChart so recharts stays out of the first-load JavaScript). Dashed
 * lines: each axle's load per tire and the pressure to set.
 */
export default function LoadPressureChart({ plan, prefs }: { plan: LoadPlan; prefs: DisplayPrefs }) {
  const pUnit = prefs.units === "metric" ? "kPa" : "psi";
  const lUnit = prefs.units === "metric" ? "kg" : "lb";
  const data = plan.curve.map((c) => ({
    p: Math.round(pressureIn(c.pressureKpa, prefs) * 10) / 10,
    placard: c.placardKg === null ? null : Math.round(loadIn(c.placardKg, prefs)),
    planned: c.plannedKg === null ? null : Math.round(loadIn(c.plannedKg, prefs)),
  }));
  // Round ticks in the unit shown: the curve's own ends are converted figures (10.2 psi from 70 kPa).
  const axis = pressureAxis(plan, prefs);
  const tick = { fontSize: 12, fill: "#434c58" };
  return (
    <figure className="min-w-0 rounded-lg bg-white p-3 ring-1 ring-basalt-100" aria-labelledby="chart-load" data-testid="load-chart">
      <figcaption id="chart-load" className="mb-1 text-sm font-semibold text-basalt-800">
        Load per tire ({lUnit}) against cold pressure ({pUnit})
      </figcaption>
      <div style={{ height: LOAD_CHART_HEIGHT }}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ left: 4, right: 16, top: 8, bottom: 4 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="p" type="number" domain={axis.domain} ticks={axis.ticks} tick={tick} />
            <YAxis tick={tick} width={48} />
            <Tooltip
              labelFormatter={(v) => `${formatNumber(Number(v), prefs.units === "metric" ? 0 : 1)} ${pUnit}`}
              formatter={(v) => `${formatNumber(Number(v))} ${lUnit}`}
            />
            <Legend wrapperStyle={{ fontSize: 12 }} />
            <Line
              dataKey="placard"
              name={`Placard: ${plan.placard.text}`}
              stroke={STEEL}
              strokeWidth={2}
              dot={false}
              isAnimationActive={false}
            />
            <Line
              dataKey="planned"
              name={`Planned: ${plan.planned.text}`}
              stroke={EMBER}
              strokeWidth={2}
              strokeDasharray="6 4"
              dot={false}
              isAnimationActive={false}
            />
            {plan.axles.map((a) => (
              <ReferenceLine
                key={`load-${a.axle}`}
                y={Math.round(loadIn(a.tireLoadKg, prefs))}
                stroke={BASALT}
                strokeDasharray="2 3"
                label={{ value: `${a.axle} load`, fontSize: 11, position: "insideTopLeft", fill: BASALT }}
              />
            ))}
            {plan.axles.map((a) => (
              <ReferenceLine
                key={`set-${a.axle}`}
                x={Math.round(pressureIn(a.pressureToSetKpa, prefs) * 10) / 10}
                stroke={EMBER}
                strokeDasharray="2 3"
                label={{
                  value: `set ${a.axle}`,
                  fontSize: 11,
                  position: a.axle === "front" ? "insideTopRight" : "insideBottomRight",
                  fill: EMBER,
                }}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
