import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { CrossSection, type DrawnLimits } from "./CrossSection";
import { WarningList } from "./ResultsPanel";

/**
 * The cross-section drawing beside the warnings, as the workspace and a shared comparison show
 * them. `limits` draws a garage vehicle's parts (the workspace only).
 */
export function DrawingAndWarnings({
  result,
  prefs,
  limits,
}: {
  result: ComparisonResult;
  prefs: DisplayPrefs;
  limits?: DrawnLimits | null;
}) {
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[3fr_2fr]">
      <section aria-labelledby="drawing-title" className="rounded-card bg-white p-3 shadow-card ring-1 ring-basalt-100 sm:p-4">
        <h2 id="drawing-title" className="mb-2 text-lg font-semibold">
          Side by side at the hub
        </h2>
        <CrossSection result={result} prefs={prefs} limits={limits} />
      </section>
      <WarningList result={result} prefs={prefs} />
    </div>
  );
}
