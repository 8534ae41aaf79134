import { route } from "@/lib/platform/http/route";
import { SHOP_ANY, SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";
import { recheckSettingSchema } from "@/lib/shop/workOrders/schema";

/** The counter's "due for re-check" list, with the shop's number of days. */
export const GET = route({ access: SHOP_ANY }, async ({ caller }) => {
  const shopId = shopIdOf(caller);
  const [days, due] = await Promise.all([workOrderQueries.recheckDays(shopId), workOrderQueries.dueForRecheck(shopId)]);
  return { days, due };
});

/** The owner sets how many days after the work the customer is asked back. */
export const PUT = route({ access: SHOP_OWNER, body: recheckSettingSchema }, async ({ caller, body }) => ({
  days: await workOrderQueries.setRecheckDays(shopIdOf(caller), body.days),
}));
