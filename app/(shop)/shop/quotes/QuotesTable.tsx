import Link from "next/link";
import { QuoteNumberLink } from "@/components/quotes/QuoteNumberLink";
import { Badge } from "@/components/ui/Badge";
import { Table, type TableColumn } from "@/components/ui/Table";
import type { QuoteListItem } from "@/lib/shop/quotes/api";
import { formatUsd } from "@/lib/shop/quotes/money";
import { STATUS_LABEL } from "@/lib/shop/quotes/status";
import { statusTone } from "./statusTone";

const COLUMNS: TableColumn<QuoteListItem>[] = [
  {
    id: "number",
    header: "Quote",
    cell: (q) => <QuoteNumberLink id={q.id} number={q.number} />,
  },
  {
    id: "customer",
    header: "Customer",
    cell: (q) => (
      <>
        {q.customerName}
        {q.customerPhone && <span className="block text-xs text-basalt-600">{q.customerPhone}</span>}
      </>
    ),
  },
  { id: "vehicle", header: "Vehicle", cell: (q) => q.vehicleDescription },
  { id: "status", header: "Status", cell: (q) => <Badge tone={statusTone(q.status)}>{STATUS_LABEL[q.status]}</Badge> },
  { id: "total", header: "Total", cell: (q) => formatUsd(q.totalCents), align: "end" },
  { id: "deposit", header: "Deposit", cell: (q) => formatUsd(q.depositCents), align: "end" },
  { id: "by", header: "By", cell: (q) => <span className="text-basalt-600">{q.createdByName ?? "—"}</span>, className: "pl-3" },
];

/**
 * One page of the shop's quotes in the order the list's Sort control chose; the server orders
 * and pages them (a header sorting one page of many would mislead).
 */
export function QuotesTable({ quotes, firstPageHref }: { quotes: QuoteListItem[]; firstPageHref: string }) {
  return (
    <Table
      caption="Quotes, in the order chosen under Sort"
      className="min-w-[720px]"
      columns={COLUMNS}
      rows={quotes}
      rowKey={(q) => q.id}
      empty={
        <>
          This page is past the last one.{" "}
          <Link className="text-ember-700 underline" href={firstPageHref}>
            Back to the first page
          </Link>
        </>
      }
    />
  );
}
