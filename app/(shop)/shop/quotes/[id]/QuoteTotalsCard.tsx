import { Card } from "@/components/ui/Card";
import { formatBp, formatUsd } from "@/lib/shop/quotes/money";
import type { QuoteDetail as Detail } from "@/lib/shop/quotes/api";

/** The saved totals (computed by the server), the deposit and what is left to pay after it. */
export function QuoteTotalsCard({ quote: q, stale }: { quote: Detail["quote"]; stale: boolean }) {
  return (
    <Card>
      <h2 className="text-lg font-semibold">Totals</h2>
      {stale && <p className="mt-1 text-sm text-tight-800">These are the saved totals; save the lines to update them.</p>}
      <dl className="mt-3 grid grid-cols-[1fr_auto] gap-x-3 gap-y-1 text-sm tabular-nums" data-testid="quote-totals">
        <dt>Subtotal</dt>
        <dd className="text-right">{formatUsd(q.subtotalCents)}</dd>
        {q.discountCents > 0 && (
          <>
            <dt>Discount</dt>
            <dd className="text-right">−{formatUsd(q.discountCents)}</dd>
          </>
        )}
        <dt>
          Tax {formatBp(q.taxRateBp)} % on {formatUsd(q.taxableCents)}
        </dt>
        <dd className="text-right">{formatUsd(q.taxCents)}</dd>
        <dt className="font-semibold">Total</dt>
        <dd className="text-right font-semibold">{formatUsd(q.totalCents)}</dd>
        <dt>Deposit ({q.depositPct} %)</dt>
        <dd className="text-right">{formatUsd(q.depositCents)}</dd>
        <dt>Balance due after the deposit</dt>
        <dd className="text-right" data-testid="quote-balance">
          {formatUsd(q.totalCents - q.depositCents)}
        </dd>
      </dl>
    </Card>
  );
}
