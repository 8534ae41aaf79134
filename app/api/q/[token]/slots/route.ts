import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { slotsQuerySchema } from "@/lib/shop/bookings/schema";

const params = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/) });

/** The free install starts the customer may pick on their link, once the deposit is paid. */
export const GET = route({ access: "public", params, query: slotsQuerySchema }, async ({ params, query }) =>
  bookingQueries.slotsByToken(params.token, query),
);
