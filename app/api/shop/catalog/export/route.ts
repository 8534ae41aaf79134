import { catalogToCsv } from "@/lib/catalog/csv";
import { db } from "@/lib/db";
import { route } from "@/lib/http/route";
import { allCatalogItems } from "@/lib/server/catalog";
import { SHOP_ANY, shopIdOf } from "@/lib/server/shops";

export const GET = route({ access: SHOP_ANY }, async ({ caller }) => {
  const csv = catalogToCsv(await allCatalogItems(db, shopIdOf(caller)));
  return new Response("\uFEFF" + csv, {
    headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": 'attachment; filename="catalog.csv"', "Cache-Control": "no-store" },
  });
});
