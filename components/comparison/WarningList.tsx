import { cx } from "@/components/ui/cx";
import { type FindingTone, LEVEL_LABEL, LEVEL_TONE } from "@/lib/comparisons/assess/vocabulary";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { type DisplayPrefs, warningTitle } from "@/lib/comparisons/format";

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
