/**
 * The mail to the customer when the provider confirms the last refund of their deposit and the
 * quote is closed for it (declined, its stock released). It is that last refund's receipt as well
 * (the amount refunded now and when, then the whole deposit refunded), so the customer gets one
 * mail, not a receipt and a closing notice at the same moment. Pure composition; the webhook's
 * transaction queues it once, with the decline, instead of the refund's receipt.
 */
import type { OutgoingMail } from "@/lib/platform/mail";
import { formatUsd } from "@/lib/shop/quotes/money";
import { type ReceiptFacts, linesMail, refundSentence } from "./receiptMail";

export interface ClosedOnRefundFacts extends Pick<ReceiptFacts, "customer" | "shop" | "quoteNumber" | "vehicle" | "at" | "timeZone"> {
  /** The whole deposit given back (Σ refunds the provider confirmed). */
  refundedCents: number;
  /** The last refund, the one that closed the quote (its receipt is this mail). */
  refundedNowCents: number;
}

/**
 * @example
 * closedOnRefundMail({ ...facts, quoteNumber: 1003, refundedCents: 107696, refundedNowCents: 57696 }).subject;
 * // "Closed: quote Q-1003 at Shop A, your deposit of $1,076.96 refunded"
 */
export function closedOnRefundMail(f: ClosedOnRefundFacts): OutgoingMail {
  const amount = formatUsd(f.refundedCents);
  const ask = f.shop.phone ? `call ${f.shop.name} on ${f.shop.phone}` : `ask ${f.shop.name}`;
  return linesMail(f, `Closed: quote Q-${f.quoteNumber} at ${f.shop.name}, your deposit of ${amount} refunded`, [
    refundSentence(f, f.refundedNowCents),
    `Your deposit of ${amount} for quote Q-${f.quoteNumber} (${f.vehicle}) has been refunded in full, so the quote is now closed.`,
    "The refund goes back to the card you paid with. Nothing is booked or held for this quote any more.",
    `To have the work done after all, ${ask} for a new quote.`,
  ]);
}
