import "server-only";
import type { Knex } from "knex";
import type { PaymentRefundRow, PaymentRow, QuoteRow } from "@/lib/platform/db/types";
import { bindAppDb } from "@/lib/platform/db/bind";
import { ConflictError, InvalidError, NotFoundError, UnknownReferenceError } from "@/lib/platform/errors";
import { log } from "@/lib/platform/log";
import { appOrigin } from "@/lib/platform/mail";
import { shopTimeZone } from "@/lib/shop/bookings/timeZoneQueries";
import { queueShopNotice } from "@/lib/shop/notices/noticeQueries";
import { queueQuoteMail } from "@/lib/shop/quoteMailQueries";
import { type Actor, type QuoteScope, declineOnDepositRefunded, findByToken, getQuote } from "@/lib/shop/quotes/queries";
import { type QuotePayments, paymentEntryDto, refundEntryDto } from "./api";
import type { CounterMethod } from "./labels";
import { PAYMENT_FIELD_LABEL } from "./labels";
import { type InvoiceFigures, invoiceFigures, overLimit } from "./invoice";
import { createBalanceSession, createRefund, expireSession } from "./provider";
import { receiptMail, type ReceiptFacts } from "./receiptMail";
import { closedOnRefundMail } from "./closedMail";
import type { PaymentEvent } from "./schema";
import { readTogether } from "@/lib/platform/db/readTogether";

type Db = Knex | Knex.Transaction;
type CheckoutSession = Extract<PaymentEvent, { type: "checkout.session.completed" }>["data"]["object"];
type ProviderRefund = Extract<PaymentEvent, { type: "refund.updated" | "refund.failed" }>["data"]["object"];

/** The provider's refund statuses that mean nothing was given back (and never will be, for this refund). */
const REFUND_GAVE_NOTHING = ["failed", "canceled"];

async function ledger(db: Db, quote: Pick<QuoteRow, "id" | "total_cents">) {
  const [payments, refunds] = (await readTogether(
    db,
    () => db<PaymentRow>("payments").where({ quote_id: quote.id }).orderBy("created_at"),
    () => db<PaymentRefundRow>("payment_refunds").where({ quote_id: quote.id }).orderBy("created_at"),
  )) as [PaymentRow[], PaymentRefundRow[]];
  const figures = invoiceFigures(
    quote.total_cents,
    payments.map((p) => ({ kind: p.kind, status: p.status, amountCents: p.amount_cents })),
    refunds.map((r) => ({ status: r.status, amountCents: r.amount_cents })),
  );
  return { payments, refunds, figures };
}

/** Why the deposit of `quote` cannot be refunded now, or null. */
async function refundBlocked(db: Db, quote: QuoteRow, figures: InvoiceFigures): Promise<string | null> {
  if (figures.depositPaidCents === 0) return "No deposit was paid on this quote.";
  if (quote.status === "installed") return "The work is done: the deposit is part of the invoice, not refunded.";
  const bookings = (await db("bookings").where({ quote_id: quote.id }).select("status")) as { status: string }[];
  if (bookings.some((b) => b.status === "booked"))
    return "Cancel the install booking first: a deposit is refunded once its booking is cancelled.";
  if (!bookings.some((b) => b.status === "cancelled"))
    return "A deposit is refunded once its install booking is cancelled; this quote has none cancelled.";
  if (figures.refundableCents <= 0) return "The deposit has been refunded in full.";
  return null;
}

/** A quote's invoice, payment history and refunds. */
export async function paymentsOf(db: Db, quote: QuoteRow): Promise<QuotePayments> {
  const { payments, refunds, figures } = await ledger(db, quote);
  return {
    invoice: figures,
    invoiceOpen: quote.status === "installed",
    refundBlocked: await refundBlocked(db, quote, figures),
    payments: payments.filter((p) => p.status === "paid").map(paymentEntryDto),
    refunds: refunds.map(refundEntryDto),
    timeZone: await shopTimeZone(db, quote.shop_id),
  };
}

/** The counter's view; NotFoundError outside the caller's quote scope. */
export async function quotePayments(db: Knex, scope: QuoteScope, quoteId: string): Promise<QuotePayments> {
  return paymentsOf(db, await getQuote(db, scope, quoteId));
}

/** The customer's view on their link; NotFoundError for a link that names no quote. */
export async function publicPayments(db: Knex, token: string): Promise<QuotePayments> {
  const quote = await findByToken(db, token);
  if (!quote) throw new NotFoundError("That quote");
  return paymentsOf(db, quote);
}

