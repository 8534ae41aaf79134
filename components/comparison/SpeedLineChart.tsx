"use client";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

/** One line of a speed chart: the row's key it plots, its legend name and its stroke. */
export interface SpeedSeries {
  key: string;
  name: string;
  stroke: string;
  /** Dashes tell the setups apart without colour (the planned tire dashed). */
  dash?: string;
  width?: number;
}

const TICK = { fontSize: 12, fill: "#434c58" };

/** The speed axis: its unit and its fixed round ticks (chartData: speedCharts). */
export interface SpeedAxis {
  unit: string;
  ticks: number[];
  domain: [number, number];
}

/**
 * A line chart over road speed, on the fixed round ticks of the reader's unit (see chartData:
 * speedCharts): the speedometer chart and the engine speed chart.
 *
 * @example
 * <SpeedLineChart data={rpm} xKey="speed" axis={{ unit: "mph", ticks: [10, 20], domain: [10, 20] }} yWidth={44}
 *   series={[{ key: "current", name: "Current", stroke: "#245a88" }]} />
 */
export function SpeedLineChart({
  data,
  xKey,
  axis,
  yWidth,
  tooltipPrefix,
  series,
}: {
  data: object[];
  xKey: string;
  axis: SpeedAxis;
  yWidth: number;
  /** Said before the speed in the tooltip, e.g. "Speedometer shows". */
  tooltipPrefix?: string;
  series: readonly SpeedSeries[];
}) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <LineChart data={data} margin={{ left: 0, right: 16, top: 4, bottom: 4 }}>
        <CartesianGrid strokeDasharray="3 3" />
        <XAxis dataKey={xKey} type="number" domain={axis.domain} ticks={axis.ticks} tick={TICK} />
        <YAxis tick={TICK} width={yWidth} />
        <Tooltip labelFormatter={(v) => `${tooltipPrefix ? `${tooltipPrefix} ` : ""}${v} ${axis.unit}`} />
        <Legend wrapperStyle={{ fontSize: 12 }} />
        {series.map((s) => (
          <Line
            key={s.key}
            dataKey={s.key}
            name={s.name}
            stroke={s.stroke}
            strokeWidth={s.width ?? 2}
            strokeDasharray={s.dash}
            dot={false}
            isAnimationActive={false}
          />
        ))}
      </LineChart>
    </ResponsiveContainer>
  );
}
