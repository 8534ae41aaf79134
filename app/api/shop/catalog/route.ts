import { parseLabelledQuery } from "@/lib/http/labelledQuery";
import { route } from "@/lib/http/route";
import { catalogQueries } from "@/lib/server/catalog";
import { SHOP_ANY, shopIdOf } from "@/lib/server/shops";
import { CATALOG_QUERY_LABELS, catalogQuerySchema } from "@/lib/validation/catalog";

/** One page of the caller's shop catalog: filtered, sorted and paged in the database. */
export const GET = route({ access: SHOP_ANY }, async ({ caller, req }) => {
  return catalogQueries.listCatalog(shopIdOf(caller), parseLabelledQuery(catalogQuerySchema, req, CATALOG_QUERY_LABELS));
});