/** Queues a receipt (or a refund note) to the quote's customer in `trx`; nothing when no address is on file. */
async function queueReceipt(
  trx: Knex.Transaction,
  quote: QuoteRow,
  what: ReceiptFacts["what"],
  amountCents: number,
  outstandingCents: number | null,
): Promise<void> {
  await queueQuoteMail(trx, quote, (head) => receiptMail({ ...head, what, amountCents, at: new Date(), outstandingCents }));
}

/**
 * Expires the quote's open balance sessions at the provider, so no page for an older amount can
 * still take money. ConflictError when one was paid meanwhile (its webhook is on its way).
 */
async function expireOpenBalanceSessions(trx: Knex.Transaction, quoteId: string): Promise<void> {
  const open = (await trx<PaymentRow>("payments")
    .where({ quote_id: quoteId, kind: "balance", method: "provider", status: "open" })
    .forUpdate()) as PaymentRow[];
  for (const p of open) {
    if (!(await expireSession(p.provider_session_id!))) {
      throw new ConflictError("The customer has just paid the balance online. Reload the page to see the payment.");
    }
    await trx("payments").where({ id: p.id }).update({ status: "expired" });
  }
}

/** The quote locked, installed, with something still owed; the figures as they stand. */
async function owing(trx: Knex.Transaction, quote: QuoteRow) {
  if (quote.status !== "installed") throw new ConflictError("The balance is due once the work order is done.");
  const { figures } = await ledger(trx, quote);
  if (figures.paid) throw new ConflictError("This invoice is already paid.");
  return figures;
}

/**
 * The customer pays the balance on the provider's page: a checkout session for what is still
 * owed, opened with the quote locked; earlier balance sessions are expired first. Returns its URL.
 */
export async function openBalanceCheckout(db: Knex, token: string): Promise<{ url: string }> {
  return db.transaction(async (trx) => {
    const quote = await findByToken(trx, token, true);
    if (!quote) throw new NotFoundError("That quote");
    const figures = await owing(trx, quote);
    await expireOpenBalanceSessions(trx, quote.id);
    // One after another: the transaction is one connection.
    const customer = await trx("customers").where({ id: quote.customer_id, shop_id: quote.shop_id }).first("email");
    const shop = await trx("shops").where({ id: quote.shop_id }).first("name");
    const link = `${appOrigin()}/q/${token}`;
    const session = await createBalanceSession({
      quoteId: quote.id,
      shopId: quote.shop_id,
      quoteNumber: quote.number,
      shopName: shop?.name ?? "",
      amountCents: figures.outstandingCents,
      customerEmail: customer?.email ?? "",
      successUrl: `${link}?paid=balance`,
      // Marked, so a customer who comes back from this page (left, or closed because the balance was taken at the counter) is told where the invoice stands.
      cancelUrl: `${link}?checkout=balance`,
    });
    await trx("payments").insert({
      shop_id: quote.shop_id,
      quote_id: quote.id,
      provider_session_id: session.id,
      kind: "balance",
      method: "provider",
      amount_cents: figures.outstandingCents,
      currency: "usd",
    });
    return { url: session.url };
  });
}

/**
 * Staff record a payment of the balance taken at the counter (cash or card): who and when are
 * kept, a receipt is queued. Refused with nothing written when the work is not done, the invoice
 * is paid, or the amount is more than is owed.
 */
export async function recordCounterPayment(
  db: Knex,
  scope: QuoteScope,
  quoteId: string,
  input: { amount: number; method: CounterMethod },
  actor: Actor,
): Promise<QuotePayments> {
  return db.transaction(async (trx) => {
    const quote = await getQuote(trx, scope, quoteId, true);
    const figures = await owing(trx, quote);
    const over = overLimit(input.amount, figures.outstandingCents, PAYMENT_FIELD_LABEL.amount, "the balance outstanding");
    if (over) throw InvalidError.fields({ amount: [over] });
    await expireOpenBalanceSessions(trx, quote.id);
    await trx("payments").insert({
      shop_id: quote.shop_id,
      quote_id: quote.id,
      provider_session_id: null,
      kind: "balance",
      method: input.method,
      amount_cents: input.amount,
      currency: "usd",
      status: "paid",
      paid_at: trx.fn.now(),
      recorded_by_user_id: actor.userId,
      recorded_by: actor.label,
    });
    await queueReceipt(trx, quote, { kind: "balance", method: input.method }, input.amount, figures.outstandingCents - input.amount);
    return paymentsOf(trx, quote);
  });
}

