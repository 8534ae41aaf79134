import type { QuotePayments, RefundEntry } from "@/lib/shop/payments/api";
import type { InvoiceFigures } from "@/lib/shop/payments/invoice";

/**
 * The deposit of the worked quote the payment tests share: 25 % of 4,307.82 = 1,076.96, paid through the
 * provider (tests/integration/shop-quotes.test.ts, worked by hand in cents), as the payment history lists it.
 */
export const PAID_DEPOSIT = {
  id: "p1",
  kind: "deposit" as const,
  method: "provider" as const,
  amountCents: 107696,
  paidAt: "2027-03-01T17:00:00Z",
  recordedBy: "",
};

/** The same deposit as `invoiceFigures` counts it. */
export const DEPOSIT_PAID = { kind: "deposit" as const, status: "paid" as const, amountCents: 107696 };

/** A refund of that deposit asked by the owner, as the history lists it: waiting, or reported failed five minutes on. */
export function refundEntry(status: "pending" | "failed", amountCents: number): RefundEntry {
  return {
    id: "r1",
    paymentId: "p1",
    amountCents,
    status,
    requestedBy: "Olive Owner",
    createdAt: "2027-03-02T17:00:00Z",
    succeededAt: null,
    failedAt: status === "failed" ? "2027-03-02T17:05:00Z" : null,
  };
}

/** A quote's payments as the routes answer them: the paid deposit, no refunds, the invoice open, on Denver's clock, unless `over` says otherwise. */
export function quotePayments(invoice: InvoiceFigures, over: Partial<Omit<QuotePayments, "invoice">> = {}): QuotePayments {
  return { invoice, invoiceOpen: true, refundBlocked: null, payments: [PAID_DEPOSIT], refunds: [], timeZone: "America/Denver", ...over };
}
