"use client";
import Link from "next/link";
import { Badge } from "@/components/ui/Badge";
import { Table, type TableColumn } from "@/components/ui/Table";
import { useSortedRows } from "@/components/ui/useSortedRows";
import { QUOTE_STATUSES } from "@/lib/platform/db/types";
import type { QuoteListItem } from "@/lib/shop/quotes/api";
import { formatUsd } from "@/lib/shop/quotes/money";
import { STATUS_LABEL } from "@/lib/shop/quotes/status";
import { statusTone } from "./statusTone";

const COLUMNS: TableColumn<QuoteListItem>[] = [
  {
    id: "number",
    header: "Quote",
    sortable: true,
    sortValue: (q) => q.number,
    cell: (q) => (
      <Link className="font-medium text-ember-700 underline" href={`/shop/quotes/${q.id}`}>
        Q-{q.number}
      </Link>
    ),
  },
  { id: "customer", header: "Customer", sortable: true, sortValue: (q) => q.customerName, cell: (q) => q.customerName },
  { id: "vehicle", header: "Vehicle", sortable: true, sortValue: (q) => q.vehicleDescription, cell: (q) => q.vehicleDescription },
  // In the order a quote moves through, not alphabetically.
  {
    id: "status",
    header: "Status",
    sortable: true,
    sortValue: (q) => QUOTE_STATUSES.indexOf(q.status),
    cell: (q) => <Badge tone={statusTone(q.status)}>{STATUS_LABEL[q.status]}</Badge>,
  },
  { id: "total", header: "Total", sortable: true, sortValue: (q) => q.totalCents, cell: (q) => formatUsd(q.totalCents), align: "end" },
  {
    id: "deposit",
    header: "Deposit",
    sortable: true,
    sortValue: (q) => q.depositCents,
    cell: (q) => formatUsd(q.depositCents),
    align: "end",
  },
  {
    id: "by",
    header: "By",
    sortable: true,
    sortValue: (q) => q.createdByName,
    cell: (q) => <span className="text-basalt-600">{q.createdByName ?? "—"}</span>,
    className: "pl-3",
  },
];

/** The shop's quotes, newest first as the server sends them; any column header sorts them. */
export function QuotesTable({ quotes }: { quotes: QuoteListItem[] }) {
  const sorted = useSortedRows(quotes, COLUMNS);
  return (
    <Table
      caption="Quotes, newest first; column headers sort"
      className="min-w-[720px]"
      columns={COLUMNS}
      {...sorted}
      rowKey={(q) => q.id}
    />
  );
}