/**
 * A paid checkout session of the provider, on the locked payment and quote (called by
 * applyPaymentEvent inside its transaction): marks it paid, keeps the provider's payment id for
 * refunds and queues the receipt. Returns whether it was new.
 */
export async function markSessionPaid(
  trx: Knex.Transaction,
  payment: PaymentRow,
  quote: QuoteRow,
  session: CheckoutSession,
): Promise<"paid" | "already_paid"> {
  if (payment.status === "paid") return "already_paid";
  await trx("payments")
    .where({ id: payment.id })
    .update({ status: "paid", paid_at: trx.fn.now(), provider_payment_intent: session.payment_intent ?? null });
  const { figures } = await ledger(trx, quote);
  if (payment.kind === "balance" && figures.outstandingCents < 0) {
    // Expiring older sessions before opening a new one (and before a counter payment) prevents this; say so loudly if it happens.
    log().error({ quoteId: quote.id, paymentId: payment.id, overCents: -figures.outstandingCents }, "balance paid over the invoice");
  }
  await queueReceipt(
    trx,
    quote,
    { kind: payment.kind, method: "provider" },
    payment.amount_cents,
    payment.kind === "balance" ? figures.outstandingCents : null,
  );
  await queueShopNotice(trx, quote, { kind: "paid", payment: payment.kind, amountCents: payment.amount_cents });
  return "paid";
}

/**
 * The owner refunds (part of) a paid deposit on a quote whose booking was cancelled. The refund
 * row is written and committed first (its id rides in the provider's metadata), then the provider
 * is asked; if the provider refuses, the row is removed again. Refusals: nothing written.
 */
export async function requestRefund(db: Knex, shopId: string, quoteId: string, amountCents: number, actor: Actor) {
  const { refund, paymentIntent, quote } = await db.transaction(async (trx) => {
    const quote = await getQuote(trx, { shopId }, quoteId, true);
    const { payments, figures } = await ledger(trx, quote);
    const blocked = await refundBlocked(trx, quote, figures);
    if (blocked) throw new ConflictError(blocked);
    const over = overLimit(amountCents, figures.refundableCents, PAYMENT_FIELD_LABEL.refundAmount, "the deposit paid and not yet refunded");
    if (over) throw InvalidError.fields({ amount: [over] });
    const deposit = payments.find((p) => p.kind === "deposit" && p.status === "paid" && p.provider_payment_intent);
    if (!deposit) throw new ConflictError("The deposit was not paid through the payment provider, so it cannot be refunded there.");
    const [refund] = (await trx("payment_refunds")
      .insert({
        shop_id: shopId,
        quote_id: quote.id,
        payment_id: deposit.id,
        amount_cents: amountCents,
        requested_by_user_id: actor.userId,
        requested_by: actor.label,
      })
      .returning("*")) as PaymentRefundRow[];
    return { refund: refund!, paymentIntent: deposit.provider_payment_intent!, quote };
  });
  try {
    const r = await createRefund({ refundId: refund.id, paymentIntent, amountCents, quoteId: quote.id, shopId });
    // The webhook may have set it already; either way it is the same id.
    await db("payment_refunds").where({ id: refund.id }).whereNull("provider_refund_id").update({ provider_refund_id: r.id });
    if (r.status && REFUND_GAVE_NOTHING.includes(r.status)) {
      // Failed at once: nothing was given back, so the row must not wait as pending for an event that may not come.
      await db("payment_refunds").where({ id: refund.id, status: "pending" }).update({ status: "failed", failed_at: db.fn.now() });
    }
  } catch (e) {
    await db("payment_refunds").where({ id: refund.id, status: "pending" }).delete();
    throw e;
  }
  return paymentsOf(db, (await db<QuoteRow>("quotes").where({ id: quote.id }).first()) as QuoteRow);
}

/**
 * The provider's signed word on a refund (a `refund.updated` or `refund.failed` event), in
 * applyPaymentEvent's transaction: "succeeded" confirms it; "failed" or "canceled" marks a pending
 * row failed, so it no longer counts as asked back and the deposit can be refunded again. A refund
 * the app never asked for is an UnknownReferenceError, one that does not match its row an
 * InvalidError; nothing is written then.
 */
