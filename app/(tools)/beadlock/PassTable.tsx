import { type FigureColumn, FigureTable } from "@/components/ui/FigureTable";
import { formatNumber } from "@/lib/comparisons/format";
import type { TorquePass, TorquePlan, TorqueUnit } from "@/lib/fitment";

/** The printed order: a box per bolt, to tick by hand. */
function PrintOrder({ p }: { p: TorquePass }) {
  return (
    <ol data-testid="print-order" aria-label={`Order for pass ${p.pass}`} className="flex flex-wrap gap-x-1.5 gap-y-1">
      {p.sequence.map((bolt) => (
        <li key={bolt} className="inline-flex items-center gap-0.5 text-xs leading-none font-semibold">
          <span aria-hidden className="inline-block size-3 border border-basalt-900" />
          {bolt}
        </li>
      ))}
    </ol>
  );
}

/**
 * The torque passes in ft·lb and N·m (the chosen unit in bold). On paper a last column lists the
 * order with a box per bolt, one row per pass, to tick by hand.
 */
export function PassTable({ plan, unit }: { plan: TorquePlan; unit: TorqueUnit }) {
  const strong = (u: TorqueUnit) => (u === unit ? "font-semibold text-basalt-950" : undefined);
  const columns: FigureColumn<TorquePass>[] = [
    { id: "pass", header: "Pass", cell: (p) => (p.kind === "check" ? `${p.pass}: check every bolt` : `${p.pass}`) },
    { id: "share", header: "Share", align: "end", className: "whitespace-nowrap", cell: (p) => `${Math.round(p.fraction * 100)} %` },
    { id: "ftlb", header: "ft·lb", align: "end", className: strong("ftlb"), cell: (p) => formatNumber(p.torqueFtLb, 1) },
    { id: "nm", header: "N·m", align: "end", className: strong("nm"), cell: (p) => formatNumber(p.torqueNm, 1) },
    {
      id: "order",
      header: "Order — tick each bolt as you go",
      className: "hidden pl-4 print:table-cell",
      cell: (p) => <PrintOrder p={p} />,
    },
  ];
  return (
    <FigureTable
      columns={columns}
      rows={plan.passes}
      rowKey={(p) => `${p.pass}`}
      rowHeaderClassName="font-medium"
      cellClassName="print:py-1"
      className="mt-3 tabular-nums"
      testId="torque-passes"
    />
  );
}
