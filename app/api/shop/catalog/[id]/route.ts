import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { catalogItemDto } from "@/lib/shop/catalog/api";
import { catalogItemQueries } from "@/lib/shop/catalog/itemQueries";
import { catalogItemSchema } from "@/lib/shop/catalog/itemSchema";
import { SHOP_ANY, SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

const params = z.object({ id: z.uuid() });

/** One item of the caller's shop, archived or not, with what quotes hold of it. */
export const GET = route({ access: SHOP_ANY, params }, async ({ caller, params }) => {
  return { item: catalogItemDto(await catalogItemQueries.getCatalogItem(shopIdOf(caller), params.id)) };
});

/** Owners edit one item; staff read the catalog but never change it (403 before the body is read). */
export const PUT = route({ access: SHOP_OWNER, params, body: catalogItemSchema }, async ({ caller, params, body }) => {
  return { item: catalogItemDto(await catalogItemQueries.updateCatalogItem(shopIdOf(caller), params.id, body)) };
});
