import { cx } from "@/components/ui/cx";
import type { QuoteDocument } from "@/lib/shop/quotes/document";
import { formatBp, formatUsd } from "@/lib/shop/quotes/money";

/**
 * A quote's totals as the counter and the customer both read them: subtotal, the discount when
 * there is one, tax, total, the deposit and the balance due after it. The counter's list names
 * the taxable amount beside the rate, as the PDF does: with a discount spread over the lines the
 * tax is not the rate times the subtotal, and a customer checking it needs the base. `className`
 * places and spaces the list.
 */
export function QuoteTotalsList({
  totals: t,
  className,
  testIds = {},
}: {
  totals: QuoteDocument["totals"];
  className?: string;
  /** Test ids of the list, the deposit's figure and the balance's, where browser tests read them. */
  testIds?: { list?: string; deposit?: string; balance?: string };
}) {
  return (
    <dl className={cx("grid grid-cols-[1fr_auto] gap-y-1 text-sm tabular-nums", className)} data-testid={testIds.list}>
      <dt>Subtotal</dt>
      <dd className="text-right">{formatUsd(t.subtotalCents)}</dd>
      {t.discountCents > 0 && (
        <>
          <dt>Discount</dt>
          <dd className="text-right">−{formatUsd(t.discountCents)}</dd>
        </>
      )}
      <dt>
        Tax {formatBp(t.taxRateBp)} % on {formatUsd(t.taxableCents)}
      </dt>
      <dd className="text-right">{formatUsd(t.taxCents)}</dd>
      <dt className="font-semibold">Total</dt>
      <dd className="text-right font-semibold">{formatUsd(t.totalCents)}</dd>
      <dt>Deposit ({t.depositPct} %)</dt>
      <dd className="text-right" data-testid={testIds.deposit}>
        {formatUsd(t.depositCents)}
      </dd>
      <dt>Balance due after the deposit</dt>
      <dd className="text-right" data-testid={testIds.balance}>
        {formatUsd(t.balanceCents)}
      </dd>
    </dl>
  );
}
