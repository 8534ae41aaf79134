import { route } from "@/lib/platform/http/route";
import { shopQueries } from "@/lib/shop/queries";
import { joinShopSchema } from "@/lib/shop/schema";

/**
 * Accepts a staff invitation: the token is consumed in the same transaction that creates the
 * account (or attaches the existing member account after its password is checked).
 */
export const POST = route({ access: "public", body: joinShopSchema }, async ({ body }) => {
  return Response.json(await shopQueries.acceptInvite(body), { status: 200 });
});
