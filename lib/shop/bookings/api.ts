/**
 * What the booking routes answer (camelCase, ISO instants) and the row → API mappers, shared by
 * server and browser. Times carry the shop's zone so every screen shows the shop's clock.
 */
import type { BayKind, BayRow, BookingKind, BookingRow, BookingStatus, ServiceType, ServiceUnit } from "@/lib/platform/db/types";
import type { Slot, SlotDay } from "./slots";
import type { Segment } from "./workload";
import { formatClock, formatDay, formatDuration, formatInstant, minuteToHhmm } from "./zoned";
import { WEEKDAYS } from "./vocabulary";

const iso = (d: Date | string) => new Date(d).toISOString();

export interface Bay {
  id: string;
  name: string;
  kind: BayKind;
}

/** One catalog service and the bay time it takes (the owner's, or the default). */
export interface ServiceTime {
  catalogItemId: string;
  sku: string;
  description: string;
  serviceType: ServiceType | null;
  unit: ServiceUnit | null;
  minutes: number;
  bayKind: BayKind;
  /** True while the owner has not set it: the default is shown. */
  isDefault: boolean;
}

/** GET /api/shop/bays: everything the bays-and-hours form edits, as the form holds it. */
export interface BaysSetup {
  timeZone: string;
  slotStepMinutes: number;
  weekdays: { weekday: number; open: boolean; opens: string; closes: string }[];
  closedDays: { day: string; note: string }[];
  bays: Bay[];
  serviceTimes: ServiceTime[];
}

export const bayDto = (r: Pick<BayRow, "id" | "name" | "kind">): Bay => ({ id: r.id, name: r.name, kind: r.kind });

/** The week as the form shows it: every weekday, closed ones unticked with a suggested 08:00–17:00. */
export function weekdaysDto(rows: { weekday: number; opens_minute: number; closes_minute: number }[]): BaysSetup["weekdays"] {
  return WEEKDAYS.map((weekday) => {
    const r = rows.find((x) => x.weekday === weekday);
    return { weekday, open: !!r, opens: minuteToHhmm(r?.opens_minute ?? 480), closes: minuteToHhmm(r?.closes_minute ?? 1020) };
  });
}

export interface BookedBay {
  bayId: string;
  bayName: string;
  bayKind: BayKind;
  startsAt: string;
  endsAt: string;
}

export interface Booking {
  id: string;
  quoteId: string;
  /** An install, or the re-check after it (booked on the re-check e-mail's link). */
  kind: BookingKind;
  status: BookingStatus;
  startsAt: string;
  endsAt: string;
  /** "Mon, Mar 15, 2027, 9:00 AM MDT – 11:30 AM": on the shop's clock. */
  when: string;
  timeZone: string;
  sequence: number;
  bookedBy: string;
  bays: BookedBay[];
}

export function bookingDto(r: BookingRow, bays: BookedBay[], timeZone: string): Booking {
  return {
    id: r.id,
    quoteId: r.quote_id,
    kind: r.kind,
    status: r.status,
    startsAt: iso(r.starts_at),
    endsAt: iso(r.ends_at),
    when: `${formatInstant(r.starts_at, timeZone)} – ${formatClock(r.ends_at, timeZone)}`,
    timeZone,
    sequence: r.sequence,
    bookedBy: r.booked_by,
    bays,
  };
}

export interface SlotOption {
  start: string;
  end: string;
  /** "9:00 AM" on the shop's clock. */
  label: string;
}

export interface SlotDayOption {
  date: string;
  /** "Monday, March 15, 2027". */
  label: string;
  closed?: string;
  slots: SlotOption[];
}

/** GET …/slots: the job's length and the free starts of the days asked for. */
export interface SlotsAnswer {
  /** What the times are for (the picker names its field after it); an install when left out. */
  kind?: BookingKind;
  timeZone: string;
  /** Today on the shop's clock: no earlier day is listed. */
  today: string;
  minutes: number;
  /** "2 h 20 min". */
  length: string;
  segments: Segment[];
  /** Why nothing can be booked at all (no work, no bay of a needed kind), else null. */
  unavailable: string | null;
  days: SlotDayOption[];
  booking: Booking | null;
}

export const slotOption = (s: Pick<Slot, "start" | "end">, timeZone: string): SlotOption => ({
  start: iso(s.start),
  end: iso(s.end),
  label: formatClock(s.start, timeZone),
});

export function slotDayOption(d: SlotDay, timeZone: string): SlotDayOption {
  return {
    date: d.date,
    label: formatDay(d.date),
    ...(d.closed ? { closed: d.closed } : {}),
    slots: d.slots.map((s) => slotOption(s, timeZone)),
  };
}

export const lengthLabel = (minutes: number) => formatDuration(minutes);

/** One booking on the staff calendar, with what it is for. */
export interface CalendarBooking extends Booking {
  quoteNumber: number;
  customerName: string;
  vehicleDescription: string;
  /** The job's work order, once one is opened: any of the shop's staff may open it. */
  workOrderId: string | null;
  /** Whether the caller may open the quote (owners every quote, staff the ones they wrote). */
  quoteOpen: boolean;
}

/** GET /api/shop/bookings: a day or a week of the shop's bays. */
export interface CalendarAnswer {
  timeZone: string;
  from: string;
  days: string[];
  /** Opening hours per day shown, "HH:MM", or null when closed. */
  hours: Record<string, { opens: number; closes: number } | null>;
  bays: Bay[];
  bookings: CalendarBooking[];
}
