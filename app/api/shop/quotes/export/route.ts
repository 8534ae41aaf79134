import { parseLabelledQuery } from "@/lib/platform/http/labelledQuery";
import { route } from "@/lib/platform/http/route";
import { SHOP_ANY } from "@/lib/shop/queries";
import { quotesToCsv } from "@/lib/shop/quotes/csv";
import { QUOTE_LIST_LABELS, quoteListQuerySchema } from "@/lib/shop/quotes/listQuery";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";

/** The quotes the list shows for the same search, status and order, every page, as CSV for a spreadsheet. */
export const GET = route({ access: SHOP_ANY }, async ({ caller, req }) => {
  const query = parseLabelledQuery(quoteListQuerySchema, req, QUOTE_LIST_LABELS);
  const csv = quotesToCsv(await quoteQueries.exportQuotes(quoteScopeOf(caller), query));
  return new Response("\uFEFF" + csv, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": 'attachment; filename="quotes.csv"',
      "Cache-Control": "no-store",
    },
  });
});
