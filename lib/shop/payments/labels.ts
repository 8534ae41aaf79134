/** The words of payments, said once: the counter, the customer's page, the mails and the server's messages read them here. */
import type { PaymentKind, PaymentMethod } from "@/lib/platform/db/types";

export const PAYMENT_KIND_LABEL: Record<PaymentKind, string> = { deposit: "Deposit", balance: "Balance" };
export const PAYMENT_METHOD_LABEL: Record<PaymentMethod, string> = { provider: "Card online", cash: "Cash", card: "Card at the counter" };

/** What staff may record at the counter. */
export const COUNTER_METHODS = ["cash", "card"] as const;
export type CounterMethod = (typeof COUNTER_METHODS)[number];

/** Field labels as the forms show them; server messages name fields by these. */
export const PAYMENT_FIELD_LABEL = {
  amount: "Amount ($)",
  method: "Paid by",
  refundAmount: "Refund amount ($)",
} as const;
