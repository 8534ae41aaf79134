import { z } from "zod";
import { json, route } from "@/lib/platform/http/route";
import { counterActor } from "@/lib/shop/counterActor";
import { counterPaymentSchema } from "@/lib/shop/payments/counterSchema";
import { ledgerQueries } from "@/lib/shop/payments/ledgerQueries";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";

const params = z.object({ id: z.uuid() });

/** The quote's invoice, payments received and refunds. */
export const GET = route({ access: SHOP_ANY, params }, async ({ caller, params }) => ({
  payments: await ledgerQueries.quotePayments(quoteScopeOf(caller), params.id),
}));

/** A payment of the balance taken at the counter (cash or card); the customer gets a receipt. */
export const POST = route({ access: SHOP_ANY, params, body: counterPaymentSchema, idempotent: true }, async ({ caller, params, body }) =>
  json({ payments: await ledgerQueries.recordCounterPayment(quoteScopeOf(caller), params.id, body, counterActor(caller)) }, 201),
);
