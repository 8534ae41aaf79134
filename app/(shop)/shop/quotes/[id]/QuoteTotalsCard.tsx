import { Card } from "@/components/ui/Card";
import { formatBp, formatUsd } from "@/lib/quotes/money";
import type { Detail } from "./types";

/** The saved totals (computed by the server), the deposit and what is left to pay after it. */
export function QuoteTotalsCard({ quote: q, stale }: { quote: Detail["quote"]; stale: boolean }) {
  return (
    <Card>
      <h2 className="text-lg font-semibold">Totals</h2>
      {stale && <p className="mt-1 text-sm text-tight-800">These are the saved totals; save the lines to update them.</p>}
      <dl className="mt-3 grid grid-cols-[1fr_auto] gap-x-3 gap-y-1 text-sm tabular-nums" data-testid="quote-totals">
        <dt>Subtotal</dt><dd className="text-right">{formatUsd(q.subtotal_cents)}</dd>
        {q.discount_cents > 0 && (<><dt>Discount</dt><dd className="text-right">−{formatUsd(q.discount_cents)}</dd></>)}
        <dt>Tax {formatBp(q.tax_rate_bp)} % on {formatUsd(q.taxable_cents)}</dt><dd className="text-right">{formatUsd(q.tax_cents)}</dd>
        <dt className="font-semibold">Total</dt><dd className="text-right font-semibold">{formatUsd(q.total_cents)}</dd>
        <dt>Deposit ({q.deposit_pct} %)</dt><dd className="text-right">{formatUsd(q.deposit_cents)}</dd>
        <dt>Balance due after the deposit</dt><dd className="text-right" data-testid="quote-balance">{formatUsd(q.total_cents - q.deposit_cents)}</dd>
      </dl>
    </Card>
  );
}
