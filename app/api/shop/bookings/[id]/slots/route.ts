import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { slotsQuerySchema } from "@/lib/shop/bookings/schema";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";

/** The free starts a booking of either kind may move to (its own bay time counts as free), for the calendar's Move…. */
export const GET = route(
  { access: SHOP_ANY, params: z.object({ id: z.uuid() }), query: slotsQuerySchema },
  async ({ caller, params, query }) => bookingQueries.slotsForBooking(quoteScopeOf(caller), params.id, query),
);
