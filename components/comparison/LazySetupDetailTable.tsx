"use client";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { MountWhenNear } from "@/components/ui/MountWhenNear";
import { clientLazy } from "@/components/ui/clientLazy";

// Its code too waits for the approach: the rows' labels and formatting are not first-load JavaScript.
const SetupDetailTable = clientLazy(() => import("./SetupDetailTable").then((m) => m.SetupDetailTable));

/**
 * The detail table where it is below the fold (the workspace, a share page): mounted when scrolled
 * near, so its fourteen rows of formatting are not part of hydrating the page on a phone. The
 * reserve is a little under the table's height with its heading and footnote (measured at 375–1280 px).
 */
export function LazySetupDetailTable({ result, prefs }: { result: ComparisonResult; prefs: DisplayPrefs }) {
  return (
    <MountWhenNear label="Loading both setups in detail" reserve="min-h-[52rem] sm:min-h-[46rem] lg:min-h-[44rem]">
      <SetupDetailTable result={result} prefs={prefs} />
    </MountWhenNear>
  );
}
