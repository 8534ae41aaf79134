import { describe, expect, it } from "vitest";
import { bookedShare, hoursLabel, openMinutes, shortDay, takingsByDay, weekOf } from "./overview";

describe("weekOf", () => {
  // ISO 8601-1 weeks run Monday to Sunday; 2026-12-16 is a Wednesday (proleptic Gregorian calendar).
  it("runs Monday to Sunday around the date, across a month and a year end", () => {
    expect(weekOf("2026-12-16")).toEqual({
      from: "2026-12-14",
      days: ["2026-12-14", "2026-12-15", "2026-12-16", "2026-12-17", "2026-12-18", "2026-12-19", "2026-12-20"],
    });
    expect(weekOf("2026-12-14").from).toBe("2026-12-14");
    expect(weekOf("2026-12-20").from).toBe("2026-12-14");
    // 2027-01-01 is a Friday: its week began on Monday 2026-12-28.
    expect(weekOf("2027-01-01").from).toBe("2026-12-28");
    expect(weekOf("2027-01-01").days.at(-1)).toBe("2027-01-03");
  });
});

describe("openMinutes", () => {
  const hours = {
    1: { opens: 480, closes: 1020 },
    2: { opens: 480, closes: 1020 },
    3: { opens: 480, closes: 1020 },
    4: { opens: 480, closes: 1020 },
    5: { opens: 480, closes: 1020 },
    6: { opens: 540, closes: 780 },
  };
  it("adds each open weekday's hours and leaves out closed weekdays and closed dates (by hand: 4 × 540 + 240 = 2400)", () => {
    const days = weekOf("2026-12-16").days;
    expect(openMinutes({ hours, closedDays: new Map() }, days)).toBe(5 * 540 + 240);
    expect(openMinutes({ hours, closedDays: new Map([["2026-12-16", "Stock take"]]) }, days)).toBe(4 * 540 + 240);
    expect(openMinutes({ hours: {}, closedDays: new Map() }, days)).toBe(0);
  });
});

describe("takingsByDay", () => {
  it("fills every day of the window, sums by kind and nets refunds off; amounts outside the window are left out", () => {
    const days = takingsByDay("2026-12-14", "2026-12-16", [
      { date: "2026-12-13", what: "deposit", cents: 999 },
      { date: "2026-12-15", what: "deposit", cents: 107696 },
      { date: "2026-12-15", what: "balance", cents: 323086 },
      { date: "2026-12-15", what: "refund", cents: 107696 },
      { date: "2026-12-16", what: "deposit", cents: 5000 },
      { date: "2026-12-16", what: "deposit", cents: 2500 },
    ]);
    expect(days.map((d) => d.date)).toEqual(["2026-12-14", "2026-12-15", "2026-12-16"]);
    expect(days[0]).toEqual({ date: "2026-12-14", depositsCents: 0, balancesCents: 0, refundsCents: 0, netCents: 0 });
    // 1,076.96 + 3,230.86 − 1,076.96 = 3,230.86 (by hand, integer cents)
    expect(days[1]).toMatchObject({ depositsCents: 107696, balancesCents: 323086, refundsCents: 107696, netCents: 323086 });
    expect(days[2]!.netCents).toBe(7500);
  });
});

describe("labels", () => {
  it("a day for the axis, hours to a tenth, the booked share", () => {
    expect(shortDay("2026-12-15")).toBe("Tue, Dec 15");
    expect(hoursLabel(210)).toBe("3.5 h");
    expect(hoursLabel(2400)).toBe("40 h");
    expect(hoursLabel(0)).toBe("0 h");
    // 210 / 2400 = 8.75 % → 9 % (rounded half up, common practice)
    expect(bookedShare(210, 2400)).toBe("9 %");
    expect(bookedShare(0, 0)).toBe("—");
  });
});
