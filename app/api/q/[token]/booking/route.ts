import { z } from "zod";
import { clientAddress } from "@/lib/platform/auth/clientAddress";
import { json, route } from "@/lib/platform/http/route";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { publicBookingSchema } from "@/lib/shop/bookings/schema";

const params = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/) });

/** The customer books their install on their link (deposit paid); the confirmation mail carries the calendar file. */
export const POST = route({ access: "public", params, body: publicBookingSchema }, async ({ req, params, body }) => {
  // Each booking mails the customer: the quote link's own caps keep a script from looping.
  await rateLimitQueries.consumeOrRefuse(
    [
      { spec: RATE_LIMITS.quoteActionsPerLink, key: params.token },
      { spec: RATE_LIMITS.quoteActionsPerAddress, key: clientAddress(req.headers) },
    ],
    "Too many actions on this quote.",
  );
  const booking = await bookingQueries.bookInstall({ by: "customer", token: params.token }, body, { userId: null, label: "customer" });
  return json({ booking }, 201);
});
