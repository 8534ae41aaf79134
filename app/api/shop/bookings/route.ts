import { route } from "@/lib/platform/http/route";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { calendarQuerySchema } from "@/lib/shop/bookings/schema";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";

/** The staff calendar: a day or a week of the shop's bookings per bay. */
export const GET = route({ access: SHOP_ANY, query: calendarQuerySchema }, async ({ caller, query }) =>
  bookingQueries.calendar(shopIdOf(caller), { from: query.from, days: query.days ?? 7, quotesOf: quoteScopeOf(caller).createdBy }),
);
