import { z } from "zod";
import { json, route } from "@/lib/platform/http/route";
import { recheckBookingSchema } from "@/lib/shop/bookings/schema";
import { refuseTooManyLinkActions } from "@/lib/shop/quotes/linkLimits";
import { recheckBookingQueries } from "@/lib/shop/workOrders/recheckBookingQueries";

const params = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/) });

/** The customer books the short re-check on the re-check e-mail's link; the confirmation mail carries the calendar file. */
export const POST = route({ access: "public", params, body: recheckBookingSchema }, async ({ req, params, body }) => {
  // Each booking mails the customer: the quote link's caps per link and per address apply.
  await refuseTooManyLinkActions(req, params.token);
  return json({ booking: await recheckBookingQueries.bookRecheck(params.token, body) }, 201);
});
