import { z } from "zod";
import { QUOTE_STATUSES } from "@/lib/platform/db/types";
import { route } from "@/lib/platform/http/route";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { createQuoteSchema } from "@/lib/shop/quotes/schema";

/** Owners see the whole shop's quotes; staff the ones they wrote. */
export const GET = route(
  { access: SHOP_ANY, query: z.object({ status: z.enum(QUOTE_STATUSES).optional() }) },
  async ({ caller, query }) => {
    return { quotes: await quoteQueries.listQuotes(quoteScopeOf(caller), { status: query.status }) };
  },
);

export const POST = route({ access: SHOP_ANY, body: createQuoteSchema, idempotent: true }, async ({ caller, body }) => {
  const id = await quoteQueries.createQuote(shopIdOf(caller), { userId: caller.userId, label: caller.name || caller.email }, body);
  return Response.json({ id }, { status: 201 });
});
