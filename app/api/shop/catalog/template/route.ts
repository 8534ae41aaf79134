import { CSV_TEMPLATE } from "@/lib/catalog/csv";
import { route } from "@/lib/http/route";
import { SHOP_ANY } from "@/lib/server/shops";

export const GET = route({ access: SHOP_ANY }, async () => {
  return new Response("\uFEFF" + CSV_TEMPLATE, {
    headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": 'attachment; filename="catalog-template.csv"' },
  });
});
