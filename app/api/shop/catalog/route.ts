import { db } from "@/lib/db";
import { route } from "@/lib/http/route";
import { listCatalog } from "@/lib/server/catalog";
import { SHOP_ANY, shopIdOf } from "@/lib/server/shops";
import { catalogQuerySchema } from "@/lib/validation/catalog";

/** One page of the caller's shop catalog: filtered, sorted and paged in the database. */
export const GET = route({ access: SHOP_ANY, query: catalogQuerySchema }, async ({ caller, query }) => {
  return listCatalog(db, shopIdOf(caller), query);
});
