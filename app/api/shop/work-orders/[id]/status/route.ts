import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";
import { statusMoveSchema } from "@/lib/shop/workOrders/schema";

const params = z.object({ id: z.uuid() });

/** booked → in the bay → done; done needs every step signed and marks the quote installed. */
export const POST = route({ access: SHOP_ANY, params, body: statusMoveSchema }, async ({ caller, params, body }) => ({
  workOrder: await workOrderQueries.moveWorkOrder(shopIdOf(caller), params.id, body.to, {
    userId: caller.userId,
    label: caller.name || caller.email,
  }),
}));
