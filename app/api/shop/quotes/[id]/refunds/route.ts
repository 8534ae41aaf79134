import { z } from "zod";
import { json, route } from "@/lib/platform/http/route";
import { counterActor } from "@/lib/shop/counterActor";
import { refundSchema } from "@/lib/shop/payments/counterSchema";
import { ledgerQueries } from "@/lib/shop/payments/ledgerQueries";
import { SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

const params = z.object({ id: z.uuid() });

/**
 * The owner refunds (part of) the deposit of a quote whose booking was cancelled, through the
 * payment provider; the refund is recorded as succeeded when the provider's signed webhook says so.
 */
export const POST = route({ access: SHOP_OWNER, params, body: refundSchema, idempotent: true }, async ({ caller, params, body }) =>
  json({ payments: await ledgerQueries.requestRefund(shopIdOf(caller), params.id, body.amount, counterActor(caller)) }, 202),
);
