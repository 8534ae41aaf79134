import { route } from "@/lib/platform/http/route";
import { overviewQueries } from "@/lib/shop/overviewQueries";
import { SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

/** The owner's overview: this week's bookings per bay, deposits held, takings by day (the shop's clock). Staff: 403. */
export const GET = route({ access: SHOP_OWNER }, async ({ caller }) => overviewQueries.shopOverview(shopIdOf(caller)));
