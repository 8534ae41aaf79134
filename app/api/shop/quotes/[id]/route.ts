import { z } from "zod";
import { db } from "@/lib/db";
import { route } from "@/lib/http/route";
import { getQuoteDetail, quoteScopeOf, updateDraft } from "@/lib/server/quotes";
import { SHOP_ANY } from "@/lib/server/shops";
import { updateQuoteSchema } from "@/lib/validation/quotes";

const params = z.object({ id: z.uuid() });

export const GET = route({ access: SHOP_ANY, params }, async ({ caller, params }) => {
  return getQuoteDetail(db, quoteScopeOf(caller), params.id);
});

/** Edit a draft's lines, discount and notes; the server computes the totals. */
export const PUT = route({ access: SHOP_ANY, params, body: updateQuoteSchema }, async ({ caller, params, body }) => {
  const scope = quoteScopeOf(caller);
  await updateDraft(db, scope, params.id, body);
  return getQuoteDetail(db, scope, params.id);
});
