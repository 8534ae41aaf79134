import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { LazyComparisonCharts } from "./LazyComparisonCharts";

/** The titled charts of a comparison (loaded when they come into view, see LazyComparisonCharts). */
export function ChartsSection({ result, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  return (
    <section aria-labelledby="charts-title">
      <h2 id="charts-title" className="mb-2 text-lg font-semibold">
        Charts
      </h2>
      <LazyComparisonCharts result={result} prefs={prefs} />
    </section>
  );
}
