import { Card } from "@/components/ui/Card";
import { quoteCautions } from "@/lib/shop/quotes/cautions";
import { type FitmentSummary, fitmentChangeRows } from "@/lib/shop/quotes/fitment";

/** The key changes of a quoted fitment, the modifications it needs, and the cautions. */
export function FitmentSummaryCard({ fit }: { fit: FitmentSummary }) {
  const rows: [string, string][] = [
    ["Now", `${fit.current.tire} on ${fit.current.wheel}`],
    ["Planned", `${fit.planned.tire} on ${fit.planned.wheel}${fit.planned.beadlock ? " (beadlock)" : ""}`],
    ...fitmentChangeRows(fit),
  ];
  return (
    <Card>
      <h2 className="text-lg font-semibold">Fitment summary</h2>
      <dl className="mt-3 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
        {rows.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-basalt-600">{k}</dt>
            <dd className="tabular-nums">{v}</dd>
          </div>
        ))}
      </dl>
      {fit.warnings.length > 0 && (
        <>
          <h3 className="mt-4 text-sm font-semibold">Clearance warnings</h3>
          <ul className="mt-1 list-disc pl-5 text-sm text-tight-800">
            {fit.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </>
      )}
      <h3 className="mt-4 text-sm font-semibold">Modifications required</h3>
      {fit.modifications.length ? (
        <ul className="mt-1 list-disc pl-5 text-sm">
          {fit.modifications.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      ) : (
        <p className="mt-1 text-sm text-basalt-600">None expected from the numbers.</p>
      )}
      <h3 className="mt-4 text-sm font-semibold">Cautions</h3>
      <ul className="mt-1 list-disc pl-5 text-sm text-basalt-700">
        {quoteCautions(fit).map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </Card>
  );
}
