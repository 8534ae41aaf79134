import { route } from "@/lib/platform/http/route";
import { SHOP_ANY, SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";
import { recheckSlotQueries } from "@/lib/shop/workOrders/recheckSlotQueries";
import { recheckSlotSchema } from "@/lib/shop/workOrders/recheckSlotSchema";

/** The shop's re-check length in minutes. */
export const GET = route({ access: SHOP_ANY }, async ({ caller }) => ({
  minutes: await recheckSlotQueries.recheckSlotMinutes(shopIdOf(caller)),
}));

/** The owner sets how long a re-check slot is; the re-check page offers starts of that length from then on. */
export const PUT = route({ access: SHOP_OWNER, body: recheckSlotSchema }, async ({ caller, body }) => ({
  minutes: await recheckSlotQueries.setRecheckSlotMinutes(shopIdOf(caller), body.minutes),
}));
