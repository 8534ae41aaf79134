import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { calendarQuerySchema } from "@/lib/shop/bookings/schema";
import { wallTime } from "@/lib/shop/bookings/zoned";
import { shopIdOf, SHOP_ANY } from "@/lib/shop/queries";
import { quoteScopeOf } from "@/lib/shop/quotes/queries";
import { BayCalendar } from "./BayCalendar";
import { weekStart } from "./bayEvents";

export const metadata: Metadata = { title: "Calendar" };

/** The shop's bookings per bay, a day or a week at a time; staff drag a booking or pick it to move it, or open its quote. */
export default async function CalendarPage({ searchParams }: { searchParams: Promise<{ from?: string; days?: string }> }) {
  const caller = await requirePageCaller("/shop/calendar", SHOP_ANY);
  const parsed = calendarQuerySchema.safeParse(await searchParams);
  const query = parsed.success ? parsed.data : {};
  const days = query.days ?? 7;
  const shopId = shopIdOf(caller);
  const quotesOf = quoteScopeOf(caller).createdBy;
  let data = await bookingQueries.calendar(shopId, { from: query.from, days, quotesOf });
  // The week view runs Sunday to Saturday: ask again from that Sunday when the range starts elsewhere.
  if (days === 7 && weekStart(data.from) !== data.from)
    data = await bookingQueries.calendar(shopId, { from: weekStart(data.from), days, quotesOf });
  return (
    <>
      <PageHeader
        title="Calendar"
        lead={`Install bookings per bay on the shop's clock (${data.timeZone}). Drag a booking to move it, or pick it to open its quote or move it from the keyboard.`}
      />
      <BayCalendar initial={data} today={wallTime(new Date(), data.timeZone).date} askedDays={query.days !== undefined} />
    </>
  );
}
