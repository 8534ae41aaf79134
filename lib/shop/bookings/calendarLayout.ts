/**
 * Where each booked bay stretch sits on the staff calendar's CSS grid: one column per day and
 * bay, one row per quarter hour of the shop's clock. Pure; the page renders what this returns.
 */
import type { CalendarAnswer } from "./api";
import { formatClock, wallTime } from "./zoned";

export const ROW_MINUTES = 15;

export interface CalendarBlock {
  key: string;
  bookingId: string;
  quoteId: string;
  /** 0-based column among the day × bay columns. */
  column: number;
  /** 0-based quarter-hour rows from `firstMinute`, end exclusive. */
  rowStart: number;
  rowEnd: number;
  title: string;
  detail: string;
}

export interface CalendarLayout {
  firstMinute: number;
  rows: number;
  columns: { date: string; bayId: string; bayName: string; closed: boolean }[];
  blocks: CalendarBlock[];
}

/**
 * @example
 * layoutCalendar(answer).blocks[0]; // { column: 0, rowStart: 0, rowEnd: 19, title: "Q-1003 · Ilse Varga-Pond", ... }
 */
export function layoutCalendar(a: CalendarAnswer): CalendarLayout {
  const tz = a.timeZone;
  const open = Object.values(a.hours).filter((h): h is { opens: number; closes: number } => h !== null);
  const stretches = a.bookings.flatMap((b) =>
    b.bays.map((s) => ({ b, s, from: wallTime(new Date(s.startsAt), tz), to: wallTime(new Date(s.endsAt), tz) })),
  );
  // The shown hours: from the earliest opening to the latest closing, widened to any booking outside them.
  let first = Math.min(...open.map((h) => h.opens), ...stretches.map((x) => x.from.minute), 24 * 60);
  let last = Math.max(...open.map((h) => h.closes), ...stretches.map((x) => (x.to.date === x.from.date ? x.to.minute : 1440)), 0);
  if (first >= last) [first, last] = [8 * 60, 17 * 60];
  first = Math.floor(first / 60) * 60;
  last = Math.ceil(last / 60) * 60;
  const columns = a.days.flatMap((date) =>
    a.bays.map((bay) => ({ date, bayId: bay.id, bayName: bay.name, closed: a.hours[date] === null })),
  );
  const blocks: CalendarBlock[] = [];
  for (const { b, s, from, to } of stretches) {
    const column = columns.findIndex((c) => c.date === from.date && c.bayId === s.bayId);
    if (column < 0) continue;
    const end = to.date === from.date ? to.minute : 1440;
    blocks.push({
      key: `${b.id}-${s.bayId}-${s.startsAt}`,
      bookingId: b.id,
      quoteId: b.quoteId,
      column,
      rowStart: Math.max(0, Math.floor((from.minute - first) / ROW_MINUTES)),
      rowEnd: Math.max(1, Math.ceil((end - first) / ROW_MINUTES)),
      title: `Q-${b.quoteNumber} · ${b.customerName}`,
      detail: `${b.vehicleDescription}, ${formatClock(s.startsAt, tz)}–${formatClock(s.endsAt, tz)}, ${s.bayName}`,
    });
  }
  return { firstMinute: first, rows: (last - first) / ROW_MINUTES, columns, blocks };
}
