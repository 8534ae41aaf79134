import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { catalogItemDto } from "@/lib/shop/catalog/api";
import { catalogItemQueries } from "@/lib/shop/catalog/itemQueries";
import { archiveSchema } from "@/lib/shop/catalog/itemSchema";
import { SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

/** Owners archive an item (it leaves lists and pickers, old quotes keep it) or bring it back. */
export const PUT = route(
  { access: SHOP_OWNER, params: z.object({ id: z.uuid() }), body: archiveSchema },
  async ({ caller, params, body }) => {
    return { item: catalogItemDto(await catalogItemQueries.setCatalogItemArchived(shopIdOf(caller), params.id, body.archived)) };
  },
);
