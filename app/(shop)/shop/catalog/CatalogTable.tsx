"use client";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import Link from "next/link";
import { CatalogKindSelect } from "@/components/catalog/CatalogKindSelect";
import { StockLevel } from "@/components/catalog/StockLevel";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Card } from "@/components/ui/Card";
import { Pagination } from "@/components/ui/Pagination";
import { SearchField } from "@/components/ui/SearchField";
import { Table, type TableColumn } from "@/components/ui/Table";
import { type TableSort, nextSort } from "@/components/ui/tableSort";
import type { CatalogItem, CatalogPage } from "@/lib/shop/catalog/api";
import type { CatalogKind } from "@/lib/platform/db/types";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { formatUsd } from "@/lib/shop/quotes/money";
import { CATALOG_QUERY_LABELS } from "@/lib/shop/catalog/schema";
import { SERVICE_LABEL, UNIT_LABEL } from "@/lib/shop/catalog/labels";

function details(i: CatalogItem): string {
  if (i.kind === "tire") return i.tireSize ?? "";
  if (i.kind === "wheel") {
    const off =
      i.wheelBackspacingIn !== null
        ? `${i.wheelBackspacingIn} in backspacing (${i.wheelBackspacingReference})`
        : `${i.wheelOffsetMm} mm offset`;
    return `${i.wheelDiameterIn}x${i.wheelWidthIn} · ${off} · ${i.boltPattern}${i.centerBoreMm ? ` · bore ${i.centerBoreMm} mm` : ""}${i.beadlock ? " · beadlock" : ""}`;
  }
  return `${SERVICE_LABEL[i.serviceType ?? "other"]} · ${i.serviceUnit ? UNIT_LABEL[i.serviceUnit] : ""}`;
}

/** The columns; each sortable column's id is the server's sort key for it. Owners get an edit link per row. */
function columns(canEdit: boolean): TableColumn<CatalogItem>[] {
  return [
    { id: "sku", header: "SKU", cell: (i) => i.sku, sortable: true },
    {
      id: "kind",
      header: "Kind",
      cell: (i) => <Badge tone={i.kind === "tire" ? "steel" : i.kind === "wheel" ? "ember" : "neutral"}>{i.kind}</Badge>,
      sortable: true,
    },
    { id: "description", header: "Description", cell: (i) => i.description, sortable: true },
    {
      id: "tire_diameter_mm",
      header: "Size / details",
      cell: (i) => <span className="text-basalt-700">{details(i)}</span>,
      sortable: true,
    },
    { id: "price_cents", header: "Price", cell: (i) => formatUsd(i.priceCents), sortable: true, align: "end" },
    { id: "qty_on_hand", header: "On hand", cell: (i) => i.qtyOnHand ?? "—", sortable: true, align: "end" },
    { id: "held", header: "Held by quotes", cell: (i) => (i.qtyOnHand === null ? "—" : i.qtyReserved), align: "end" },
    { id: "available", header: "Available", cell: (i) => <StockLevel item={i} />, align: "end" },
    ...(canEdit
      ? [
          {
            id: "edit",
            header: <span className="sr-only">Edit</span>,
            cell: (i: CatalogItem) => (
              <Link className="text-ember-700 underline" href={`/shop/catalog/${i.id}`} aria-label={`Edit ${i.sku}`}>
                Edit
              </Link>
            ),
          },
        ]
      : []),
  ];
}

/** What the list is narrowed to: a kind, the archived items only, a search. */
type Filters = { kind: "" | CatalogKind; archived: boolean; search: string };

