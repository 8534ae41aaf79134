"use client";
import "react-big-calendar/lib/css/react-big-calendar.css";
import "react-big-calendar/lib/addons/dragAndDrop/styles.css";
import "./calendar.css";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import dayjs from "dayjs";
import { useRouter } from "next/navigation";
import { useMemo, useState, useSyncExternalStore } from "react";
import { Calendar, Views, dayjsLocalizer } from "react-big-calendar";
import withDragAndDrop from "react-big-calendar/lib/addons/dragAndDrop";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { Bay, CalendarAnswer } from "@/lib/shop/bookings/api";
import { addDays } from "@/lib/shop/bookings/zoned";
import { type BayEvent, bayEvents, dayOf, floating, floatingAt, shownHours, weekStart } from "./bayEvents";
import { BookingEvent } from "./BookingEvent";
import { ClosedDays, DayHeader } from "./DayHeader";
import { SelectedBooking } from "./SelectedBooking";
import { useBookingMove } from "./useBookingMove";
import { countOf } from "@/lib/platform/text";

const localizer = dayjsLocalizer(dayjs);
const DragAndDropCalendar = withDragAndDrop<BayEvent, Bay>(Calendar);
const VIEWS = [Views.DAY, Views.WEEK];
// Below Tailwind's sm breakpoint a week of bays is too wide to read: the day is shown unless the link asked for the week.
const NARROW = "(max-width: 639px)";

/** True while the screen is narrower than Tailwind's sm breakpoint (false on the server). */
function useNarrow(): boolean {
  return useSyncExternalStore(
    (onChange) => {
      const media = window.matchMedia?.(NARROW);
      media?.addEventListener("change", onChange);
      return () => media?.removeEventListener("change", onChange);
    },
    () => window.matchMedia?.(NARROW).matches ?? false,
    () => false,
  );
}

interface Range {
  from: string;
  days: 1 | 7;
}

/**
 * The shop's bays as react-big-calendar's day and week views: one column per bay, the opening
 * hours as the visible range, on the shop's clock. A booking is dragged to another time or bay,
 * or picked and moved with "Move…" from the keyboard; the server checks every move again.
 */
