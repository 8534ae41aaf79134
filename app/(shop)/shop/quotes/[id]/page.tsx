import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageCaller } from "@/lib/auth/session";
import { db } from "@/lib/db";
import { HttpError } from "@/lib/http/errors";
import { getQuoteDetail, quoteScopeOf } from "@/lib/server/quotes";
import { getShop } from "@/lib/server/shops";
import { QuoteEditor } from "./QuoteEditor";

export const metadata: Metadata = { title: "Quote" };

export default async function QuotePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePageCaller(`/shop/quotes/${id}`, ["shop_staff", "shop_owner"]);
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const detail = await getQuoteDetail(db, quoteScopeOf(caller), id).catch((e) => {
    if (e instanceof HttpError && e.status === 404) return null;
    throw e;
  });
  if (!detail) notFound();
  const shop = await getShop(db, detail.quote.shop_id);
  return <QuoteEditor initial={JSON.parse(JSON.stringify(detail))} labourRateCents={shop?.labour_rate_cents ?? 0} />;
}
