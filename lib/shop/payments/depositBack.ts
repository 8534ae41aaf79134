/**
 * When a quote's deposit counts as given back: the refunds asked of the provider (confirmed by its
 * webhook, or still on their way) add up to every paid deposit. Such a quote can no longer be
 * booked. One rule for the booking queries (which sum the ledger in SQL) and the pages (which
 * have the invoice figures, lib/shop/payments/invoice.ts).
 */
import type { InvoiceFigures } from "./invoice";

/**
 * The refunds that count as asked back: confirmed by the provider, or still on their way. A refund
 * the provider reports as failed gave nothing back and counts nowhere (the deposit can be refunded
 * again). The ledger's SQL sum and the invoice figures both read this list.
 */
export const REFUND_ASKED_STATUSES = ["pending", "succeeded"] as const;

export const DEPOSIT_REFUNDED =
  "The deposit on this quote has been refunded in full, so it can no longer be booked. A new quote is needed to book again.";

/** Why a quote whose deposit was asked back in full cannot be marked installed. */
export const DEPOSIT_REFUNDED_NOT_INSTALLED =
  "The deposit on this quote has been refunded in full, so the work cannot be marked installed. A new quote is needed to do the work.";

/**
 * @example
 * depositGivenBack(107696, 107696); // true
 * depositGivenBack(107696, 97696); // false: the shop kept 100.00 of it
 * depositGivenBack(0, 0); // false: nothing was paid
 */
export function depositGivenBack(depositPaidCents: number, refundsAskedCents: number): boolean {
  return depositPaidCents > 0 && refundsAskedCents >= depositPaidCents;
}

/**
 * The same from the invoice: what was asked back is the deposit paid less what is still refundable.
 *
 * @example
 * invoiceDepositGivenBack({ depositPaidCents: 107696, refundableCents: 0 }); // true
 */
export function invoiceDepositGivenBack(i: Pick<InvoiceFigures, "depositPaidCents" | "refundableCents">): boolean {
  return depositGivenBack(i.depositPaidCents, i.depositPaidCents - i.refundableCents);
}
