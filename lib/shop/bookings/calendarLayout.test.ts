import { describe, expect, it } from "vitest";
import { calendarWith, liftStretch } from "./calendarFixture";
import { layoutCalendar } from "./calendarLayout";

// Grid arithmetic only (quarter-hour rows); the times are invented. Denver is UTC−7 in December (49 CFR §71.9).
const answer = calendarWith("2026-12-14T20:40:00.000Z", [
  liftStretch("2026-12-14T19:40:00.000Z"),
  {
    bayId: "rack",
    bayName: "Rack",
    bayKind: "alignment_rack",
    startsAt: "2026-12-14T19:40:00.000Z",
    endsAt: "2026-12-14T20:40:00.000Z",
  },
]);

describe("the staff calendar's grid", () => {
  it("puts each bay stretch in its day-and-bay column, in quarter-hour rows from the first opening hour", () => {
    const l = layoutCalendar(answer);
    expect(l.firstMinute).toBe(480);
    expect(l.rows).toBe(36); // 08:00–17:00
    expect(l.columns.map((c) => `${c.date} ${c.bayName}${c.closed ? " closed" : ""}`)).toEqual([
      "2026-12-14 Lift 1",
      "2026-12-14 Rack",
      "2026-12-15 Lift 1 closed",
      "2026-12-15 Rack closed",
    ]);
    // 08:00–12:40 MST on the lift: rows 0 to 19 (12:40 rounds up to 12:45); 12:40–13:40 on the rack: rows 18 to 23.
    expect(l.blocks.map((b) => [b.column, b.rowStart, b.rowEnd])).toEqual([
      [0, 0, 19],
      [1, 18, 23],
    ]);
    expect(l.blocks[0]!.title).toBe("Q-1003 · Ilse Varga-Pond");
    expect(l.blocks[0]!.detail).toBe("Half-ton pickup, 8:00 AM–12:40 PM, Lift 1");
  });

  it("widens the hours to a booking outside them, on whole hours", () => {
    const early = {
      ...answer,
      bookings: [{ ...answer.bookings[0]!, bays: [{ ...answer.bookings[0]!.bays[0]!, startsAt: "2026-12-14T13:30:00.000Z" }] }],
    };
    const l = layoutCalendar(early);
    expect(l.firstMinute).toBe(360); // 06:30 MST → from 06:00
    expect(l.blocks[0]!.rowStart).toBe(2);
  });
});
