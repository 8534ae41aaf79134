import type { ComparisonResult } from "@/lib/comparisons/compute";
import { formatNumber } from "@/lib/comparisons/format";
import { ChangeStat } from "./ChangeStat";

/**
 * The crawl ratio (first gear × transfer-case low × axle) on the current and the suggested axle
 * ratio, each with what the planned tire makes it act like (× D_current / D_planned).
 */
export function CrawlStats({ result: r }: { result: ComparisonResult }) {
  const c = r.gearing.crawl;
  if (!c) return null;
  const ratio = (x: number) => `${formatNumber(x, 2)}:1`;
  return (
    <>
      <ChangeStat
        testId="change-crawl"
        label="Crawl ratio"
        value={ratio(c.ratio)}
        sub={`${formatNumber(c.firstGearRatio, 2)} × ${formatNumber(c.transferLowRatio, 2)} × ${formatNumber(r.gearing.axleRatio, 2)}; planned tire: acts like ${ratio(c.onPlannedTire)} (${formatNumber(c.changePct, 1, { signed: true })} %)`}
      />
      <ChangeStat
        testId="change-crawl-regeared"
        label="Crawl ratio regeared"
        value={ratio(c.regeared)}
        sub={`with ${formatNumber(r.gearing.suggestedRatio, 2)}; planned tire: acts like ${ratio(c.regearedOnPlannedTire)}`}
      />
    </>
  );
}
