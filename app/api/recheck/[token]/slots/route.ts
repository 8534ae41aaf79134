import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { slotsQuerySchema } from "@/lib/shop/bookings/schema";
import { recheckBookingQueries } from "@/lib/shop/workOrders/recheckBookingQueries";

const params = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/) });

/** The free re-check starts of the next two weeks on the re-check e-mail's link (404 unknown, 410 expired). */
export const GET = route({ access: "public", params, query: slotsQuerySchema }, async ({ params, query }) =>
  recheckBookingQueries.recheckSlotsByLink(params.token, query),
);
