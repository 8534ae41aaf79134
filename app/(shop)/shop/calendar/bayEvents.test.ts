import { describe, expect, it } from "vitest";
import { calendarWith, liftStretch } from "@/lib/shop/bookings/calendarFixture";
import { bayEvents, floating, instantOf, movedRequest, shownHours, weekStart } from "./bayEvents";

// Denver is UTC−7 in winter (MST) and UTC−6 in summer time, which starts on the second Sunday of March
// (49 CFR §71.9; 15 U.S.C. §260a): 2027-03-14. The bookings are invented.
const local = (d: Date) => [d.getFullYear(), d.getMonth() + 1, d.getDate(), d.getHours(), d.getMinutes()];

const answer = calendarWith("2026-12-14T20:40:00.000Z", [
  liftStretch("2026-12-14T19:40:00.000Z"),
  { bayId: "rack", bayName: "Rack", bayKind: "alignment_rack", startsAt: "2026-12-14T19:40:00.000Z", endsAt: "2026-12-14T20:40:00.000Z" },
]);

describe("the calendar's events on the shop's clock", () => {
  it("reads an instant as the shop's wall clock, whatever the browser's zone, and back", () => {
    expect(local(floating("2026-12-14T15:00:00.000Z", "America/Denver"))).toEqual([2026, 12, 14, 8, 0]); // MST
    expect(local(floating("2027-03-15T15:00:00.000Z", "America/Denver"))).toEqual([2027, 3, 15, 9, 0]); // MDT
    expect(instantOf(new Date(2026, 11, 14, 8, 0), "America/Denver").toISOString()).toBe("2026-12-14T15:00:00.000Z");
    expect(instantOf(new Date(2027, 2, 15, 9, 0), "America/Denver").toISOString()).toBe("2027-03-15T15:00:00.000Z");
  });

  it("puts each bay stretch in its bay's column with the quote number, customer and vehicle", () => {
    const events = bayEvents(answer);
    expect(events.map((e) => [e.resourceId, local(e.start), local(e.end)])).toEqual([
      ["lift", [2026, 12, 14, 8, 0], [2026, 12, 14, 12, 40]],
      ["rack", [2026, 12, 14, 12, 40], [2026, 12, 14, 13, 40]],
    ]);
    expect(events[0]!.title).toBe("Q-1003 · Ilse Varga-Pond · Half-ton pickup");
  });

  it("shows the opening hours, widened on whole hours to a booking outside them", () => {
    expect(shownHours(answer)).toEqual({ first: 480, last: 1020 });
    const early = {
      ...answer,
      bookings: [{ ...answer.bookings[0]!, bays: [{ ...liftStretch("2026-12-14T16:00:00.000Z"), startsAt: "2026-12-14T13:30:00.000Z" }] }],
    };
    expect(shownHours(early)).toEqual({ first: 360, last: 1020 }); // 6:30 AM MST → from 6:00
    expect(shownHours({ ...answer, hours: { "2026-12-14": null }, bookings: [] })).toEqual({ first: 480, last: 1020 });
  });

  it("moves the whole booking by as much as the dragged stretch moved, pinned to the bay it was dropped on", () => {
    const rack = bayEvents(answer)[1]!;
    // The rack stretch 12:40 → 2:00 PM is 80 minutes later: the booking starts 8:00 + 80 min = 9:20 AM MST = 16:20Z.
    expect(movedRequest(rack, new Date(2026, 11, 14, 14, 0), "rack", "America/Denver")).toEqual({
      start: "2026-12-14T16:20:00.000Z",
      bayId: "rack",
    });
  });

  it("starts the week view on the Sunday on or before a date (common practice in US calendars, no source)", () => {
    expect(weekStart("2026-12-16")).toBe("2026-12-13");
    expect(weekStart("2026-12-13")).toBe("2026-12-13");
    expect(weekStart("2027-01-02")).toBe("2026-12-27");
  });
});
