import { PaymentHistory } from "@/components/payments/PaymentHistory";
import { Card } from "@/components/ui/Card";
import type { QuotePayments } from "@/lib/shop/payments/api";
import { REFUND_FAILED_NOTE } from "@/lib/shop/payments/labels";
import { amountFieldText } from "@/lib/shop/quotes/money";
import { PaymentForm } from "./PaymentForm";

/** The quote's money at the counter: invoice, history, the balance taken in cash or by card, and (owner) refunds of the deposit. */
export function PaymentsCard({ quoteId, payments, owner }: { quoteId: string; payments: QuotePayments; owner: boolean }) {
  const { invoice } = payments;
  const lastRefundFailed = payments.refunds.at(-1)?.status === "failed";
  return (
    <Card className="mt-5 flex flex-col gap-4" role="region" aria-label="Payments">
      <h2 className="text-lg font-semibold">Payments</h2>
      <PaymentHistory payments={payments} />
      {payments.invoiceOpen && !invoice.paid && (
        <PaymentForm quoteId={quoteId} mode="counter" suggested={amountFieldText(invoice.outstandingCents)} />
      )}
      {owner && lastRefundFailed && !payments.refundBlocked && (
        <p className="text-sm text-ember-800" role="status">
          {REFUND_FAILED_NOTE}
        </p>
      )}
      {owner && !payments.refundBlocked && (
        <PaymentForm quoteId={quoteId} mode="refund" suggested={amountFieldText(invoice.refundableCents)} />
      )}
      {owner && payments.refundBlocked && invoice.depositPaidCents > 0 && !payments.invoiceOpen && (
        <p className="text-sm text-basalt-600">{payments.refundBlocked}</p>
      )}
    </Card>
  );
}
