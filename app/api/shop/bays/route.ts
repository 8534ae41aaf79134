import { route } from "@/lib/platform/http/route";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { baysSetupSchema } from "@/lib/shop/bookings/schema";
import { SHOP_ANY, SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

/** The shop's bays, week and service times: staff read them (the counter books by them). */
export const GET = route({ access: SHOP_ANY }, async ({ caller }) => ({ setup: await bookingQueries.getSetup(shopIdOf(caller)) }));

/** Owners only: the whole bays-and-hours form in one save. */
export const PUT = route({ access: SHOP_OWNER, body: baysSetupSchema }, async ({ caller, body }) => ({
  setup: await bookingQueries.saveSetup(shopIdOf(caller), body),
}));
