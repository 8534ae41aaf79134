import { z } from "zod";
import { db } from "@/lib/db";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { SHOP_OWNER, revokeInvite, shopIdOf } from "@/lib/server/shops";

export const DELETE = route({ access: SHOP_OWNER, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  if (!(await revokeInvite(db, shopIdOf(caller), params.id))) throw notFound("That invitation");
  return { ok: true };
});
