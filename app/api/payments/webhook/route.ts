import type Stripe from "stripe";
import { readCappedBytes } from "@/lib/http/body";
import { HttpError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { payments, webhookSecret } from "@/lib/payments/provider";
import { paymentQueries } from "@/lib/server/payments";

/**
 * The payment provider's webhook. Nothing is trusted before the signature over the raw body
 * verifies (the provider's HMAC-SHA256 scheme, checked by the official SDK, 5-minute tolerance).
 */
export const POST = route({ access: "public" }, async ({ req }) => {
  const raw = Buffer.from(await readCappedBytes(req, 256 * 1024)).toString("utf8");
  const signature = req.headers.get("stripe-signature");
  if (!signature) throw new HttpError(400, "Missing signature.");
  let event: Stripe.Event;
  try {
    event = payments().webhooks.constructEvent(raw, signature, webhookSecret());
  } catch {
    throw new HttpError(400, "The signature does not verify.");
  }
  const outcome = await paymentQueries.applyPaymentEvent(event);
  return { received: true, outcome };
});
