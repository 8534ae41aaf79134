/** The words of payments, said once: the counter, the customer's page, the mails and the server's messages read them here. */
import type { PaymentKind, PaymentMethod, PaymentRefundRow } from "@/lib/platform/db/types";

export const PAYMENT_KIND_LABEL: Record<PaymentKind, string> = { deposit: "Deposit", balance: "Balance" };
export const PAYMENT_METHOD_LABEL: Record<PaymentMethod, string> = { provider: "Card online", cash: "Cash", card: "Card at the counter" };

/** A refund of the deposit as the history lists it. */
export const REFUND_STATUS_LABEL: Record<PaymentRefundRow["status"], string> = {
  pending: "waiting for the provider",
  succeeded: "refunded",
  failed: "refund failed — not given back",
};

/** Under the owner's refund form when the latest refund failed: the money is still with the shop. */
export const REFUND_FAILED_NOTE = "The last refund failed, so nothing was given back. You can try again.";

/** On the customer's page when they come back from a balance payment page and nothing is owed (paid there, or already at the counter). */
export const BALANCE_ALREADY_PAID =
  "Your invoice is paid in full, so there is nothing more to pay. Any payment page opened for it has been closed.";

/** What staff may record at the counter. */
export const COUNTER_METHODS = ["cash", "card"] as const;
export type CounterMethod = (typeof COUNTER_METHODS)[number];

/** Field labels as the forms show them; server messages name fields by these. */
export const PAYMENT_FIELD_LABEL = {
  amount: "Amount ($)",
  method: "Paid by",
  refundAmount: "Refund amount ($)",
} as const;
