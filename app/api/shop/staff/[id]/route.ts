import { z } from "zod";
import { InvalidError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { SHOP_OWNER, shopIdOf, shopQueries } from "@/lib/shop/queries";

/** Removes a staff member from the caller's shop; the account stays as a member. */
export const DELETE = route({ access: SHOP_OWNER, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  if (params.id === caller.userId) throw new InvalidError("You cannot remove yourself from your own shop.");
  await shopQueries.removeStaff(shopIdOf(caller), params.id);
  return { ok: true };
});
