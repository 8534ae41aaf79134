import { z } from "zod";
import { route } from "@/lib/http/route";
import { quoteDetailDto } from "@/lib/quotes/api";
import { quoteQueries, quoteScopeOf } from "@/lib/server/quotes";
import { SHOP_ANY } from "@/lib/server/shops";
import { updateQuoteSchema } from "@/lib/validation/quotes";

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
