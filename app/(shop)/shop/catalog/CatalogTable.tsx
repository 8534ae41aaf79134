"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { type ColumnDef, type SortingState, flexRender, getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { useEffect, useMemo, useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { CATALOG_KIND_FILTERS, type CatalogItem, type CatalogPage } from "@/lib/shop/catalog/api";
import { api } from "@/lib/platform/client/api";
import { formatUsd } from "@/lib/shop/quotes/money";
import { CATALOG_QUERY_LABELS } from "@/lib/shop/catalog/schema";


const SERVICE_LABEL: Record<string, string> = {
  mount_balance: "Mount & balance",
  beadlock_assembly: "Beadlock assembly",
  valve_stem: "Valve stems",
  tpms: "TPMS",
  alignment: "Alignment",
  fender_trim: "Fender trimming",
  disposal: "Disposal",
  other: "Other",
};
const UNIT_LABEL: Record<string, string> = { per_wheel: "per wheel", per_vehicle: "per vehicle", per_hour: "per hour" };

function details(i: CatalogItem): string {
  if (i.kind === "tire") return i.tireSize ?? "";
  if (i.kind === "wheel") {
    const off = i.wheelBackspacingIn !== null ? `${i.wheelBackspacingIn} in backspacing (${i.wheelBackspacingReference})` : `${i.wheelOffsetMm} mm offset`;
    return `${i.wheelDiameterIn}x${i.wheelWidthIn} · ${off} · ${i.boltPattern}${i.centerBoreMm ? ` · bore ${i.centerBoreMm} mm` : ""}${i.beadlock ? " · beadlock" : ""}`;
  }
  return `${SERVICE_LABEL[i.serviceType ?? "other"] ?? ""} · ${UNIT_LABEL[i.serviceUnit ?? ""] ?? ""}`;
}

/** The catalog table: paging, sorting and filtering all happen on the server. */
export function CatalogTable() {
  const [sorting, setSorting] = useState<SortingState>([{ id: "sku", desc: false }]);
  const [pagination, setPagination] = useState({ pageIndex: 0, pageSize: 25 });
  const [kind, setKind] = useState("");
  const [search, setSearch] = useState("");
  const [q, setQ] = useState("");
  useEffect(() => {
    const t = setTimeout(() => setQ(search), 250);
    return () => clearTimeout(t);
  }, [search]);

  const params = new URLSearchParams({
    page: String(pagination.pageIndex + 1),
    pageSize: String(pagination.pageSize),
    ...(sorting[0] ? { sort: sorting[0].id, dir: sorting[0].desc ? "desc" : "asc" } : {}),
    ...(kind ? { kind } : {}),
    ...(q ? { q } : {}),
  });
  const data = useQuery({
    queryKey: ["shop-catalog", params.toString()],
    queryFn: () => api<CatalogPage>(`/api/shop/catalog?${params}`),
    placeholderData: keepPreviousData,
  });

  const columns = useMemo<ColumnDef<CatalogItem>[]>(
    () => [
      { id: "sku", accessorKey: "sku", header: "SKU" },
      { id: "kind", accessorKey: "kind", header: "Kind", cell: (c) => <Badge tone={c.row.original.kind === "tire" ? "steel" : c.row.original.kind === "wheel" ? "ember" : "neutral"}>{c.row.original.kind}</Badge> },
      { id: "description", accessorKey: "description", header: "Description" },
      { id: "tire_diameter_mm", header: "Size / details", cell: (c) => <span className="text-basalt-700">{details(c.row.original)}</span> },
      { id: "price_cents", accessorKey: "priceCents", header: "Price", cell: (c) => <span className="tabular-nums">{formatUsd(c.row.original.priceCents)}</span> },
      { id: "qty_on_hand", accessorKey: "qtyOnHand", header: "On hand", cell: (c) => <span className="tabular-nums">{c.row.original.qtyOnHand ?? "—"}</span> },
    ],
    [],
  );
  const total = data.data?.total ?? 0;
  // TanStack Table hands back fresh functions each render; the compiler skipping this component is expected.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: data.data?.items ?? [],
    columns,
    state: { sorting, pagination },
    onSortingChange: (u) => {
      setSorting(u);
      setPagination((p) => ({ ...p, pageIndex: 0 }));
    },
    onPaginationChange: setPagination,
    manualPagination: true,
    manualSorting: true,
    manualFiltering: true,
    rowCount: total,
    getCoreRowModel: getCoreRowModel(),
  });

  return (
    <Card className="overflow-x-auto" tabIndex={0} role="region" aria-label="Catalog items">
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1 text-sm font-medium">
          {CATALOG_QUERY_LABELS.q}
          <input
            type="search"
            maxLength={100}
            placeholder="e.g. 37x12.50, 6x139.7 or a SKU"
            className="min-h-10 w-72 max-w-full rounded-lg border border-basalt-300 px-3 placeholder:text-basalt-500"
            value={search}
            onChange={(e) => {
              setSearch(e.target.value);
              setPagination((p) => ({ ...p, pageIndex: 0 }));
            }}
          />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          {CATALOG_QUERY_LABELS.kind}
          <select
            className="min-h-10 rounded-lg border border-basalt-300 px-3"
            value={kind}
            onChange={(e) => {
              setKind(e.target.value);
              setPagination((p) => ({ ...p, pageIndex: 0 }));
            }}
          >
            <option value="">All</option>
            {CATALOG_KIND_FILTERS.map((k) => (
              <option key={k.kind} value={k.kind}>{k.label}</option>
            ))}
          </select>
        </label>
        <p className="ml-auto text-sm text-basalt-600" aria-live="polite">{data.isFetching ? "Loading…" : `${total.toLocaleString("en-US")} items`}</p>
      </div>
      {data.isError && <Alert tone="error">{(data.error as Error).message}</Alert>}
      <table className="w-full min-w-[760px] text-left text-sm">
        <thead className="text-xs uppercase tracking-wide text-basalt-600">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th key={h.id} className="py-2 pr-3" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                    <button type="button" className="inline-flex items-center gap-1 font-semibold uppercase" onClick={h.column.getToggleSortingHandler()}>
                      {flexRender(h.column.columnDef.header, h.getContext())}
                      <span aria-hidden>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {table.getRowModel().rows.map((r) => (
            <tr key={r.id} data-testid="catalog-row">
              {r.getVisibleCells().map((c) => (
                <td key={c.id} className="py-2 pr-3 align-top">{flexRender(c.column.columnDef.cell, c.getContext())}</td>
              ))}
            </tr>
          ))}
          {!data.isLoading && total === 0 && (
            <tr><td colSpan={columns.length} className="py-6 text-center text-basalt-600">Nothing matches.</td></tr>
          )}
        </tbody>
      </table>
      <div className="mt-4 flex flex-wrap items-center gap-2 text-sm">
        <Button variant="secondary" className="min-h-8 py-1" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>Previous</Button>
        <span>Page {pagination.pageIndex + 1} of {Math.max(table.getPageCount(), 1)}</span>
        <Button variant="secondary" className="min-h-8 py-1" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>Next</Button>
        <label className="ml-auto flex items-center gap-2">
          {CATALOG_QUERY_LABELS.pageSize}
          <select className="rounded border border-basalt-300 px-2 py-1" value={pagination.pageSize} onChange={(e) => setPagination({ pageIndex: 0, pageSize: Number(e.target.value) })}>
            {[10, 25, 50, 100].map((n) => <option key={n} value={n}>{n}</option>)}
          </select>
        </label>
      </div>
    </Card>
  );
}
