import { catalogToCsv } from "@/lib/shop/catalog/csv";
import { route } from "@/lib/platform/http/route";
import { catalogQueries } from "@/lib/shop/catalog/queries";
import { SHOP_ANY, shopIdOf } from "@/lib/shop/queries";

export const GET = route({ access: SHOP_ANY }, async ({ caller }) => {
  const csv = catalogToCsv(await catalogQueries.allCatalogItems(shopIdOf(caller)));
  return new Response("\uFEFF" + csv, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": 'attachment; filename="catalog.csv"',
      "Cache-Control": "no-store",
    },
  });
});
