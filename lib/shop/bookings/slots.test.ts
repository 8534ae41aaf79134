import { describe, expect, it } from "vitest";
import { type BayLite, type Held, type Schedule, type SlotContext, checkStart, freeSlots } from "./slots";
import { workloadOf } from "./workload";

/*
 * Time-zone figures: US daylight saving time starts 2027-03-14 at 2:00 a.m. and ends 2027-11-07
 * (Energy Policy Act of 2005 §110); Mountain time is UTC−7 standard, UTC−6 daylight (49 CFR §71.9).
 * Shop hours, bays and job lengths are invented for the tests (common practice, no source).
 */
const DENVER = "America/Denver";
const H = (h: number, m = 0) => h * 60 + m;

const week: Schedule = {
  timeZone: DENVER,
  stepMinutes: 30,
  hours: {
    1: { opens: H(8), closes: H(17) },
    2: { opens: H(8), closes: H(17) },
    3: { opens: H(8), closes: H(17) },
    4: { opens: H(8), closes: H(17) },
    5: { opens: H(8), closes: H(17) },
    6: { opens: H(9), closes: H(13) },
  },
  closedDays: new Map([["2027-03-17", "Stock count"]]),
};
const bays: BayLite[] = [
  { id: "lift-a", name: "Lift 1", kind: "lift_bay" },
  { id: "lift-b", name: "Lift 2", kind: "lift_bay" },
  { id: "rack", name: "Rack", kind: "alignment_rack" },
];
/** Friday 2027-03-12, 05:00 in Denver. */
const NOW = new Date("2027-03-12T12:00:00Z");
const mountFour = [{ bayKind: "lift_bay" as const, minutes: 80 }];
const ctx = (over: Partial<SlotContext> = {}): SlotContext => ({
  schedule: week,
  bays,
  held: [],
  segments: mountFour,
  now: NOW,
  horizonDays: 60,
  ...over,
});
const at = (iso: string) => new Date(iso);
const held = (bayId: string, from: string, to: string): Held => ({ bayId, start: Date.parse(from), end: Date.parse(to) });