export function BayCalendar({ initial, today, askedDays }: { initial: CalendarAnswer; today: string; askedDays: boolean }) {
  const router = useRouter();
  const narrow = useNarrow();
  // Until staff pick a range, a link without one shows the week, or today on a narrow screen.
  const [chosen, setChosen] = useState<Range | null>(askedDays ? { from: initial.from, days: initial.days.length === 1 ? 1 : 7 } : null);
  const range: Range = chosen ?? (narrow ? { from: today, days: 1 } : { from: initial.from, days: 7 });
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const isInitial = range.from === initial.from && range.days === initial.days.length;
  const calendar = useQuery({
    queryKey: queryKeys.shop.calendar.range(range.from, range.days),
    queryFn: () => api<CalendarAnswer>(`/api/shop/bookings?from=${range.from}&days=${range.days}`),
    initialData: isInitial ? initial : undefined,
    placeholderData: keepPreviousData,
  });
  const data = calendar.data ?? initial;
  const move = useBookingMove(data.timeZone);
  const go = (next: Range) => {
    setChosen(next);
    setSelectedId(null);
    // The address keeps the range, so a reload or a shared link opens the same days.
    window.history.replaceState(null, "", `/shop/calendar?from=${next.from}&days=${next.days}`);
  };
  const events = useMemo(() => bayEvents(data), [data]);
  const closed = useMemo(() => new Set(Object.keys(data.hours).filter((d) => data.hours[d] === null)), [data]);
  const hours = shownHours(data);
  // The grid follows the answer it shows (the previous range stays up while the next one loads).
  const day = data.days[0] ?? range.from;
  const shownDays = data.days.length === 1 ? 1 : 7;
  const selected = events.find((e) => e.id === selectedId);
  if (!data.bays.length)
    return <p className="text-sm text-basalt-600">No bays are set up yet: the owner adds them under Bays and hours.</p>;
  const step = range.days === 1 ? 1 : 7;
  const unit = range.days === 1 ? "day" : "week";
  return (
    <>
      <nav aria-label="Calendar range" className="mb-3 flex flex-wrap gap-2">
        <Button type="button" variant="secondary" onClick={() => go({ ...range, from: addDays(range.from, -step) })}>
          Previous {unit}
        </Button>
        <Button type="button" variant="secondary" onClick={() => go({ ...range, from: range.days === 1 ? today : weekStart(today) })}>
          {range.days === 1 ? "Today" : "This week"}
        </Button>
        <Button type="button" variant="secondary" onClick={() => go({ ...range, from: addDays(range.from, step) })}>
          Next {unit}
        </Button>
        <Button
          type="button"
          variant="ghost"
          onClick={() =>
            go(
              range.days === 1
                ? { from: weekStart(range.from), days: 7 }
                : { from: range.from <= today && today < addDays(range.from, 7) ? today : range.from, days: 1 },
            )
          }
        >
          {range.days === 1 ? "Show the week" : "Show one day"}
        </Button>
      </nav>
      <div aria-live="polite" className="mb-3 empty:hidden">
        {move.message && <Alert tone={move.message.tone}>{move.message.text}</Alert>}
        {calendar.isFetching && !calendar.isPending && <span className="sr-only">Loading the calendar…</span>}
      </div>
      <div
        role="region"
        aria-label="Bookings by bay"
        tabIndex={0}
        className="scroll-cue relative overflow-x-auto rounded-card bg-white p-3 shadow-card ring-1 ring-basalt-100"
      >
        <div className="bay-calendar" style={{ minWidth: `${4 + data.bays.length * shownDays * 7}rem` }}>
          <ClosedDays.Provider value={closed}>
            <DragAndDropCalendar
              localizer={localizer}
              culture="en"
              events={move.place(events)}
              resources={data.bays}
              resourceIdAccessor="id"
              resourceTitleAccessor="name"
              views={VIEWS}
              view={shownDays === 1 ? Views.DAY : Views.WEEK}
              onView={() => undefined}
              date={floatingAt(day, 12 * 60)}
              onNavigate={() => undefined}
              getNow={() => floating(new Date(), data.timeZone)}
              toolbar={false}
              drilldownView={null}
              min={floatingAt(day, hours.first)}
              max={floatingAt(day, hours.last - 1)}
              scrollToTime={floatingAt(day, hours.first)}
              step={15}
              timeslots={4}
              resizable={false}
              // Installs and re-checks move through the same route, which checks every move again.
              draggableAccessor={() => !move.pending}
              onEventDrop={({ event, start, resourceId, isAllDay }) =>
                void move.drop(event, new Date(start), resourceId === undefined ? undefined : String(resourceId), isAllDay)
              }
              selected={selected}
              onSelectEvent={(e) => setSelectedId(e.id)}
              onKeyPressEvent={(e, ev) => {
                // The calendar hands the event's keydown over typed as a plain SyntheticEvent.
                const key = "key" in ev ? ev.key : "";
                if (key !== "Enter" && key !== " ") return;
                ev.preventDefault();
                setSelectedId(e.id);
              }}
              onDoubleClickEvent={(e) => router.push(`/shop/quotes/${e.booking.quoteId}`)}
              dayPropGetter={(d) => (closed.has(dayOf(d)) ? { className: "bay-calendar-closed" } : {})}
              components={{ event: BookingEvent, header: DayHeader }}
            />
          </ClosedDays.Provider>
        </div>
      </div>
      <p className="mt-3 text-sm text-basalt-600">
        {data.bookings.length === 0 ? "No bookings in these days." : `${countOf(data.bookings.length, "booking")} in these days.`} Drag a
        booking to another time or bay, or pick it and choose Move…
      </p>
      {selected && (
        <SelectedBooking
          key={selected.booking.id}
          booking={selected.booking}
          onChanged={async (text) => {
            await move.moved(text);
            setSelectedId(null);
          }}
          onClose={() => setSelectedId(null)}
        />
      )}
    </>
  );
}
