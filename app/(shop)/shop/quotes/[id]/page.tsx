import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { HttpError } from "@/lib/platform/http/errors";
import { quoteDetailDto } from "@/lib/shop/quotes/api";
import { quoteQueries, quoteScopeOf } from "@/lib/shop/quotes/queries";
import { shopQueries } from "@/lib/shop/queries";
import { canBook } from "@/lib/shop/bookings/bookable";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { CounterBooking } from "./CounterBooking";
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
  const q = detail.quote;
  const [booking, setup] = canBook(q) ? await Promise.all([bookingQueries.liveBooking(q), bookingQueries.getSetup(q.shop_id)]) : [null, null];
  return (
    <>
      <QuoteEditor initial={quoteDetailDto(detail)} labourRateCents={shop?.labour_rate_cents ?? 0} />
      {setup && <CounterBooking quoteId={q.id} initial={booking} bays={setup.bays} />}
    </>
  );
}
