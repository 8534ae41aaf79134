import { guardLayout } from "@/lib/platform/http/guardLayout";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";

/** A quote that is missing or another shop's (or, for staff, another's) answers HTTP 404 before anything streams. */
export default guardLayout(SHOP_ANY, (caller, id) => quoteQueries.getQuoteDetail(quoteScopeOf(caller), id));