describe("free slots", () => {
  it("offer every 30 minutes from opening while the job still ends by closing (Monday 08:00–17:00 MDT, 80 min job)", () => {
    const [monday] = freeSlots({ ...ctx(), fromDate: "2027-03-15", days: 1 });
    // 08:00 MDT = 14:00 UTC; the last start is 15:30 (ends 16:50); 16:00 would end 17:20.
    expect(monday!.slots[0]!.start.toISOString()).toBe("2027-03-15T14:00:00.000Z");
    expect(monday!.slots.at(-1)!.start.toISOString()).toBe("2027-03-15T21:30:00.000Z");
    expect(monday!.slots).toHaveLength(16);
    expect(monday!.slots[0]!.end.toISOString()).toBe("2027-03-15T15:20:00.000Z");
  });

  it("skip closed weekdays and the owner's closed dates, saying why", () => {
    const days = freeSlots({ ...ctx(), fromDate: "2027-03-13", days: 5 });
    expect(days.map((d) => [d.date, d.closed ?? d.slots.length])).toEqual([
      ["2027-03-13", 6], // Saturday 09:00–13:00 MST: 09:00 … 11:30
      ["2027-03-14", "Closed"], // Sunday
      ["2027-03-15", 16],
      ["2027-03-16", 16],
      ["2027-03-17", "Stock count"],
    ]);
    // Saturday is still standard time: 09:00 MST = 16:00 UTC.
    expect(days[0]!.slots[0]!.start.toISOString()).toBe("2027-03-13T16:00:00.000Z");
  });

  it("never offer a start that has passed", () => {
    const now = new Date("2027-03-15T17:10:00Z"); // 11:10 MDT
    const [monday] = freeSlots({ ...ctx({ now }), fromDate: "2027-03-15", days: 1 });
    expect(monday!.slots[0]!.start.toISOString()).toBe("2027-03-15T17:30:00.000Z"); // 11:30
  });

  it("use the second lift while the first is held, and offer nothing when both are", () => {
    const one = [held("lift-a", "2027-03-15T14:00:00Z", "2027-03-15T15:20:00Z")];
    const [a] = freeSlots({ ...ctx({ held: one }), fromDate: "2027-03-15", days: 1 });
    expect(a!.slots[0]!.placements).toEqual([
      { bayId: "lift-b", bayKind: "lift_bay", start: at("2027-03-15T14:00:00Z"), end: at("2027-03-15T15:20:00Z") },
    ]);
    const both = [...one, held("lift-b", "2027-03-15T14:00:00Z", "2027-03-15T16:00:00Z")];
    const [b] = freeSlots({ ...ctx({ held: both }), fromDate: "2027-03-15", days: 1 });
    // Held until 15:20 and 16:00 UTC: the first start is 15:30 UTC, on the first lift.
    expect(b!.slots[0]!.start.toISOString()).toBe("2027-03-15T15:30:00.000Z");
    expect(b!.slots[0]!.placements[0]!.bayId).toBe("lift-a");
  });

  it("run the stretches back to back: the lift, then the alignment rack when it is free", () => {
    const segments = workloadOf([
      { kind: "service", unit: "each", quantity: 4, description: "Mount and balance", time: { minutesPerUnit: 20, bayKind: "lift_bay" } },
      { kind: "service", unit: "each", quantity: 1, description: "Alignment", time: { minutesPerUnit: 60, bayKind: "alignment_rack" } },
    ]).segments;
    const rackBusy = [held("rack", "2027-03-15T15:00:00Z", "2027-03-15T16:00:00Z")];
    const [monday] = freeSlots({ ...ctx({ segments, held: rackBusy }), fromDate: "2027-03-15", days: 1 });
    // 14:00 would need the rack 15:20–16:20 (held until 16:00); 14:30 needs it 15:50–16:50 (also held); 15:00 → 16:20, free.
    expect(monday!.slots[0]!.start.toISOString()).toBe("2027-03-15T15:00:00.000Z");
    expect(monday!.slots[0]!.placements.map((p) => [p.bayId, p.start.toISOString(), p.end.toISOString()])).toEqual([
      ["lift-a", "2027-03-15T15:00:00.000Z", "2027-03-15T16:20:00.000Z"],
      ["rack", "2027-03-15T16:20:00.000Z", "2027-03-15T17:20:00.000Z"],
    ]);
  });

  it("on the day the clocks spring forward, a shop open round the clock has 23 hours of starts; on the day they fall back, 25", () => {
    const allDay: Schedule = { ...week, hours: { 7: { opens: 0, closes: 1440 } }, closedDays: new Map() };
    const hourJob = [{ bayKind: "lift_bay" as const, minutes: 60 }];
    const [spring] = freeSlots({ ...ctx({ schedule: allDay, segments: hourJob }), fromDate: "2027-03-14", days: 1 });
    // 23 h = 1380 min; starts every 30 min from 0 to 1320 → 45.
    expect(spring!.slots).toHaveLength(45);
    expect(spring!.slots[0]!.start.toISOString()).toBe("2027-03-14T07:00:00.000Z"); // 00:00 MST
    expect(spring!.slots.at(-1)!.end.toISOString()).toBe("2027-03-15T06:00:00.000Z"); // 24:00 MDT
    const [autumn] = freeSlots({
      ...ctx({ schedule: allDay, segments: hourJob, now: new Date("2027-11-01T00:00:00Z") }),
      fromDate: "2027-11-07",
      days: 1,
    });
    expect(autumn!.slots).toHaveLength(49);
  });
});

