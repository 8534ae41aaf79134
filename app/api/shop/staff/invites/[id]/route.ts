import { z } from "zod";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { SHOP_OWNER, shopIdOf, shopQueries } from "@/lib/server/shops";

export const DELETE = route({ access: SHOP_OWNER, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  if (!(await shopQueries.revokeInvite(shopIdOf(caller), params.id))) throw notFound("That invitation");
  return { ok: true };
});
