/**
 * The calendar answer as react-big-calendar's events, one per booked bay stretch, on the shop's
 * clock. The calendar lays events out by the browser's local clock, so each instant becomes a
 * "floating" Date whose local fields read what the shop's wall clock reads (zoned.ts does the
 * zone arithmetic); a drop is turned back into a real instant the same way. A counter in another
 * zone than the shop therefore still sees 8:00 AM where the shop opens at 8:00 AM.
 */
import type { BookedBay, CalendarAnswer, CalendarBooking } from "@/lib/shop/bookings/api";
import { addDays, wallTime, weekdayOf, zonedInstant } from "@/lib/shop/bookings/zoned";

export interface BayEvent {
  id: string;
  /** "Q-1003 · Ilse Varga-Pond · Half-ton pickup". */
  title: string;
  start: Date;
  end: Date;
  /** The bay's id: the resource column the event sits in. */
  resourceId: string;
  booking: CalendarBooking;
  stretch: BookedBay;
}

const pad = (n: number) => String(n).padStart(2, "0");

/** A shop-calendar day and minute as a browser-local Date (minute may pass 1440: it rolls into the next day). */
export function floatingAt(date: string, minute: number): Date {
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  return new Date(y, m - 1, d, 0, minute);
}

/**
 * An instant as a Date whose local fields read the shop's wall clock.
 *
 * @example
 * floating("2026-12-14T15:00:00.000Z", "America/Denver").getHours(); // 8 (MST, UTC−7), whatever the browser's zone
 */
export function floating(instant: string | Date, timeZone: string): Date {
  const w = wallTime(new Date(instant), timeZone);
  return floatingAt(w.date, w.minute);
}

/** "YYYY-MM-DD" of a floating Date (its local fields). */
export const dayOf = (local: Date): string => `${local.getFullYear()}-${pad(local.getMonth() + 1)}-${pad(local.getDate())}`;

/**
 * The real instant a floating Date stands for on the shop's clock.
 *
 * @example
 * instantOf(new Date(2026, 11, 14, 8, 0), "America/Denver").toISOString(); // "2026-12-14T15:00:00.000Z"
 */
export function instantOf(local: Date, timeZone: string): Date {
  return zonedInstant(dayOf(local), local.getHours() * 60 + local.getMinutes(), timeZone);
}

/**
 * The Sunday on or before a date: the first day of the week view (the calendar's en-US week).
 *
 * @example
 * weekStart("2026-12-16"); // "2026-12-13"
 */
export const weekStart = (date: string): string => addDays(date, -(weekdayOf(date) % 7));

/** Every booked bay stretch as an event in its bay's column. */
export function bayEvents(a: CalendarAnswer): BayEvent[] {
  return a.bookings.flatMap((b) =>
    b.bays.map((s) => ({
      id: `${b.id}-${s.bayId}-${s.startsAt}`,
      title: `${b.kind === "recheck" ? "Re-check · " : ""}Q-${b.quoteNumber} · ${b.customerName} · ${b.vehicleDescription}`,
      start: floating(s.startsAt, a.timeZone),
      end: floating(s.endsAt, a.timeZone),
      resourceId: s.bayId,
      booking: b,
      stretch: s,
    })),
  );
}

/**
 * The hours the time grid shows, in minutes after midnight: from the earliest opening to the
 * latest closing of the days shown, widened on whole hours to any booking outside them;
 * 8:00–17:00 when every day is closed and nothing is booked.
 *
 * @example
 * shownHours(answerOpen8to17WithBookingAt0630); // { first: 360, last: 1020 }
 */
export function shownHours(a: CalendarAnswer): { first: number; last: number } {
  const open = Object.values(a.hours).filter((h): h is { opens: number; closes: number } => h !== null);
  const stretches = a.bookings.flatMap((b) =>
    b.bays.map((s) => ({ from: wallTime(new Date(s.startsAt), a.timeZone), to: wallTime(new Date(s.endsAt), a.timeZone) })),
  );
  let first = Math.min(...open.map((h) => h.opens), ...stretches.map((x) => x.from.minute), 24 * 60);
  let last = Math.max(...open.map((h) => h.closes), ...stretches.map((x) => (x.to.date === x.from.date ? x.to.minute : 1440)), 0);
  if (first >= last) [first, last] = [8 * 60, 17 * 60];
  return { first: Math.floor(first / 60) * 60, last: Math.min(1440, Math.ceil(last / 60) * 60) };
}

/**
 * Where a dragged stretch puts its booking: the booking starts as much earlier or later as the
 * stretch was moved (a lift-then-rack job keeps its order), pinned to the bay it was dropped on.
 *
 * @example
 * movedRequest(liftEvent, new Date(2026, 11, 14, 10, 0), "lift", "America/Denver");
 * // { start: "2026-12-14T17:00:00.000Z", bayId: "lift" } (10:00 AM MST)
 */
export function movedRequest(event: BayEvent, droppedAt: Date, bayId: string, timeZone: string): { start: string; bayId: string } {
  const shift = instantOf(droppedAt, timeZone).getTime() - new Date(event.stretch.startsAt).getTime();
  return { start: new Date(new Date(event.booking.startsAt).getTime() + shift).toISOString(), bayId };
}
