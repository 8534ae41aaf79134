import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { HttpError } from "@/lib/platform/http/errors";
import { quoteDetailDto } from "@/lib/shop/quotes/api";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { shopQueries } from "@/lib/shop/queries";
import { QuoteEditor } from "./QuoteEditor";

export const metadata: Metadata = { title: "Quote" };

export default async function QuotePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePageCaller(`/shop/quotes/${id}`, ["shop_staff", "shop_owner"]);
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const detail = await quoteQueries.getQuoteDetail(quoteScopeOf(caller), id).catch((e) => {
    if (e instanceof HttpError && e.status === 404) return null;
    throw e;
  });
  if (!detail) notFound();
  const shop = await shopQueries.getShop(detail.quote.shop_id);
  return <QuoteEditor initial={quoteDetailDto(detail)} labourRateCents={shop?.labour_rate_cents ?? 0} />;
}
