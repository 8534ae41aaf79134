import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { customerQueries } from "@/lib/shop/customers/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";

export const GET = route({ access: SHOP_ANY, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  const shopId = shopIdOf(caller);
  const customer = await customerQueries.getCustomer(shopId, params.id);
  return { customer, vehicles: await customerQueries.listVehicles(shopId, customer.id) };
});
