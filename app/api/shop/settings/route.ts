import { route } from "@/lib/platform/http/route";
import { shopDto } from "@/lib/shop/api";
import { SHOP_ANY, SHOP_OWNER, shopIdOf, shopQueries } from "@/lib/shop/queries";
import { shopSettingsSchema } from "@/lib/shop/schema";

export const GET = route({ access: SHOP_ANY }, async ({ caller }) => {
  return { shop: shopDto(await shopQueries.getShop(shopIdOf(caller))) };
});

/** Owners only: staff read the settings but never change them. */
export const PUT = route({ access: SHOP_OWNER, body: shopSettingsSchema }, async ({ caller, body }) => {
  return { shop: shopDto(await shopQueries.updateShopSettings(shopIdOf(caller), body)) };
});
