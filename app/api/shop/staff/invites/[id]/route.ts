import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { SHOP_OWNER, shopIdOf, shopQueries } from "@/lib/shop/queries";

export const DELETE = route({ access: SHOP_OWNER, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  await shopQueries.revokeInvite(shopIdOf(caller), params.id);
  return { ok: true };
});