describe("one chosen start", () => {
  it("a booking on the spring-forward day: 9:00 on the shop's clock is 15:00 UTC (MDT), and a 4 h job from midnight ends at 05:00 on the clock", () => {
    const sundays: Schedule = { ...week, hours: { 7: { opens: 0, closes: H(12) } } };
    const ok = checkStart(at("2027-03-14T15:00:00Z"), ctx({ schedule: sundays }));
    expect(ok.ok).toBe(true);
    const long = checkStart(at("2027-03-14T07:00:00Z"), ctx({ schedule: sundays, segments: [{ bayKind: "lift_bay", minutes: 240 }] }));
    expect(long.ok && long.slot.end.toISOString()).toBe("2027-03-14T11:00:00.000Z"); // 05:00 MDT, four real hours later
    // 08:00 MST would be 15:00 UTC the day before; on this day 15:00 UTC is 09:00 MDT, on the 30-minute step.
    const off = checkStart(at("2027-03-14T15:10:00Z"), ctx({ schedule: sundays }));
    expect(!off.ok && off.problem.code).toBe("off_step");
  });

  it("refuses each bad start with a message that names the field and says why", () => {
    const cases: [string, string, RegExp][] = [
      ["2027-03-12T11:00:00Z", "past", /^Install time: that time has already passed/],
      [
        "2027-03-15T22:00:00Z",
        "outside_hours",
        /^Install time: on Mondays the shop works 8:00 AM to 5:00 PM, and this work takes 1 h 20 min/,
      ],
      ["2027-03-15T13:30:00Z", "outside_hours", /8:00 AM/],
      ["2027-03-17T15:00:00Z", "closed_day", /^Install time: the shop is closed on Wednesday, March 17, 2027 \(Stock count\)\.$/],
      ["2027-03-14T16:00:00Z", "closed_weekday", /^Install time: the shop is closed on Sundays\.$/],
      ["2027-03-15T14:10:00Z", "off_step", /every 30 minutes from opening/],
      ["2027-06-01T15:00:00Z", "too_far", /60 days ahead/],
    ];
    for (const [iso, code, message] of cases) {
      const r = checkStart(at(iso), ctx());
      expect(r.ok, iso).toBe(false);
      if (!r.ok) {
        expect(r.problem.code, iso).toBe(code);
        expect(r.problem.message, iso).toMatch(message);
      }
    }
  });

  it("names the re-check's own field when the re-check is being placed, never the install's", () => {
    const past = checkStart(at("2027-03-12T11:00:00Z"), ctx({ job: "recheck" }));
    expect(!past.ok && past.problem.message).toBe("Re-check time: that time has already passed. Pick a time from now on.");
    const closed = checkStart(at("2027-03-14T16:00:00Z"), ctx({ job: "recheck" }));
    expect(!closed.ok && closed.problem.message).toBe("Re-check time: the shop is closed on Sundays.");
  });

  it("refuses a start where every bay of the kind is held, and one the shop has no bay for", () => {
    const busy = [
      held("lift-a", "2027-03-15T14:30:00Z", "2027-03-15T15:00:00Z"),
      held("lift-b", "2027-03-15T15:00:00Z", "2027-03-15T15:10:00Z"),
    ];
    const taken = checkStart(at("2027-03-15T14:00:00Z"), ctx({ held: busy }));
    expect(!taken.ok && taken.problem.code).toBe("taken");
    // Back to back is not an overlap: held until 15:20 and a start at 15:20 share no minute.
    const edge = checkStart(
      at("2027-03-15T15:30:00Z"),
      ctx({ held: [held("lift-a", "2027-03-15T14:00:00Z", "2027-03-15T15:30:00Z")], bays: [bays[0]!] }),
    );
    expect(edge.ok).toBe(true);
    const noRack = checkStart(
      at("2027-03-15T14:00:00Z"),
      ctx({ bays: [bays[0]!], segments: [{ bayKind: "alignment_rack", minutes: 60 }] }),
    );
    expect(!noRack.ok && noRack.problem.message).toBe("Install time: this work needs an alignment rack, and the shop has none set up.");
    const nothing = checkStart(at("2027-03-15T14:00:00Z"), ctx({ segments: [] }));
    expect(!nothing.ok && nothing.problem.code).toBe("no_work");
  });

  it("keeps a pinned bay: with the first lift pinned and held, the start is refused though the second is free", () => {
    const busy = [held("lift-a", "2027-03-15T14:00:00Z", "2027-03-15T15:00:00Z")];
    expect(checkStart(at("2027-03-15T14:00:00Z"), ctx({ held: busy })).ok).toBe(true);
    const pinned = checkStart(at("2027-03-15T14:00:00Z"), ctx({ held: busy, pinnedBayId: "lift-a" }));
    expect(!pinned.ok && pinned.problem.code).toBe("taken");
  });
});
