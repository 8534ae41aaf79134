/**
 * The iCalendar file (RFC 5545, with RFC 5546's METHOD) that rides along the booking e-mails, so
 * the customer's calendar holds the install and follows it when the shop moves or cancels it:
 * one UID per booking for its whole life, SEQUENCE raised on every change (the calendar keeps the
 * highest), METHOD:CANCEL with STATUS:CANCELLED to take it off.
 */
import { createEvent } from "ics";

export interface BookingCalendarEntry {
  uid: string;
  sequence: number;
  cancelled: boolean;
  start: Date;
  end: Date;
  title: string;
  location: string;
  description: string;
  /** The shop, as the sender: RFC 5546 asks every REQUEST and CANCEL for an ORGANIZER. */
  organizer: { name: string; email: string };
  attendee: { name: string; email: string };
}

/**
 * A booking's UID: stable across moves and the cancel, unique worldwide by the app's host.
 *
 * @example
 * bookingUid("5f0c…", "https://shop.example"); // "booking-5f0c…@shop.example"
 */
export function bookingUid(bookingId: string, origin: string): string {
  let host = "hubface.invalid";
  try {
    host = new URL(origin).hostname || host;
  } catch {
    // keep the placeholder host: the UID still names the booking
  }
  return `booking-${bookingId}@${host}`;
}

/**
 * The .ics text for one booking, times in UTC (DTSTART/DTEND with Z, so no VTIMEZONE is needed).
 *
 * @example
 * bookingCalendar({ uid, sequence: 0, cancelled: false, start, end, title: "Tire install", location: "Shop A, 1 Test Lane", ... });
 * // "BEGIN:VCALENDAR\r\n…METHOD:REQUEST…UID:booking-…\r\nSEQUENCE:0…"
 */
export function bookingCalendar(e: BookingCalendarEntry): string {
  const { error, value } = createEvent({
    productId: "hubface/install-bookings",
    method: e.cancelled ? "CANCEL" : "REQUEST",
    uid: e.uid,
    sequence: e.sequence,
    status: e.cancelled ? "CANCELLED" : "CONFIRMED",
    start: e.start.getTime(),
    startInputType: "utc",
    startOutputType: "utc",
    end: e.end.getTime(),
    endInputType: "utc",
    endOutputType: "utc",
    title: e.title,
    location: e.location,
    description: e.description,
    busyStatus: "BUSY",
    organizer: e.organizer,
    attendees: [{ name: e.attendee.name, email: e.attendee.email, rsvp: false, role: "REQ-PARTICIPANT", partstat: "ACCEPTED" }],
  });
  if (error || !value) throw new Error(`the calendar file could not be made: ${error?.message ?? "no output"}`);
  return value;
}
