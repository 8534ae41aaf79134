import { z } from "zod";
import { route } from "@/lib/http/route";
import { quoteDetailDto } from "@/lib/quotes/api";
import { quoteQueries, quoteScopeOf } from "@/lib/server/quotes";
import { SHOP_ANY } from "@/lib/server/shops";
import { quoteStatusSchema } from "@/lib/validation/quotes";

/** Staff moves: back to draft, declined (the customer said no), installed (after the deposit). */
export const POST = route({ access: SHOP_ANY, params: z.object({ id: z.uuid() }), body: quoteStatusSchema }, async ({ caller, params, body }) => {
  const scope = quoteScopeOf(caller);
  await quoteQueries.staffTransition(scope, params.id, body.to, { userId: caller.userId, label: caller.name || caller.email }, body.note);
  return quoteDetailDto(await quoteQueries.getQuoteDetail(scope, params.id));
});
