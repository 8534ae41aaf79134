import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { quoteDetailDto } from "@/lib/shop/quotes/api";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { SHOP_ANY } from "@/lib/shop/queries";
import { updateQuoteSchema } from "@/lib/shop/quotes/schema";

const params = z.object({ id: z.uuid() });

export const GET = route({ access: SHOP_ANY, params }, async ({ caller, params }) => {
  return quoteDetailDto(await quoteQueries.getQuoteDetail(quoteScopeOf(caller), params.id));
});

/** Edit a draft's lines, discount and notes; the server computes the totals. */
export const PUT = route({ access: SHOP_ANY, params, body: updateQuoteSchema }, async ({ caller, params, body }) => {
  const scope = quoteScopeOf(caller);
  await quoteQueries.updateDraft(scope, params.id, body);
  return quoteDetailDto(await quoteQueries.getQuoteDetail(scope, params.id));
});
