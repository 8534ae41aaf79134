import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { HeadlineChanges } from "./ResultsPanel";
import { SetupDetailTable } from "./SetupDetailTable";

// Apart from ResultsPanel.tsx so that importing the headline changes does not bring the detail
// table into a page's first load (LazySetupDetailTable loads it when scrolled near).

/**
 * The headline changes and the detail table together, rendered at once (no hooks: on the server too).
 * @public the pages compose the parts today; kept whole for the garage page (decide when that lands)
 */
export function WholeResults({ result, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  return (
    <div className="flex flex-col gap-6">
      <HeadlineChanges result={result} prefs={prefs} />
      <SetupDetailTable result={result} prefs={prefs} />
    </div>
  );
}
