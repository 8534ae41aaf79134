import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { quoteSendQueries } from "@/lib/shop/quotes/send";
import { SHOP_ANY } from "@/lib/shop/queries";

export const GET = route({ access: SHOP_ANY, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  const detail = await quoteQueries.getQuoteDetail(quoteScopeOf(caller), params.id);
  const pdf = await quoteSendQueries.renderQuotePdf(detail);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `inline; filename="quote-Q-${detail.quote.number}.pdf"`,
      "Cache-Control": "no-store",
    },
  });
});
