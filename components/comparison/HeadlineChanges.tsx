import type { ComparisonResult } from "@/lib/comparisons/compute";
import { speedometerSentence } from "@/lib/comparisons/speedometer";
import { type DisplayPrefs, formatEnteredSpeed, formatLen, formatLenOther, formatNumber, formatSpeedIn } from "@/lib/comparisons/format";
import { ChangeStat } from "./ChangeStat";
import { CrawlStats } from "./CrawlStats";

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
        <ChangeStat
          testId="change-diameter"
          label="Overall diameter"
          value={len(c.diameterMm)}
          sub={`${formatLen(r.current.overallDiameterMm, prefs, { decimals: 1 })} → ${formatLen(r.planned.overallDiameterMm, prefs, { decimals: 1 })}`}
        />
        <ChangeStat
          testId="change-ground"
          label="Ground clearance"
          value={len(c.groundClearanceMm)}
          sub={`under the axle · ${other(c.groundClearanceMm)}`}
        />
        <ChangeStat
          testId="change-inner"
          label="Inner clearance"
          value={len(c.innerClearanceMm)}
          sub={direction(c.innerClearanceMm, "more room inboard", "less room inboard")}
        />
        <ChangeStat
          testId="change-poke"
          label="Poke"
          value={len(c.outerPokeMm)}
          sub={direction(c.outerPokeMm, "reaches further out", "tucks further in")}
        />
        <ChangeStat
          testId="change-scrub"
          label="Scrub radius"
          value={len(c.scrubRadiusMm)}
          sub={
            r.kingpinInclinationDeg === null ? "KPI not entered: wheel shift only" : `with ${formatNumber(r.kingpinInclinationDeg, 1)}° KPI`
          }
        />
        <ChangeStat testId="change-track" label="Track width" value={len(c.trackWidthMm)} sub="per axle" />
        <ChangeStat
          testId="change-speed"
          label={`True speed at ${formatSpeedIn(h.indicated, speed.unit, 0)} shown`}
          value={formatSpeedIn(h.actual, speed.unit)}
          sub={speedometerSentence(r.speedometer.ratio)}
        />
        {cruise && (
          <ChangeStat
            testId="change-rpm"
            label={`RPM at ${formatEnteredSpeed(cruise.mph, prefs)}`}
            value={formatNumber(cruise.plannedRpm)}
            sub={`was ${formatNumber(cruise.currentRpm)} · ${formatNumber(((cruise.plannedRpm - cruise.currentRpm) / cruise.currentRpm) * 100, 1, { signed: true })} %`}
          />
        )}
        <ChangeStat
          testId="change-ratio"
          label="Suggested axle ratio"
          value={formatNumber(r.gearing.suggestedRatio, 2)}
          sub={`${formatNumber(r.gearing.ratioToRestore, 2)} restores; now acts like ${formatNumber(r.gearing.effectiveRatio, 2)}`}
        />
        <ChangeStat
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
