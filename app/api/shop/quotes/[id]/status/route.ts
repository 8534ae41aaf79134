import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { quoteDetailDto } from "@/lib/shop/quotes/api";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quoteStatusSchema } from "@/lib/shop/quotes/schema";

/** Staff moves: back to draft, declined (the customer said no), installed (after the deposit). */
export const POST = route(
  { access: SHOP_ANY, params: z.object({ id: z.uuid() }), body: quoteStatusSchema },
  async ({ caller, params, body }) => {
    const scope = quoteScopeOf(caller);
    await quoteQueries.staffTransition(scope, params.id, body.to, { userId: caller.userId, label: caller.name || caller.email }, body.note);
    return quoteDetailDto(await quoteQueries.getQuoteDetail(scope, params.id));
  },
);
