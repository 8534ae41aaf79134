import { guardLayout } from "@/lib/platform/http/guardLayout";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";
import { workOrderQueries } from "@/lib/shop/workOrders/queries";

/** A work order that is missing or another shop's answers HTTP 404 before anything streams. */
export default guardLayout(SHOP_ANY, (caller, id) => workOrderQueries.getWorkOrder(shopIdOf(caller), id));
