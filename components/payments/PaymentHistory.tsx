import { Badge } from "@/components/ui/Badge";
import type { QuotePayments } from "@/lib/shop/payments/api";
import { invoiceLines } from "@/lib/shop/payments/invoice";
import { PAYMENT_KIND_LABEL, PAYMENT_METHOD_LABEL, REFUND_STATUS_LABEL } from "@/lib/shop/payments/labels";
import { formatUsd } from "@/lib/shop/quotes/money";
import { formatInstant } from "@/lib/shop/bookings/zoned";

/** The invoice once the work is done, and every payment and refund of the quote: the counter and the customer see the same. */
export function PaymentHistory({ payments }: { payments: QuotePayments }) {
  const { invoice } = payments;
  // On the shop's clock, whoever reads it and wherever (a server-rendered page is in UTC).
  const when = (iso: string | null) => (iso ? formatInstant(iso, payments.timeZone) : "");
  return (
    <div className="flex flex-col gap-3">
      {payments.invoiceOpen && (
        <div>
          <h3 className="flex items-center gap-2 font-semibold">
            Invoice{" "}
            <Badge tone={invoice.paid ? "clear" : "ember"}>
              <span data-testid="invoice-status">{invoice.paid ? "Paid" : `${formatUsd(invoice.outstandingCents)} to pay`}</span>
            </Badge>
          </h3>
          <ul className="mt-1 text-sm text-basalt-800">
            {invoiceLines(invoice).map((l) => (
              <li key={l}>{l}</li>
            ))}
          </ul>
        </div>
      )}
      <div>
        <h3 className="font-semibold">Payments</h3>
        {payments.payments.length === 0 && payments.refunds.length === 0 ? (
          <p className="text-sm text-basalt-600">No payment yet.</p>
        ) : (
          <ul className="mt-1 flex flex-col gap-1 text-sm" aria-label="Payment history">
            {payments.payments.map((p) => (
              <li key={p.id}>
                {when(p.paidAt)} · {PAYMENT_KIND_LABEL[p.kind]} · {PAYMENT_METHOD_LABEL[p.method]} ·{" "}
                <strong>{formatUsd(p.amountCents)}</strong>
                {p.recordedBy && ` · taken by ${p.recordedBy}`}
              </li>
            ))}
            {payments.refunds.map((r) => (
              <li key={r.id}>
                {when(r.failedAt ?? r.succeededAt ?? r.createdAt)} · Refund of the deposit · <strong>−{formatUsd(r.amountCents)}</strong> ·{" "}
                {REFUND_STATUS_LABEL[r.status]} · by {r.requestedBy}
              </li>
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}
