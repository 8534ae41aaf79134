import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";
import { signStepSchema } from "@/lib/shop/workOrders/schema";

const params = z.object({ id: z.uuid() });

/** Signs one step off as the caller (who and when from the session); signing again replaces it. */
export const PUT = route({ access: SHOP_ANY, params, body: signStepSchema }, async ({ caller, params, body }) => ({
  workOrder: await workOrderQueries.signStep(shopIdOf(caller), params.id, body, {
    userId: caller.userId,
    label: caller.name || caller.email,
  }),
}));
