import { CSV_TEMPLATE } from "@/lib/shop/catalog/csv";
import { route } from "@/lib/platform/http/route";
import { SHOP_ANY } from "@/lib/shop/queries";

export const GET = route({ access: SHOP_ANY }, async () => {
  return new Response("\uFEFF" + CSV_TEMPLATE, {
    headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": 'attachment; filename="catalog-template.csv"' },
  });
});
