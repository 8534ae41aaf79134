import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/ui/PageHeader";
import { buttonClass } from "@/components/ui/Button";
import { requirePageCaller } from "@/lib/platform/auth/session";
import { bookingQueries } from "@/lib/shop/bookings/queries";
import { calendarQuerySchema } from "@/lib/shop/bookings/schema";
import { addDays } from "@/lib/shop/bookings/zoned";
import { shopIdOf } from "@/lib/shop/queries";
import { CalendarGrid } from "./CalendarGrid";

export const metadata: Metadata = { title: "Calendar" };

/** The shop's bookings per bay, a day or a week at a time; each booking opens its quote, where staff move or cancel it. */
export default async function CalendarPage({ searchParams }: { searchParams: Promise<{ from?: string; days?: string }> }) {
  const caller = await requirePageCaller("/shop/calendar", ["shop_staff", "shop_owner"]);
  const parsed = calendarQuerySchema.safeParse(await searchParams);
  const query = parsed.success ? parsed.data : {};
  const days = query.days ?? 7;
  const data = await bookingQueries.calendar(shopIdOf(caller), { from: query.from, days });
  const link = (from: string, d = days) => `/shop/calendar?from=${from}&days=${d}`;
  return (
    <>
      <PageHeader
        title="Calendar"
        lead={`Install bookings per bay on the shop's clock (${data.timeZone}). Open a booking to move or cancel it from its quote.`}
        actions={
          <nav aria-label="Calendar range" className="flex flex-wrap gap-2">
            <Link className={buttonClass("secondary")} href={link(addDays(data.from, -days))}>
              {days === 1 ? "Previous day" : "Previous week"}
            </Link>
            <Link className={buttonClass("secondary")} href="/shop/calendar?days=7">
              This week
            </Link>
            <Link className={buttonClass("secondary")} href={link(addDays(data.from, days))}>
              {days === 1 ? "Next day" : "Next week"}
            </Link>
            <Link
              className={buttonClass("ghost")}
              href={link(data.from, days === 1 ? 7 : 1)}
              aria-label={days === 1 ? "Show the week" : "Show one day"}
            >
              {days === 1 ? "Week" : "Day"}
            </Link>
          </nav>
        }
      />
      <CalendarGrid data={data} />
      <p className="mt-3 text-sm text-basalt-600">
        {data.bookings.length === 0 ? "No bookings in these days." : `${data.bookings.length} booking(s) in these days.`}
      </p>
    </>
  );
}
