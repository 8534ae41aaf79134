import { db } from "@/lib/db";
import { parseLabelledQuery } from "@/lib/http/labelledQuery";
import { route } from "@/lib/http/route";
import { listCatalog } from "@/lib/server/catalog";
import { SHOP_ANY, shopIdOf } from "@/lib/server/shops";
import { CATALOG_QUERY_LABELS, catalogQuerySchema } from "@/lib/validation/catalog";

/** One page of the caller's shop catalog: filtered, sorted and paged in the database. */
export const GET = route({ access: SHOP_ANY }, async ({ caller, req }) => {
  return listCatalog(db, shopIdOf(caller), parseLabelledQuery(catalogQuerySchema, req, CATALOG_QUERY_LABELS));
});
