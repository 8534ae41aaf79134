import { z } from "zod";
import { notFound } from "@/lib/platform/http/errors";
import { route } from "@/lib/platform/http/route";
import { customerQueries } from "@/lib/shop/customers/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";

export const GET = route({ access: SHOP_ANY, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  const shopId = shopIdOf(caller);
  const customer = await customerQueries.getCustomer(shopId, params.id);
  if (!customer) throw notFound("That customer");
  return { customer, vehicles: await customerQueries.listVehicles(shopId, customer.id) };
});
