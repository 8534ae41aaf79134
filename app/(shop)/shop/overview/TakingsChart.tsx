"use client";
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { type TakingsDay, shortDay } from "@/lib/shop/overview";
import { formatUsd } from "@/lib/shop/quotes/money";
import { TAKINGS_CHART_HEIGHT } from "./takingsChartSize";

const STEEL = "#245a88";
const EMBER = "#bd460f";
const BASALT = "#56616f";

/**
 * Takings per day as bars (deposits and balances stacked, refunds beside them), in dollars. Drawn
 * for sighted readers only: the table beside it carries the same figures for everyone. Load it
 * through TakingsCard, so recharts stays out of the page's first-load JavaScript.
 */
export default function TakingsChart({ days }: { days: TakingsDay[] }) {
  const data = days.map((d) => ({
    day: shortDay(d.date),
    deposits: d.depositsCents / 100,
    balances: d.balancesCents / 100,
    refunds: d.refundsCents / 100,
  }));
  const tick = { fontSize: 12, fill: "#434c58" };
  return (
    <div style={{ height: TAKINGS_CHART_HEIGHT }} aria-hidden="true" data-testid="takings-chart">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ left: 8, right: 8, top: 4, bottom: 4 }} accessibilityLayer={false}>
          <CartesianGrid strokeDasharray="3 3" vertical={false} />
          <XAxis dataKey="day" tick={tick} interval="preserveStartEnd" />
          <YAxis tick={tick} width={64} tickFormatter={(v) => formatUsd(Math.round(Number(v) * 100)).replace(/\.00$/, "")} />
          <Tooltip formatter={(v) => formatUsd(Math.round(Number(v) * 100))} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Bar dataKey="deposits" name="Deposits" stackId="in" fill={STEEL} isAnimationActive={false} />
          <Bar dataKey="balances" name="Balances" stackId="in" fill={EMBER} isAnimationActive={false} />
          <Bar dataKey="refunds" name="Refunds" fill={BASALT} isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
