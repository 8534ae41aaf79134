import type { ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import { type FigureColumn, FigureTable } from "@/components/ui/FigureTable";
import type { ComparisonResult, SetupFigures } from "@/lib/comparisons/compute";
import {
  type DisplayPrefs,
  formatInches,
  formatLen,
  formatLenOther,
  formatLoad,
  formatNumber,
  formatPartThickness,
  formatPressure,
  formatSpeedRating,
} from "@/lib/comparisons/format";

// Its own module so the pages that show it below the fold load it when scrolled near
// (LazySetupDetailTable), not with the headline changes on the first load.

function lenPair(mm: number, prefs: DisplayPrefs, decimals?: number) {
  return (
    <>
      {formatLen(mm, prefs, { decimals })}
      <span className="block text-xs text-basalt-500">{formatLenOther(mm, prefs)}</span>
    </>
  );
}

type Row = { label: string; hint?: string; cell: (f: SetupFigures) => ReactNode };

/** One row per figure, the current setup beside the planned one. */
const detailColumns = (r: ComparisonResult): FigureColumn<Row>[] => [
  {
    id: "figure",
    header: "Figure",
    headerClassName: "w-[34%]",
    cell: (row) => (
      <>
        {row.label}
        {row.hint && <span className="block text-xs font-normal text-basalt-500">{row.hint}</span>}
      </>
    ),
  },
  {
    id: "current",
    header: "Current",
    headerClassName: "w-[33%] border-l-4 border-steel-500 text-steel-800",
    cell: (row) => row.cell(r.current),
  },
  {
    id: "planned",
    header: "Planned",
    headerClassName: "w-[33%] border-l-4 border-dashed border-ember-500 text-ember-800",
    cell: (row) => row.cell(r.planned),
  },
];

/** Every figure of both setups, side by side. */
export function SetupDetailTable({ result: r, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  const rows: Row[] = [
    { label: "Tire size", cell: (f) => <span className="font-semibold">{f.tireText}</span> },
    {
      label: "Wheel",
      cell: (f) => (
        <>
          {f.wheelDiameterIn} × {f.wheelWidthIn} in, offset {formatNumber(f.offsetMm, 1, { signed: true })} mm
          {f.spacerMm > 0 && (
            <span className="block text-xs text-basalt-500">
              + {formatPartThickness(f.spacerMm, prefs)} spacer (acts as {formatNumber(f.effectiveOffsetMm, 1, { signed: true })} mm)
            </span>
          )}
        </>
      ),
    },
    {
      label: "Backspacing",
      hint: "of the wheel",
      cell: (f) => (
        <>
          {formatInches(f.backspacingFlangeIn, prefs)} to the flange edge
          <span className="block text-xs text-basalt-500">
            {formatInches(f.backspacingBeadSeatIn, prefs)} to the bead seat (allowance {formatInches(f.flangeAllowanceIn, prefs)})
          </span>
        </>
      ),
    },
    { label: "Overall diameter", cell: (f) => lenPair(f.overallDiameterMm, prefs, prefs.units === "metric" ? 1 : 2) },
    {
      label: "Section width",
      hint: "on this rim",
      cell: (f) => (
        <>
          {lenPair(f.sectionWidthMm, prefs, prefs.units === "metric" ? 1 : 2)}
          <span className={cx("block text-xs", f.rimWidthSuitable ? "text-basalt-500" : "font-semibold text-tight-800")}>
            rims {f.rimWidthMinIn}–{f.rimWidthMaxIn} in suit{f.rimWidthSuitable ? "" : " — this one is outside"}
          </span>
        </>
      ),
    },
    { label: "Sidewall height", cell: (f) => lenPair(f.sidewallMm, prefs, prefs.units === "metric" ? 1 : 2) },
    { label: "Circumference", hint: "unloaded", cell: (f) => lenPair(f.circumferenceMm, prefs, prefs.units === "metric" ? 0 : 1) },
    { label: "Revolutions per mile", cell: (f) => formatNumber(f.revsPerMile, 1) },
    { label: "Revolutions per km", cell: (f) => formatNumber(f.revsPerKm, 1) },
    { label: "Reach inboard of hub face", cell: (f) => formatLen(f.innerSwingMm, prefs, { decimals: prefs.units === "metric" ? 1 : 2 }) },
    { label: "Reach outboard of hub face", cell: (f) => formatLen(f.outerSwingMm, prefs, { decimals: prefs.units === "metric" ? 1 : 2 }) },
    {
      label: "Load index",
      cell: (f) =>
        f.load ? (
          <>
            {f.load.index}: {formatLoad(f.load.kg, prefs)}
            {f.load.dualIndex !== null && f.load.dualKg !== null && (
              <span className="block text-xs text-basalt-500">
                dual {f.load.dualIndex}: {formatLoad(f.load.dualKg, prefs)}
              </span>
            )}
          </>
        ) : (
          <span className="text-basalt-500">not in the size</span>
        ),
    },
    {
      label: "Speed symbol",
      cell: (f) =>
        f.speed ? (
          `${f.speed.symbol}: ${formatSpeedRating(f.speed.kmh, f.speed.mph, prefs)}`
        ) : (
          <span className="text-basalt-500">not in the size</span>
        ),
    },
    {
      label: "Load range",
      hint: "max pressure",
      cell: (f) =>
        f.loadRange ? (
          <>
            {f.loadRange.letter} ({f.loadRange.plyRating} ply)
            {f.loadRange.maxPressurePsi !== null ? `: ${formatPressure(f.loadRange.maxPressurePsi, prefs)}` : ""}
            <span className="block text-xs text-basalt-500">
              {f.loadRange.maxPressurePsi !== null ? "the sidewall marking wins" : f.loadRange.source}
            </span>
          </>
        ) : (
          <span className="text-basalt-500">not in the size</span>
        ),
    },
  ];
  return (
    <section aria-labelledby="details-title">
      <h2 id="details-title" className="mb-2 text-lg font-semibold">
        Both setups in detail
      </h2>
      <FigureTable
        look="banded"
        columns={detailColumns(r)}
        rows={rows}
        rowKey={(row) => row.label}
        className="min-w-[20rem] border-collapse bg-white tabular-nums"
        scrollRegion={{
          label: "Both setups in detail (scrolls sideways on narrow screens)",
          className: "rounded-lg ring-1 ring-basalt-100",
        }}
      />
      <p className="mt-2 text-xs text-basalt-500">
        Dimensions are nominal and unloaded (ISO 4000-1 / ETRTO designations); the maker&apos;s published figures win. Load range pressures
        are from memory of TRA practice — go by the sidewall.
      </p>
    </section>
  );
}
