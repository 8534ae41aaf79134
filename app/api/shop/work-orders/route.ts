import { json, route } from "@/lib/platform/http/route";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";
import { createWorkOrderSchema } from "@/lib/shop/workOrders/schema";

/** Opens the work order of a booked quote (the same one when it exists); any of the shop's staff work in the bay. */
export const POST = route({ access: SHOP_ANY, body: createWorkOrderSchema, idempotent: true }, async ({ caller, body }) =>
  json({ id: await workOrderQueries.openWorkOrder(shopIdOf(caller), body.quoteId) }, 201),
);
