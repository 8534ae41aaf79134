"use client";
import Link from "next/link";
import { useState } from "react";
import { Card } from "@/components/ui/Card";
import { Pagination } from "@/components/ui/Pagination";
import { SearchField } from "@/components/ui/SearchField";
import { Table, type TableColumn } from "@/components/ui/Table";
import { pageOf } from "@/components/ui/tableSort";
import { useSortedRows } from "@/components/ui/useSortedRows";
import { type FitmentMatch, formatLength, inToMm } from "@/lib/fitment";
import { matchesFinderFilter } from "@/lib/garage/finderFilter";
import { bothUnits } from "@/lib/garage/format";
import { vehicleWorkspaceUrl } from "@/lib/garage/links";
import { setupQuery } from "@/lib/setup/url";
import type { Vehicle } from "@/lib/garage/types";
import { candidateSetup } from "./candidate";

/** 25 rows a page: the best 200 fit on eight pages instead of one page 12,000 px tall. */
export const FINDER_PAGE_SIZE = 25;

const mm = (v: number) => formatLength(v, { unit: "mm" });
const wheelText = (m: FitmentMatch) => `${m.wheel.diameterIn}x${m.wheel.widthIn}`;

/** The columns; every figure sorts (text sorts too), only the links do not. */
function finderColumns(vehicle: Vehicle): TableColumn<FitmentMatch>[] {
  return [
    { id: "rank", header: "Rank", sortable: true, sortValue: (m) => m.rank, cell: (m) => m.rank, align: "end" },
    {
      id: "tire",
      header: "Tire size",
      sortable: true,
      sortValue: (m) => m.tire.text,
      cell: (m) => <span className="whitespace-nowrap font-medium">{m.tire.text}</span>,
    },
    {
      id: "diameter",
      header: "Diameter",
      sortable: true,
      sortValue: (m) => m.overallDiameterMm,
      cell: (m) => bothUnits(m.overallDiameterMm),
    },
    // Rim diameter first, then width: 17x9 before 17x10 before 18x8.
    { id: "wheel", header: "Wheel", sortable: true, sortValue: (m) => m.wheel.diameterIn * 1000 + m.wheel.widthIn, cell: wheelText },
    {
      id: "offset",
      header: "Offset",
      sortable: true,
      sortValue: (m) => m.wheel.offsetMm,
      cell: (m) => <span className="whitespace-nowrap">{`${m.wheel.offsetMm > 0 ? "+" : ""}${m.wheel.offsetMm} mm`}</span>,
    },
    {
      id: "backspacing",
      header: "Backspacing (bead seat)",
      sortable: true,
      sortValue: (m) => m.backspacingIn,
      cell: (m) => formatLength(inToMm(m.backspacingIn), { unit: "in", fraction: 16 }),
    },
    { id: "inner", header: "Reach inboard", sortable: true, sortValue: (m) => m.innerSwingMm, cell: (m) => mm(m.innerSwingMm) },
    { id: "outer", header: "Reach outboard", sortable: true, sortValue: (m) => m.outerSwingMm, cell: (m) => mm(m.outerSwingMm) },
    {
      id: "tightest",
      header: "Tightest point",
      sortable: true,
      // Rows without measured points have no figure here and sort last either way.
      sortValue: (m) => m.tightestClearance?.predictedMm ?? null,
      cell: (m) => (m.tightestClearance === null ? "—" : `${m.tightestClearance.label ?? "point"}: ${mm(m.tightestClearance.predictedMm)}`),
    },
    {
      id: "open",
      header: "Compare",
      cell: (m) => {
        const s = candidateSetup(m);
        return (
          <span className="flex flex-col gap-1">
            <Link
              className="text-ember-700 underline"
              href={vehicleWorkspaceUrl(vehicle.currentSetup, s, vehicle)}
              data-testid="candidate-workspace"
            >
              Workspace
            </Link>
            <Link className="text-ember-700 underline" href={`/garage/${vehicle.id}?${setupQuery("p", s)}`}>
              Predict
            </Link>
          </span>
        );
      },
    },
  ];
}

/**
 * The finder's fits: filtered by tire size or wheel, sorted by any figure (the engine's rank when
 * no header is chosen), 25 a page. Each new search starts again at its first page.
 */
export function FinderTable({
  rows,
  vehicle,
  extraColumns = [],
}: {
  rows: FitmentMatch[];
  vehicle: Vehicle;
  /** Columns shown before the links (the pressure and angle columns, finder/loadColumns.tsx). */
  extraColumns?: TableColumn<FitmentMatch>[];
}) {
  const [filter, setFilter] = useState("");
  const [page, setPage] = useState(0);
  const [shownRows, setShownRows] = useState(rows);
  if (rows !== shownRows) {
    setShownRows(rows);
    setPage(0);
  }
  const base = finderColumns(vehicle);
  const columns = [...base.slice(0, -1), ...extraColumns, ...base.slice(-1)];
  const filtered = rows.filter((m) => matchesFinderFilter(m, filter));
  const sorted = useSortedRows(filtered, columns);
  const shown = pageOf(sorted.rows, page, FINDER_PAGE_SIZE);
  const first = shown.pageIndex * FINDER_PAGE_SIZE;
  return (
    <Card className="flex flex-col gap-3">
      <SearchField
        label="Filter by tire size or wheel"
        className="max-w-sm"
        inputClassName="min-h-10"
        placeholder="e.g. 35x or 17x9"
        value={filter}
        onValue={(v) => {
          setFilter(v);
          setPage(0);
        }}
      />
      {/* Only the table scrolls sideways (its own focusable region), so the filter and the pages stay in view. */}
      <div className="scroll-cue relative overflow-x-auto" tabIndex={0} role="region" aria-label="Fitments found (scrolls sideways)">
        <Table
          testId="finder-results"
          caption="Fitments found, best first; column headers sort"
          className="min-w-[760px]"
          columns={columns}
          rows={shown.rows}
          rowKey={(m) => String(m.rank)}
          sort={sorted.sort}
          onSort={(id) => {
            sorted.onSort(id);
            setPage(0);
          }}
        />
      </div>
      {rows.length === 0 ? (
        <p className="text-sm text-basalt-700">
          Nothing fits these goals. Widen the diameter range or allow more poke; the sizes the measured points exclude are listed with what
          they need.
        </p>
      ) : sorted.rows.length === 0 ? (
        <p className="text-sm text-basalt-700">No fit matches “{filter.trim()}”.</p>
      ) : (
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <Pagination label="Pages of fitments" pageIndex={shown.pageIndex} pageCount={shown.pageCount} onPage={setPage} />
          <span className="text-basalt-600" data-testid="finder-page-rows">
            Rows {first + 1}–{first + shown.rows.length} of {sorted.rows.length.toLocaleString("en-US")}
          </span>
        </div>
      )}
    </Card>
  );
}
