import Link from "next/link";
import type { CalendarAnswer } from "@/lib/shop/bookings/api";
import { ROW_MINUTES, layoutCalendar } from "@/lib/shop/bookings/calendarLayout";
import { formatDay, formatMinute } from "@/lib/shop/bookings/zoned";

/**
 * A day or a week of the shop's bays as a plain CSS grid (no calendar library): a column per
 * day and bay, a row per quarter hour, each booked stretch a link to its quote. Scrolls inside
 * its own focusable region on narrow screens.
 */
export function CalendarGrid({ data }: { data: CalendarAnswer }) {
  const l = layoutCalendar(data);
  const perDay = Math.max(1, data.bays.length);
  if (!data.bays.length)
    return <p className="text-sm text-basalt-600">No bays are set up yet: the owner adds them under Bays and hours.</p>;
  return (
    <div
      role="region"
      aria-label="Bookings by bay"
      tabIndex={0}
      className="overflow-x-auto rounded-card bg-white p-3 shadow-card ring-1 ring-basalt-100"
    >
      <div
        className="grid text-xs"
        style={{
          gridTemplateColumns: `4rem repeat(${l.columns.length}, minmax(7.5rem, 1fr))`,
          gridTemplateRows: `auto auto repeat(${l.rows}, 1.1rem)`,
        }}
        data-testid="calendar-grid"
      >
        {data.days.map((date, d) => (
          <div
            key={date}
            className="border-b border-basalt-200 px-1 pb-1 text-sm font-semibold"
            style={{ gridColumn: `${2 + d * perDay} / span ${perDay}`, gridRow: 1 }}
          >
            {formatDay(date)}
            {data.hours[date] === null && <span className="ml-1 font-normal text-basalt-500">closed</span>}
          </div>
        ))}
        {l.columns.map((c, i) => (
          <div
            key={`${c.date}-${c.bayId}`}
            className="truncate px-1 py-1 font-medium text-basalt-700"
            style={{ gridColumn: i + 2, gridRow: 2 }}
          >
            {c.bayName}
          </div>
        ))}
        {Array.from({ length: l.rows }, (_, r) =>
          r % (60 / ROW_MINUTES) === 0 ? (
            <div
              key={`t${r}`}
              aria-hidden
              className="border-t border-basalt-200 pr-1 text-right text-basalt-500"
              style={{ gridColumn: 1, gridRow: `${r + 3} / span ${60 / ROW_MINUTES}` }}
            >
              {formatMinute(l.firstMinute + r * ROW_MINUTES)}
            </div>
          ) : null,
        )}
        {l.columns.map((c, i) => (
          <div
            key={`bg-${c.date}-${c.bayId}`}
            aria-hidden
            className={c.closed ? "border-l border-basalt-100 bg-basalt-100" : "border-l border-basalt-100"}
            style={{ gridColumn: i + 2, gridRow: `3 / span ${l.rows}` }}
          />
        ))}
        {l.blocks.map((b) => (
          <Link
            key={b.key}
            href={`/shop/quotes/${b.quoteId}`}
            data-testid="calendar-booking"
            className="z-10 m-px overflow-hidden rounded-md bg-steel-100 px-1.5 py-1 text-steel-900 ring-1 ring-steel-300 hover:bg-steel-200"
            style={{ gridColumn: b.column + 2, gridRow: `${b.rowStart + 3} / ${b.rowEnd + 3}` }}
          >
            <span className="block font-semibold">{b.title}</span>
            <span className="block">{b.detail}</span>
          </Link>
        ))}
      </div>
    </div>
  );
}