/** The catalog table: paging, sorting and filtering all happen on the server. */
export function CatalogTable({ canEdit = false }: { canEdit?: boolean }) {
  // The server always orders the rows, so the header flips between the two directions.
  const [sort, setSort] = useState<NonNullable<TableSort>>({ id: "sku", desc: false });
  const [pagination, setPagination] = useState({ pageIndex: 0, pageSize: 25 });
  const [filters, setFilters] = useState<Filters>({ kind: "", archived: false, search: "" });
  const { kind, archived, search } = filters;
  // A new filter, search or order starts again at its first page.
  const firstPage = () => setPagination((p) => ({ ...p, pageIndex: 0 }));
  const refilter = (change: Partial<Filters>) => {
    setFilters((f) => ({ ...f, ...change }));
    firstPage();
  };
  const [q, setQ] = useState("");
  useEffect(() => {
    const t = setTimeout(() => setQ(search), 250);
    return () => clearTimeout(t);
  }, [search]);

  const params = new URLSearchParams({
    page: String(pagination.pageIndex + 1),
    pageSize: String(pagination.pageSize),
    sort: sort.id,
    dir: sort.desc ? "desc" : "asc",
    ...(kind ? { kind } : {}),
    ...(q ? { q } : {}),
    ...(archived ? { archived: "1" } : {}),
  });
  const data = useQuery({
    queryKey: queryKeys.shop.catalog.page(params.toString()),
    queryFn: () => api<CatalogPage>(`/api/shop/catalog?${params}`),
    placeholderData: keepPreviousData,
  });
  const total = data.data?.total ?? 0;
  const pageCount = Math.max(1, Math.ceil(total / pagination.pageSize));

  return (
    // `relative`: the screen-reader-only header of the last column is positioned absolutely; without a
    // positioned scroller it escaped the scroll and made the whole page 959 px wide on a phone.
    <Card className="scroll-cue relative overflow-x-auto" tabIndex={0} role="region" aria-label="Catalog items">
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <SearchField
          label={CATALOG_QUERY_LABELS.q}
          maxLength={100}
          placeholder="e.g. 37x12.50, 6x139.7 or a SKU"
          inputClassName="min-h-10 w-72 max-w-full placeholder:text-basalt-500"
          value={search}
          onValue={(text) => refilter({ search: text })}
        />
        <CatalogKindSelect value={kind} onChange={(k) => refilter({ kind: k })} />
        {canEdit && (
          <label className="flex min-h-10 items-center gap-2 text-sm font-medium">
            <input
              type="checkbox"
              className="size-4 accent-ember-600"
              checked={archived}
              onChange={(e) => refilter({ archived: e.target.checked })}
            />
            {CATALOG_QUERY_LABELS.archived}
          </label>
        )}
        <p className="ml-auto text-sm text-basalt-600" aria-live="polite">
          {data.isFetching ? "Loading…" : `${total.toLocaleString("en-US")} ${archived ? "archived " : ""}item${total === 1 ? "" : "s"}`}
        </p>
      </div>
      {data.isError && <Alert tone="error">{(data.error as Error).message}</Alert>}
      <Table
        caption="Catalog items; column headers sort"
        className="min-w-[960px]"
        columns={columns(canEdit)}
        rows={data.data?.items ?? []}
        rowKey={(i) => i.id}
        rowTestId="catalog-row"
        sort={sort}
        onSort={(id) => {
          setSort((cur) => nextSort(cur, id) ?? cur);
          firstPage();
        }}
        empty={!data.isLoading && total === 0 ? (archived ? "No archived item matches." : "Nothing matches.") : undefined}
      />
      <div className="mt-4 flex flex-wrap items-center gap-2 text-sm">
        <Pagination
          label="Catalog pages"
          pageIndex={pagination.pageIndex}
          pageCount={pageCount}
          onPage={(pageIndex) => setPagination((p) => ({ ...p, pageIndex }))}
        />
        <label className="ml-auto flex items-center gap-2">
          {CATALOG_QUERY_LABELS.pageSize}
          <select
            className="rounded border border-basalt-300 px-2 py-1"
            value={pagination.pageSize}
            onChange={(e) => setPagination({ pageIndex: 0, pageSize: Number(e.target.value) })}
          >
            {[10, 25, 50, 100].map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
      </div>
    </Card>
  );
}
