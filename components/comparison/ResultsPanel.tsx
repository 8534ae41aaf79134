import type { ReactNode } from "react";
import { cx } from "@/components/ui/cx";
import { type FindingTone, LEVEL_LABEL, LEVEL_TONE } from "@/lib/comparisons/assess/vocabulary";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { speedometerSentence } from "@/lib/comparisons/speedometer";
import {
  type DisplayPrefs,
  formatEnteredSpeed,
  formatLen,
  formatLenOther,
  formatNumber,
  formatSpeedIn,
  warningTitle,
} from "@/lib/comparisons/format";

// Read-only results of a comparison: the headline changes and the warnings (the detail table is
// SetupDetailTable.tsx, both together WholeResults.tsx). Props are the computed result and the
// display choice, so the workspace, a share page and a garage page render the same thing. No
// hooks: it renders on the server too.

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
