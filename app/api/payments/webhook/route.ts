import type Stripe from "stripe";
import { readCappedBytes } from "@/lib/platform/http/body";
import { HttpError } from "@/lib/platform/http/errors";
import { fieldErrorsOf, humanIssue, route } from "@/lib/platform/http/route";
import { payments, webhookSecret } from "@/lib/shop/payments/provider";
import { paymentQueries } from "@/lib/shop/payments/queries";
import { paymentEventSchema } from "@/lib/shop/payments/schema";

/**
 * The payment provider's webhook. Nothing is trusted before the signature over the raw body
 * verifies (the provider's HMAC-SHA256 scheme, checked by the official SDK, 5-minute tolerance).
 * A verified event that is not in the shape Hubface reads is refused with 400, nothing written.
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
  const shape = paymentEventSchema.safeParse(event, { error: humanIssue });
  if (!shape.success) throw new HttpError(400, "The event is not in the form Hubface reads.", fieldErrorsOf(shape.error));
  const outcome = await paymentQueries.applyPaymentEvent(shape.data);
  return { received: true, outcome };
});
