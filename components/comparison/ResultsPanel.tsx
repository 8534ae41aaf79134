import type { ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import { type FigureColumn, FigureTable } from "@/components/ui/FigureTable";
import { type FindingTone, LEVEL_LABEL, LEVEL_TONE } from "@/lib/comparisons/assess/vocabulary";
import type { ComparisonResult, SetupFigures } from "@/lib/comparisons/compute";
import { speedometerSentence } from "@/lib/comparisons/speedometer";
import {
  type DisplayPrefs,
  formatEnteredSpeed,
  formatInches,
  formatLen,
  formatLenOther,
  formatLoad,
  formatNumber,
  formatPartThickness,
  formatPressure,
  formatSpeedIn,
  formatSpeedRating,
  warningTitle,
} from "@/lib/comparisons/format";

/**
 * Read-only results of a comparison: the headline changes, the warnings and the detail table.
 * Props are the computed result and the display choice, so the workspace, a share page and a
 * garage page render the same thing. No hooks: it renders on the server too.
 * @public the pages compose its parts today; kept whole for the garage page (decide when that lands)
 */
export function ResultsPanel({ result, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  return (
    <div className="flex flex-col gap-6">
      <HeadlineChanges result={result} prefs={prefs} />
      <SetupDetailTable result={result} prefs={prefs} />
    </div>
  );
}

function Stat({ label, value, sub, testId }: { label: string; value: string; sub?: ReactNode; testId?: string }) {
  return (
    <div className="flex min-h-24 flex-col rounded-lg bg-white px-3 py-2.5 ring-1 ring-basalt-100" data-testid={testId}>
      <dt className="text-xs font-semibold uppercase tracking-wide text-basalt-500">{label}</dt>
      <dd className="mt-0.5 font-display text-xl font-bold tabular-nums text-basalt-950">{value}</dd>
      {sub && <dd className="mt-auto text-xs tabular-nums text-basalt-600">{sub}</dd>}
    </div>
  );
}

const direction = (v: number, more: string, less: string, same = "no change") => (Math.abs(v) < 0.05 ? same : v > 0 ? more : less);

/** The headline figures: how the planned setup differs from the current one. */
export function HeadlineChanges({ result: r, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  const c = r.changes;
  const len = (mm: number) => formatLen(mm, prefs, { signed: true, decimals: prefs.units === "metric" ? 1 : 2 });
  const other = (mm: number) => formatLenOther(mm, prefs, { signed: true });
  const cruise = r.gearing.cruise[0];
  const speed = r.speedometer.bySystem[prefs.units];
  const h = speed.headline;
  return (
    <section aria-labelledby="headline-title">
      <h2 id="headline-title" className="mb-2 text-lg font-semibold">
        What changes
      </h2>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-3 lg:grid-cols-5">
        <Stat
          testId="change-diameter"
          label="Overall diameter"
          value={len(c.diameterMm)}
          sub={`${formatLen(r.current.overallDiameterMm, prefs, { decimals: 1 })} → ${formatLen(r.planned.overallDiameterMm, prefs, { decimals: 1 })}`}
        />
        <Stat
          testId="change-ground"
          label="Ground clearance"
          value={len(c.groundClearanceMm)}
          sub={`under the axle · ${other(c.groundClearanceMm)}`}
        />
        <Stat
          testId="change-inner"
          label="Inner clearance"
          value={len(c.innerClearanceMm)}
          sub={direction(c.innerClearanceMm, "more room inboard", "less room inboard")}
        />
        <Stat
          testId="change-poke"
          label="Poke"
          value={len(c.outerPokeMm)}
          sub={direction(c.outerPokeMm, "reaches further out", "tucks further in")}
        />
        <Stat
          testId="change-scrub"
          label="Scrub radius"
          value={len(c.scrubRadiusMm)}
          sub={
            r.kingpinInclinationDeg === null ? "KPI not entered: wheel shift only" : `with ${formatNumber(r.kingpinInclinationDeg, 1)}° KPI`
          }
        />
        <Stat testId="change-track" label="Track width" value={len(c.trackWidthMm)} sub="per axle" />
        <Stat
          testId="change-speed"
          label={`True speed at ${formatSpeedIn(h.indicated, speed.unit, 0)} shown`}
          value={formatSpeedIn(h.actual, speed.unit)}
          sub={speedometerSentence(r.speedometer.ratio)}
        />
        {cruise && (
          <Stat
            testId="change-rpm"
            label={`RPM at ${formatEnteredSpeed(cruise.mph, prefs)}`}
            value={formatNumber(cruise.plannedRpm)}
            sub={`was ${formatNumber(cruise.currentRpm)} · ${formatNumber(((cruise.plannedRpm - cruise.currentRpm) / cruise.currentRpm) * 100, 1, { signed: true })} %`}
          />
        )}
        <Stat
          testId="change-ratio"
          label="Suggested axle ratio"
          value={formatNumber(r.gearing.suggestedRatio, 2)}
          sub={`${formatNumber(r.gearing.ratioToRestore, 2)} restores; now acts like ${formatNumber(r.gearing.effectiveRatio, 2)}`}
        />
        <Stat
          testId="change-rpm-regeared"
          label="RPM regeared"
          value={cruise ? formatNumber(cruise.regearedRpm) : "—"}
          sub={cruise ? `at ${formatEnteredSpeed(cruise.mph, prefs)} with ${formatNumber(r.gearing.suggestedRatio, 2)}` : undefined}
        />
        {r.gearing.crawl && <CrawlStats result={r} />}
      </dl>
    </section>
  );
}

/**
 * The crawl ratio (first gear × transfer-case low × axle) on the current and the suggested axle
 * ratio, each with what the planned tire makes it act like (× D_current / D_planned).
 */
function CrawlStats({ result: r }: { result: ComparisonResult }) {
  const c = r.gearing.crawl;
  if (!c) return null;
  const ratio = (x: number) => `${formatNumber(x, 2)}:1`;
  return (
    <>
      <Stat
        testId="change-crawl"
        label="Crawl ratio"
        value={ratio(c.ratio)}
        sub={`${formatNumber(c.firstGearRatio, 2)} × ${formatNumber(c.transferLowRatio, 2)} × ${formatNumber(r.gearing.axleRatio, 2)}; planned tire: acts like ${ratio(c.onPlannedTire)} (${formatNumber(c.changePct, 1, { signed: true })} %)`}
      />
      <Stat
        testId="change-crawl-regeared"
        label="Crawl ratio regeared"
        value={ratio(c.regeared)}
        sub={`with ${formatNumber(r.gearing.suggestedRatio, 2)}; planned tire: acts like ${ratio(c.regearedOnPlannedTire)}`}
      />
    </>
  );
}

/** How a listed finding looks in each level's colour family (LEVEL_TONE). */
const WARNING_TONE_CLASS: Record<FindingTone, string> = {
  tight: "bg-tight-100 text-tight-800 ring-tight-600/30",
  steel: "bg-steel-50 text-steel-800 ring-steel-200",
};

/** The warnings the numbers call for, each with its reason and the basis of its threshold. */
export function WarningList({ result, prefs, className }: { result: ComparisonResult; prefs: DisplayPrefs; className?: string }) {
  return (
    <section aria-labelledby="warnings-title" className={className}>
      <h2 id="warnings-title" className="mb-2 text-lg font-semibold">
        Check before you buy{" "}
        <span className="text-sm font-normal text-basalt-500">
          ({result.warnings.length === 0 ? "nothing flagged" : result.warnings.length})
        </span>
      </h2>
      {result.warnings.length === 0 ? (
        <p className="rounded-lg bg-clear-100 px-3 py-2 text-sm text-clear-800">
          None of the checks flags this change. Fit and clearance still depend on your vehicle: measure before you buy.
        </p>
      ) : (
        <ul className="flex flex-col gap-2" data-testid="warnings">
          {result.warnings.map((w) => (
            <li
              key={`${w.kind}-${w.setup ?? "both"}`}
              data-kind={w.kind}
              className={cx("rounded-lg px-3 py-2 text-sm ring-1 ring-inset", WARNING_TONE_CLASS[LEVEL_TONE[w.level]])}
            >
              <p className="font-semibold">
                <span className="sr-only">{LEVEL_LABEL[w.level]}: </span>
                {warningTitle(w, prefs)}
              </p>
              <p className="mt-0.5">{w.why}</p>
              <p className="mt-1 text-xs opacity-80">Basis: {w.basis}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

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
