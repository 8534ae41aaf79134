import { z } from "zod";
import { json, route } from "@/lib/platform/http/route";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { counterActor } from "@/lib/shop/counterActor";
import { bookingRequestSchema } from "@/lib/shop/bookings/schema";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";

const params = z.object({ id: z.uuid() });

/** The counter books the install for a quote whose deposit is paid. */
export const POST = route({ access: SHOP_ANY, params, body: bookingRequestSchema, idempotent: true }, async ({ caller, params, body }) =>
  json(
    {
      booking: await bookingQueries.bookInstall(
        { by: "staff", scope: quoteScopeOf(caller), quoteId: params.id },
        body,
        counterActor(caller),
      ),
    },
    201,
  ),
);

/** Moves the live booking to another start (and bay); the customer gets the updated calendar entry. */
export const PUT = route({ access: SHOP_ANY, params, body: bookingRequestSchema }, async ({ caller, params, body }) => ({
  booking: await bookingQueries.moveInstall(quoteScopeOf(caller), params.id, body, counterActor(caller)),
}));

/** Cancels the live booking; the customer's calendar entry is withdrawn. */
export const DELETE = route({ access: SHOP_ANY, params }, async ({ caller, params }) => ({
  booking: await bookingQueries.cancelInstall(quoteScopeOf(caller), params.id, counterActor(caller)),
}));