export async function applyRefundUpdate(
  trx: Knex.Transaction,
  r: ProviderRefund,
): Promise<{ outcome: "refund_succeeded" | "already_refunded" | "refund_failed" | "already_failed" | "ignored"; quoteId: string | null }> {
  const rowId = r.metadata?.refund_id ?? "";
  const row = (await trx<PaymentRefundRow>("payment_refunds")
    .where((q) => {
      if (/^[0-9a-f-]{36}$/i.test(rowId)) q.where({ id: rowId });
      else q.where({ provider_refund_id: r.id });
    })
    .forUpdate()
    .first()) as PaymentRefundRow | undefined;
  if (!row) throw new UnknownReferenceError("Unknown refund.");
  if (row.provider_refund_id && row.provider_refund_id !== r.id) throw new InvalidError("The event names another refund than its record.");
  const payment = (await trx<PaymentRow>("payments").where({ id: row.payment_id }).first()) as PaymentRow;
  if (payment.provider_payment_intent !== r.payment_intent) throw new InvalidError("The refund names another payment than its record.");
  if (r.amount !== row.amount_cents || r.currency.toLowerCase() !== "usd") {
    throw new InvalidError(`The refunded amount ${r.amount} does not match the refund asked, ${row.amount_cents}.`);
  }
  if (REFUND_GAVE_NOTHING.includes(r.status)) return markRefundFailed(trx, row, r);
  if (r.status !== "succeeded") return { outcome: "ignored", quoteId: row.quote_id };
  if (row.status === "succeeded") return { outcome: "already_refunded", quoteId: row.quote_id };
  // A late "succeeded" after the provider said it failed is out of order: the failure stands.
  if (row.status === "failed") return { outcome: "ignored", quoteId: row.quote_id };
  await trx("payment_refunds").where({ id: row.id }).update({ status: "succeeded", succeeded_at: trx.fn.now(), provider_refund_id: r.id });
  const quote = (await trx<QuoteRow>("quotes").where({ id: row.quote_id }).forUpdate().first()) as QuoteRow;
  // The refund that closes the quote is receipted by the closing mail; any other gets its own receipt.
  const closed = await endWhenRefundedInFull(trx, quote, row, r.id);
  if (!closed) await queueReceipt(trx, quote, { kind: "refund" }, row.amount_cents, null);
  return { outcome: "refund_succeeded", quoteId: row.quote_id };
}

/** A pending refund the provider could not make: marked failed, nothing else changes (no money moved). */
async function markRefundFailed(trx: Knex.Transaction, row: PaymentRefundRow, r: ProviderRefund) {
  if (row.status === "failed") return { outcome: "already_failed" as const, quoteId: row.quote_id };
  if (row.status === "succeeded") {
    // The provider took back a refund it had confirmed (the bank returned it). The quote may have been declined on it,
    // so this is not undone here: say so loudly for the shop to settle with the customer.
    log().error({ refundId: row.id, providerRefundId: r.id, quoteId: row.quote_id }, "a confirmed refund failed afterwards");
    return { outcome: "ignored" as const, quoteId: row.quote_id };
  }
  await trx("payment_refunds").where({ id: row.id }).update({ status: "failed", failed_at: trx.fn.now(), provider_refund_id: r.id });
  return { outcome: "refund_failed" as const, quoteId: row.quote_id };
}

/**
 * Once the provider has confirmed refunds adding up to the whole deposit, the shop holds none of
 * it: the quote is declined (its held stock released, no longer counted as paid, nothing left to
 * install or book; a new quote is needed). The history names the provider, which confirmed it,
 * and the owner who asked; the customer is mailed once that the quote is closed and the deposit
 * refunded, that mail carrying the last refund's receipt. A part refund leaves the quote as it is:
 * the shop kept the rest. True when the quote was closed here (the caller sends no receipt then).
 */
async function endWhenRefundedInFull(
  trx: Knex.Transaction,
  quote: QuoteRow,
  last: PaymentRefundRow,
  providerRefundId: string,
): Promise<boolean> {
  const { figures } = await ledger(trx, quote);
  if (figures.depositPaidCents === 0 || figures.depositHeldCents > 0) return false;
  const declined = await declineOnDepositRefunded(
    trx,
    quote,
    { userId: null, label: "payment provider" },
    `deposit refunded in full (last refund ${providerRefundId}, asked by ${last.requested_by})`,
  );
  // Only the move itself tells the customer: a replayed or later event finds the quote declined already and sends nothing.
  if (!declined) return false;
  await queueQuoteMail(trx, quote, (head) =>
    closedOnRefundMail({ ...head, at: new Date(), refundedCents: figures.refundedCents, refundedNowCents: last.amount_cents }),
  );
  return true;
}

/** These queries on the app's database handle, for pages and route handlers. */
export const ledgerQueries = bindAppDb({ openBalanceCheckout, publicPayments, quotePayments, recordCounterPayment, requestRefund });
