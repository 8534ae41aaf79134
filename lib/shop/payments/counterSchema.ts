/**
 * What the counter's payment and refund forms accept, shared by the forms and the route handlers.
 * Amounts arrive as typed dollars ("1,076.96") and leave as integer cents; messages name the field
 * as the form labels it.
 */
import { z } from "zod";
import { parseMoneyToCents } from "@/lib/shop/quotes/money";
import { COUNTER_METHODS, PAYMENT_FIELD_LABEL } from "./labels";

/** Dollars as typed → whole cents, more than zero; the issue names `label`. */
export const moneyField = (label: string) =>
  z.string({ error: `${label}: enter an amount, e.g. 250.00.` }).transform((text, ctx) => {
    const cents = parseMoneyToCents(text);
    if (cents === null) {
      ctx.addIssue({ code: "custom", message: `${label}: "${text.trim()}" is not an amount in dollars and cents, e.g. 250.00.` });
      return z.NEVER;
    }
    if (cents < 1) {
      ctx.addIssue({ code: "custom", message: `${label}: enter more than $0.00.` });
      return z.NEVER;
    }
    return cents;
  });

/** A payment taken at the counter. */
export const counterPaymentSchema = z.object({
  amount: moneyField(PAYMENT_FIELD_LABEL.amount),
  method: z.enum(COUNTER_METHODS, { error: `${PAYMENT_FIELD_LABEL.method}: pick cash or card.` }),
});

/** A refund of the deposit through the provider (owner only). */
export const refundSchema = z.object({ amount: moneyField(PAYMENT_FIELD_LABEL.refundAmount) });
