import "server-only";
import type { Knex } from "knex";
import type { PaymentEvent } from "@/lib/shop/payments/schema";
import type { PaymentRow, QuoteRow } from "@/lib/platform/db/types";
import { InvalidError, UnknownReferenceError } from "@/lib/platform/errors";
import { transition } from "../quotes/queries";
import { bindAppDb } from "@/lib/platform/db/bind";
import { applyRefundUpdate, markSessionPaid } from "./ledgerQueries";

export type WebhookOutcome =
  | "deposit_paid"
  | "balance_paid"
  | "refund_succeeded"
  | "already_refunded"
  | "refund_failed"
  | "already_failed"
  | "duplicate"
  | "already_paid"
  | "paid_but_quote_not_accepted"
  | "ignored";

type CheckoutSession = Extract<PaymentEvent, { type: "checkout.session.completed" }>["data"]["object"];

/**
 * Applies one verified provider event. Idempotent: the event id is stored in the same
 * transaction as its effect, so a replayed or duplicated event changes nothing. A session or
 * refund the app never created is an UnknownReferenceError, an amount, currency or quote that
 * does not match an InvalidError; nothing is written then.
 */
export async function applyPaymentEvent(db: Knex, event: PaymentEvent): Promise<WebhookOutcome> {
  if (event.type !== "checkout.session.completed" && event.type !== "refund.updated" && event.type !== "refund.failed") {
    await db("payment_webhook_events").insert({ event_id: event.id, type: event.type, outcome: "ignored" }).onConflict("event_id").ignore();
    return "ignored";
  }
  return db.transaction(async (trx) => {
    const first = await trx("payment_webhook_events")
      .insert({ event_id: event.id, type: event.type, outcome: "pending" })
      .onConflict("event_id")
      .ignore()
      .returning("event_id");
    if (first.length === 0) return "duplicate";
    // The schema checked each type's object shape (lib/shop/payments/schema.ts).
    const { outcome, quoteId } =
      event.type === "refund.updated" || event.type === "refund.failed"
        ? await applyRefundUpdate(trx, (event as Extract<PaymentEvent, { type: "refund.updated" | "refund.failed" }>).data.object)
        : await applyCheckout(trx, (event as Extract<PaymentEvent, { type: "checkout.session.completed" }>).data.object);
    await trx("payment_webhook_events").where({ event_id: event.id }).update({ outcome, quote_id: quoteId });
    return outcome;
  });
}

/** A completed checkout session: the deposit (which moves an accepted quote on) or the balance. */
async function applyCheckout(trx: Knex.Transaction, session: CheckoutSession): Promise<{ outcome: WebhookOutcome; quoteId: string }> {
  const payment = await trx<PaymentRow>("payments").where({ provider_session_id: session.id }).forUpdate().first();
  if (!payment) throw new UnknownReferenceError("Unknown checkout session.");
  const quote = await trx<QuoteRow>("quotes").where({ id: payment.quote_id, shop_id: payment.shop_id }).forUpdate().first();
  if (!quote) throw new UnknownReferenceError("Unknown quote.");
  if (session.metadata?.quote_id !== quote.id || session.client_reference_id !== quote.id)
    throw new InvalidError("The event names another quote than its session.");
  if ((session.currency ?? "").toLowerCase() !== "usd") throw new InvalidError("Payments are taken in USD.");
  if (payment.kind === "balance") {
    if (session.amount_total !== payment.amount_cents) {
      throw new InvalidError(`The paid amount ${session.amount_total} does not match the balance asked, ${payment.amount_cents}.`);
    }
  } else if (session.amount_total !== payment.amount_cents || payment.amount_cents !== quote.deposit_cents) {
    throw new InvalidError(`The paid amount ${session.amount_total} does not match the quote's deposit ${quote.deposit_cents}.`);
  }
  if (session.payment_status !== "paid") throw new InvalidError("The session is not paid.");
  if ((await markSessionPaid(trx, payment, quote, session)) === "already_paid") return { outcome: "already_paid", quoteId: quote.id };
  if (payment.kind === "balance") return { outcome: "balance_paid", quoteId: quote.id };
  if (quote.status !== "accepted") return { outcome: "paid_but_quote_not_accepted", quoteId: quote.id };
  await transition(trx, quote, "deposit_paid", { userId: null, label: "payment provider" }, `checkout ${session.id}`);
  return { outcome: "deposit_paid", quoteId: quote.id };
}

/** Who a deposit is between: the shop's current name and the customer's address ("" when none is on file). */
export async function depositParties(
  db: Knex,
  quote: Pick<QuoteRow, "shop_id" | "customer_id">,
): Promise<{ shopName: string; customerEmail: string }> {
  const [shop, customer] = await Promise.all([
    db("shops").where({ id: quote.shop_id }).first("name"),
    db("customers").where({ id: quote.customer_id, shop_id: quote.shop_id }).first("email"),
  ]);
  return { shopName: shop?.name ?? "", customerEmail: customer?.email ?? "" };
}

/** Records the provider's checkout session, so its webhook can be matched to the quote. */
export async function recordDepositSession(
  db: Knex,
  quote: Pick<QuoteRow, "id" | "shop_id" | "deposit_cents">,
  sessionId: string,
): Promise<void> {
  await db("payments").insert({
    shop_id: quote.shop_id,
    quote_id: quote.id,
    provider_session_id: sessionId,
    amount_cents: quote.deposit_cents,
    currency: "usd",
  });
}

/** These queries on the app's database handle, for pages and route handlers. */
export const paymentQueries = bindAppDb({ applyPaymentEvent, depositParties, recordDepositSession });
