"use client";
import dynamic from "next/dynamic";
import { useRef } from "react";
import { useVisibleAndIdle } from "@/components/ui/useVisibleAndIdle";
import { Table } from "@/components/ui/Table";
import { OverviewSection } from "./OverviewSection";
import { type TakingsDay, shortDay } from "@/lib/shop/overview";
import { formatUsd } from "@/lib/shop/quotes/money";
import { TAKINGS_CHART_HEIGHT } from "./takingsChartSize";

function ChartPlaceholder() {
  return (
    <div
      className="animate-pulse rounded-lg bg-basalt-50"
      style={{ height: TAKINGS_CHART_HEIGHT }}
      role="status"
      aria-label="Loading chart"
    />
  );
}

const Chart = dynamic(() => import("./TakingsChart"), { ssr: false, loading: ChartPlaceholder });

/**
 * Takings by day: the chart (loaded when near the viewport and the browser is idle, its space
 * reserved) and the same figures as a table, which screen readers and keyboard users read.
 */
export function TakingsCard({ takings }: { takings: { from: string; to: string; days: TakingsDay[]; totalCents: number } }) {
  const box = useRef<HTMLDivElement>(null);
  const ready = useVisibleAndIdle(box);
  return (
    <OverviewSection
      id="overview-takings"
      title={`Takings, last ${takings.days.length} days`}
      lead={
        <>
          Deposits and balances received, less refunds:{" "}
          <span className="font-semibold text-basalt-900" data-testid="takings-total">
            {formatUsd(takings.totalCents)}
          </span>
          .
        </>
      }
    >
      <div ref={box}>{ready ? <Chart days={takings.days} /> : <ChartPlaceholder />}</div>
      <details className="mt-3">
        <summary className="cursor-pointer text-sm font-medium text-ember-700">Takings as a table</summary>
        <div className="mt-2">
          <Table
            caption="Takings by day"
            testId="takings-table"
            rows={takings.days}
            rowKey={(d) => d.date}
            columns={[
              { id: "day", header: "Day", cell: (d) => shortDay(d.date) },
              { id: "deposits", header: "Deposits", align: "end", cell: (d) => formatUsd(d.depositsCents) },
              { id: "balances", header: "Balances", align: "end", cell: (d) => formatUsd(d.balancesCents) },
              { id: "refunds", header: "Refunds", align: "end", cell: (d) => formatUsd(d.refundsCents) },
              { id: "net", header: "Net", align: "end", cell: (d) => formatUsd(d.netCents) },
            ]}
          />
        </div>
      </details>
    </OverviewSection>
  );
}
