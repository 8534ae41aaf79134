import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { counterActor } from "@/lib/shop/counterActor";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { anyBookingRequestSchema } from "@/lib/shop/bookings/schema";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";

const params = z.object({ id: z.uuid() });

/**
 * The calendar moves a booking of either kind (an install or a re-check) to another start (and
 * bay): checked again against the shop's hours and the bay time held now; the customer gets the
 * updated calendar entry. The body is checked against the booking's kind by the query.
 */
export const PUT = route({ access: SHOP_ANY, params, body: anyBookingRequestSchema }, async ({ caller, params, body }) => ({
  booking: await bookingQueries.moveBooking(quoteScopeOf(caller), params.id, body, counterActor(caller)),
}));

/** Cancels a booking of either kind; the customer's calendar entry is withdrawn by e-mail. */
export const DELETE = route({ access: SHOP_ANY, params }, async ({ caller, params }) => ({
  booking: await bookingQueries.cancelBooking(quoteScopeOf(caller), params.id, counterActor(caller)),
}));
