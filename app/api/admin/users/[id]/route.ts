import { z } from "zod";
import { HttpError, notFound } from "@/lib/platform/http/errors";
import { route } from "@/lib/platform/http/route";
import { shopQueries } from "@/lib/shop/queries";
import { userQueries } from "@/lib/accounts/queries";
import { userDto } from "@/lib/accounts/api";
import { roleChangeSchema } from "@/lib/accounts/schema";

const params = z.object({ id: z.uuid() });

export const PATCH = route({ access: ["admin"], params, body: roleChangeSchema }, async ({ caller, params, body }) => {
  if (params.id === caller.userId && body.role !== "admin") {
    throw new HttpError(422, "You cannot remove your own admin role.", { role: ["Ask another admin to change your role."] });
  }
  if (body.shopId) {
    const shop = await shopQueries.getShop(body.shopId);
    if (!shop) throw new HttpError(422, "Some fields need attention.", { shopId: ["That shop does not exist."] });
  }
  if (!(await userQueries.findUserById(params.id))) throw notFound("That user");
  const user = await userQueries.setUserRole(params.id, body.role, body.shopId ?? null);
  if (!user) throw notFound("That user");
  return { user: userDto(user) };
});
