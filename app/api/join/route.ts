import { route } from "@/lib/http/route";
import { shopQueries } from "@/lib/server/shops";
import { joinShopSchema } from "@/lib/validation/shop";

/**
 * Accepts a staff invitation: the token is consumed in the same transaction that creates the
 * account (or attaches the existing member account after its password is checked).
 */
export const POST = route({ access: "public", body: joinShopSchema }, async ({ body }) => {
  return Response.json(await shopQueries.acceptInvite(body), { status: 200 });
});
