import { parseLabelledQuery } from "@/lib/platform/http/labelledQuery";
import { route } from "@/lib/platform/http/route";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { createQuoteSchema } from "@/lib/shop/quotes/schema";
import { QUOTE_LIST_LABELS, quoteListQuerySchema } from "@/lib/shop/quotes/listQuery";

/** One page of the list, searched and filtered in the database. Owners see the whole shop's quotes; staff the ones they wrote. */
export const GET = route({ access: SHOP_ANY }, async ({ caller, req }) => {
  return quoteQueries.pageQuotes(quoteScopeOf(caller), parseLabelledQuery(quoteListQuerySchema, req, QUOTE_LIST_LABELS));
});

export const POST = route({ access: SHOP_ANY, body: createQuoteSchema, idempotent: true }, async ({ caller, body }) => {
  const id = await quoteQueries.createQuote(shopIdOf(caller), { userId: caller.userId, label: caller.name || caller.email }, body);
  return Response.json({ id }, { status: 201 });
});
