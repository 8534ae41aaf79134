import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";

const params = z.object({ id: z.uuid() });

/** The work order as the sheet shows it. */
export const GET = route({ access: SHOP_ANY, params }, async ({ caller, params }) => ({
  workOrder: await workOrderQueries.getWorkOrder(shopIdOf(caller), params.id),
}));
