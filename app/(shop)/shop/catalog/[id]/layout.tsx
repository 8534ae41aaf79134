import { guardLayout } from "@/lib/platform/http/guardLayout";
import { catalogItemQueries } from "@/lib/shop/catalog/itemQueries";
import { SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

/** An item that is missing or another shop's answers HTTP 404 before anything streams. */
export default guardLayout(SHOP_OWNER, (caller, id) => catalogItemQueries.getCatalogItem(shopIdOf(caller), id));
