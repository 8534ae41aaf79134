import { z } from "zod";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { customerQueries } from "@/lib/server/customers";
import { SHOP_ANY, shopIdOf } from "@/lib/server/shops";

export const GET = route({ access: SHOP_ANY, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  const shopId = shopIdOf(caller);
  const customer = await customerQueries.getCustomer(shopId, params.id);
  if (!customer) throw notFound("That customer");
  return { customer, vehicles: await customerQueries.listVehicles(shopId, customer.id) };
});
