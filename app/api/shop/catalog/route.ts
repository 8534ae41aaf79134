import { parseLabelledQuery } from "@/lib/platform/http/labelledQuery";
import { route } from "@/lib/platform/http/route";
import { catalogQueries } from "@/lib/shop/catalog/queries";
import { SHOP_ANY, SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";
import { catalogItemDto } from "@/lib/shop/catalog/api";
import { catalogItemQueries } from "@/lib/shop/catalog/itemQueries";
import { catalogItemSchema } from "@/lib/shop/catalog/itemSchema";
import { CATALOG_QUERY_LABELS, catalogQuerySchema } from "@/lib/shop/catalog/schema";

/** One page of the caller's shop catalog: filtered, sorted and paged in the database. */
export const GET = route({ access: SHOP_ANY }, async ({ caller, req }) => {
  return catalogQueries.listCatalog(shopIdOf(caller), parseLabelledQuery(catalogQuerySchema, req, CATALOG_QUERY_LABELS));
});

/** Owners add one item without a file; the same checks and messages as a CSV row, on the form's fields. */
export const POST = route({ access: SHOP_OWNER, body: catalogItemSchema }, async ({ caller, body }) => {
  return Response.json({ item: catalogItemDto(await catalogItemQueries.addCatalogItem(shopIdOf(caller), body)) }, { status: 201 });
});
