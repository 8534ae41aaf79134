import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { slotsQuerySchema } from "@/lib/shop/bookings/schema";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";

/** The free starts for the quote's work, with its live booking (whose own time counts as free for a move). */
export const GET = route(
  { access: SHOP_ANY, params: z.object({ id: z.uuid() }), query: slotsQuerySchema },
  async ({ caller, params, query }) => bookingQueries.slotsForStaff(quoteScopeOf(caller), params.id, query),
);
