/**
 * Test helper (the staff calendar's event and component tests): an invented two-day, two-bay calendar with one
 * booking starting 15:00Z, 8:00 AM in Denver (UTC−7 in December, 49 CFR §71.9); the second day is closed.
 * @example calendarWith("2026-12-14T16:20:00.000Z", [liftStretch("2026-12-14T16:20:00.000Z")]);
 */
import type { CalendarAnswer } from "./api";

type BayStretch = CalendarAnswer["bookings"][number]["bays"][number];

/** The booking's stretch on Lift 1, from its start to `endsAt`. */
export const liftStretch = (endsAt: string): BayStretch => ({
  bayId: "lift",
  bayName: "Lift 1",
  bayKind: "lift_bay",
  startsAt: "2026-12-14T15:00:00.000Z",
  endsAt,
});

/** The calendar with its one booking ending at `endsAt`, spread over the given bay stretches. */
export const calendarWith = (endsAt: string, bays: BayStretch[]): CalendarAnswer => ({
  timeZone: "America/Denver",
  from: "2026-12-14",
  days: ["2026-12-14", "2026-12-15"],
  hours: { "2026-12-14": { opens: 480, closes: 1020 }, "2026-12-15": null },
  bays: [
    { id: "lift", name: "Lift 1", kind: "lift_bay" },
    { id: "rack", name: "Rack", kind: "alignment_rack" },
  ],
  bookings: [
    {
      id: "b1",
      quoteId: "q1",
      kind: "install",
      status: "booked",
      startsAt: "2026-12-14T15:00:00.000Z",
      endsAt,
      when: "",
      timeZone: "America/Denver",
      sequence: 0,
      bookedBy: "customer",
      quoteNumber: 1003,
      customerName: "Ilse Varga-Pond",
      vehicleDescription: "Half-ton pickup",
      workOrderId: null,
      quoteOpen: true,
      bays,
    },
  ],
});
