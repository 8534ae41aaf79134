import { parseLabelledQuery } from "@/lib/platform/http/labelledQuery";
import { route } from "@/lib/platform/http/route";
import { catalogQueries } from "@/lib/shop/catalog/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { CATALOG_QUERY_LABELS, catalogQuerySchema } from "@/lib/shop/catalog/schema";

/** One page of the caller's shop catalog: filtered, sorted and paged in the database. */
export const GET = route({ access: SHOP_ANY }, async ({ caller, req }) => {
  return catalogQueries.listCatalog(shopIdOf(caller), parseLabelledQuery(catalogQuerySchema, req, CATALOG_QUERY_LABELS));
});
