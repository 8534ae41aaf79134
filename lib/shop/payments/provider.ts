import "server-only";
import Stripe from "stripe";
import { ConflictError } from "@/lib/platform/errors";

/**
 * The payment provider through its official Node SDK. In development and tests the SDK talks to
 * the local fake (scripts/services/fake-pay.ts) over plain HTTP on loopback:
 *   STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET, STRIPE_API_HOST, STRIPE_API_PORT, STRIPE_API_PROTOCOL
 */
const globalForPay = globalThis as unknown as { hubfacePay?: Stripe; hubfacePayKey?: string };

export function payments(): Stripe {
  const key = process.env.STRIPE_SECRET_KEY;
  if (!key) throw new Error("STRIPE_SECRET_KEY is not set.");
  const host = process.env.STRIPE_API_HOST;
  const signature = `${key}|${host}|${process.env.STRIPE_API_PORT}`;
  if (!globalForPay.hubfacePay || globalForPay.hubfacePayKey !== signature) {
    globalForPay.hubfacePay = new Stripe(key, {
      ...(host
        ? {
            host,
            port: Number(process.env.STRIPE_API_PORT ?? 443),
            protocol: (process.env.STRIPE_API_PROTOCOL ?? (host === "127.0.0.1" || host === "localhost" ? "http" : "https")) as
              "http" | "https",
          }
        : {}),
      maxNetworkRetries: 1,
      telemetry: false,
    });
    globalForPay.hubfacePayKey = signature;
  }
  return globalForPay.hubfacePay;
}

export function webhookSecret(): string {
  const s = process.env.STRIPE_WEBHOOK_SECRET;
  if (!s) throw new Error("STRIPE_WEBHOOK_SECRET is not set.");
  return s;
}

export interface DepositSessionInput {
  quoteId: string;
  shopId: string;
  quoteNumber: number;
  shopName: string;
  amountCents: number;
  customerEmail: string;
  successUrl: string;
  cancelUrl: string;
}

/** A hosted checkout session for the deposit; the customer is sent to its `url`. */
export function createDepositSession(i: DepositSessionInput): Promise<{ id: string; url: string; amountTotal: number }> {
  return createCheckoutSession(i, "deposit", `Deposit for quote Q-${i.quoteNumber} at ${i.shopName}`);
}

/** A hosted checkout session for the balance on the invoice once the work is done. */
export function createBalanceSession(i: DepositSessionInput): Promise<{ id: string; url: string; amountTotal: number }> {
  return createCheckoutSession(i, "balance", `Balance for quote Q-${i.quoteNumber} at ${i.shopName}`);
}

async function createCheckoutSession(
  i: DepositSessionInput,
  kind: "deposit" | "balance",
  name: string,
): Promise<{ id: string; url: string; amountTotal: number }> {
  const session = await payments().checkout.sessions.create({
    mode: "payment",
    client_reference_id: i.quoteId,
    metadata: { quote_id: i.quoteId, shop_id: i.shopId, kind },
    customer_email: i.customerEmail || undefined,
    line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: i.amountCents, product_data: { name } } }],
    success_url: i.successUrl,
    cancel_url: i.cancelUrl,
  });
  if (!session.url) throw new Error("the payment provider returned a session without a URL");
  return { id: session.id, url: session.url, amountTotal: session.amount_total ?? 0 };
}

/**
 * Expires an unpaid session so its page takes no payment. False when the provider says it can no
 * longer be expired (it was paid meanwhile: its webhook is on the way).
 */
export async function expireSession(id: string): Promise<boolean> {
  try {
    await payments().checkout.sessions.expire(id);
    return true;
  } catch (e) {
    if (e instanceof Stripe.errors.StripeInvalidRequestError) return false;
    throw e;
  }
}

/**
 * Asks the provider to refund part or all of a payment. `refundId` (the app's own row) travels in
 * the metadata, so the "refund succeeded" webhook names its row, and doubles as the idempotency key:
 * a retried call never refunds twice.
 */
export async function createRefund(i: { refundId: string; paymentIntent: string; amountCents: number; quoteId: string; shopId: string }) {
  try {
    const refund = await payments().refunds.create(
      {
        payment_intent: i.paymentIntent,
        amount: i.amountCents,
        metadata: { refund_id: i.refundId, quote_id: i.quoteId, shop_id: i.shopId },
      },
      { idempotencyKey: `refund-${i.refundId}` },
    );
    return { id: refund.id, status: refund.status };
  } catch (e) {
    if (e instanceof Stripe.errors.StripeInvalidRequestError)
      throw new ConflictError(`The payment provider refused the refund: ${e.message}`);
    throw e;
  }
}
