import { z } from "zod";
import { db } from "@/lib/db";
import { route } from "@/lib/http/route";
import { getQuoteDetail, quoteScopeOf } from "@/lib/server/quotes";
import { renderQuotePdf } from "@/lib/server/quoteSend";
import { SHOP_ANY } from "@/lib/server/shops";

export const GET = route({ access: SHOP_ANY, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  const detail = await getQuoteDetail(db, quoteScopeOf(caller), params.id);
  const pdf = await renderQuotePdf(db, detail);
  return new Response(new Uint8Array(pdf), {
    headers: { "Content-Type": "application/pdf", "Content-Disposition": `inline; filename="quote-Q-${detail.quote.number}.pdf"`, "Cache-Control": "no-store" },
  });
});
