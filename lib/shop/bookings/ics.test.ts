import ical from "node-ical";
import { describe, expect, it } from "vitest";
import { bookingCalendar, bookingUid } from "./ics";

// What a calendar reads: RFC 5545 (VEVENT: UID, SEQUENCE, DTSTART/DTEND, LOCATION, STATUS) and RFC 5546 (METHOD), parsed by node-ical.
const entry = {
  uid: bookingUid("7d1e0c3a-0000-4000-8000-000000000001", "https://counter.example.test"),
  sequence: 0,
  cancelled: false,
  start: new Date("2027-03-14T15:00:00Z"),
  end: new Date("2027-03-14T17:30:00Z"),
  title: "Tire and wheel install, Q-1001",
  location: "Shop A, 1 Test Lane, Springfield",
  description: "Mount and balance × 4; alignment.\nBring the truck at the time booked.",
  organizer: { name: "Shop A", email: "no-reply@hubface.test" },
  attendee: { name: "Ilse Varga-Pond", email: "ilse@example.test" },
};

function only(text: string) {
  const parsed = ical.sync.parseICS(text);
  const events = Object.values(parsed).filter((c) => c?.type === "VEVENT");
  expect(events).toHaveLength(1);
  return { event: events[0] as ical.VEvent, calendar: parsed.vcalendar as unknown as { method?: string } };
}

describe("the booking's calendar file", () => {
  it("reads back with the start, end, place, UID and SEQUENCE it was made with", () => {
    const { event, calendar } = only(bookingCalendar(entry));
    expect(event.start.toISOString()).toBe("2027-03-14T15:00:00.000Z");
    expect(event.end?.toISOString()).toBe("2027-03-14T17:30:00.000Z");
    expect(event.location).toBe("Shop A, 1 Test Lane, Springfield");
    expect(event.uid).toBe("booking-7d1e0c3a-0000-4000-8000-000000000001@counter.example.test");
    expect(Number(event.sequence)).toBe(0);
    expect(event.summary).toBe("Tire and wheel install, Q-1001");
    expect(event.description).toBe("Mount and balance × 4; alignment.\nBring the truck at the time booked.");
    expect(calendar.method).toBe("REQUEST");
    expect(event.status).toBe("CONFIRMED");
  });

  it("a move keeps the UID and raises SEQUENCE; a cancel says METHOD:CANCEL and STATUS:CANCELLED", () => {
    const moved = only(
      bookingCalendar({ ...entry, sequence: 1, start: new Date("2027-03-15T14:00:00Z"), end: new Date("2027-03-15T16:30:00Z") }),
    ).event;
    expect(moved.uid).toBe(entry.uid);
    expect(Number(moved.sequence)).toBe(1);
    expect(moved.start.toISOString()).toBe("2027-03-15T14:00:00.000Z");
    const text = bookingCalendar({ ...entry, sequence: 2, cancelled: true });
    const { event, calendar } = only(text);
    expect(calendar.method).toBe("CANCEL");
    expect(event.status).toBe("CANCELLED");
    expect(Number(event.sequence)).toBe(2);
    expect(event.uid).toBe(entry.uid);
    expect(text).toMatch(/^ORGANIZER;CN="?Shop A"?:mailto:no-reply@hubface\.test/im);
  });

  it("a UID has a host even when the origin cannot be read", () => {
    expect(bookingUid("abc", "not a url")).toBe("booking-abc@hubface.invalid");
  });
});
