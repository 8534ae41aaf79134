import { z } from "zod";
import { InvalidError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { shopQueries } from "@/lib/shop/queries";
import { userQueries } from "@/lib/accounts/queries";
import { userDto } from "@/lib/accounts/api";
import { roleChangeSchema } from "@/lib/accounts/schema";

const params = z.object({ id: z.uuid() });

export const PATCH = route({ access: ["admin"], params, body: roleChangeSchema }, async ({ caller, params, body }) => {
  if (params.id === caller.userId && body.role !== "admin") {
    throw new InvalidError("You cannot remove your own admin role.", { role: ["Ask another admin to change your role."] });
  }
  if (body.shopId) {
    const shop = await shopQueries.findShop(body.shopId);
    if (!shop) throw InvalidError.fields({ shopId: ["That shop does not exist."] });
  }
  return { user: userDto(await userQueries.setUserRole(params.id, body.role, body.shopId ?? null)) };
});
