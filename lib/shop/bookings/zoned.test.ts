import { describe, expect, it } from "vitest";
import { addDays, formatDayOf, formatDuration, hhmmToMinute, isTimeZone, minuteToHhmm, wallTime, weekdayOf, zonedInstant } from "./zoned";

/*
 * US daylight saving time: from 2:00 a.m. on the second Sunday of March to 2:00 a.m. on the first
 * Sunday of November (Energy Policy Act of 2005 §110, 15 U.S.C. §260a) — in 2027 March 14 and
 * November 7. Mountain time is UTC−7 standard and UTC−6 daylight (49 CFR §71.9). The IANA zone
 * America/Denver follows both.
 */
const DENVER = "America/Denver";

describe("wall-clock time in the shop's zone (Intl, IANA data)", () => {
  it("an 8:00 opening is 15:00 UTC on the Saturday before the change and 14:00 UTC on the Sunday of it", () => {
    expect(zonedInstant("2027-03-13", 8 * 60, DENVER).toISOString()).toBe("2027-03-13T15:00:00.000Z");
    expect(zonedInstant("2027-03-14", 8 * 60, DENVER).toISOString()).toBe("2027-03-14T14:00:00.000Z");
    expect(zonedInstant("2027-11-07", 8 * 60, DENVER).toISOString()).toBe("2027-11-07T15:00:00.000Z");
  });

  it("02:30 on 2027-03-14 does not exist in Denver: it reads as 03:30 MDT, the clock after the jump", () => {
    const t = zonedInstant("2027-03-14", 150, DENVER);
    expect(t.toISOString()).toBe("2027-03-14T09:30:00.000Z");
    expect(wallTime(t, DENVER).minute).toBe(3 * 60 + 30);
  });

  it("01:30 on 2027-11-07 happens twice in Denver: the first (MDT, 07:30 UTC) is taken", () => {
    expect(zonedInstant("2027-11-07", 90, DENVER).toISOString()).toBe("2027-11-07T07:30:00.000Z");
  });

  it("midnight to midnight is 23 hours on the spring day and 25 on the autumn day", () => {
    const hours = (d: string) => (zonedInstant(d, 1440, DENVER).getTime() - zonedInstant(d, 0, DENVER).getTime()) / 3_600_000;
    expect(hours("2027-03-14")).toBe(23);
    expect(hours("2027-11-07")).toBe(25);
    expect(hours("2027-03-15")).toBe(24);
  });

  it("reads an instant back to the date, minute and ISO weekday in the zone (the UTC date may differ)", () => {
    // 2027-03-16T02:00Z is the evening of Monday the 15th in Denver (20:00 MDT).
    expect(wallTime(new Date("2027-03-16T02:00:00Z"), DENVER)).toEqual({ date: "2027-03-15", minute: 20 * 60, weekday: 1 });
    expect(weekdayOf("2027-03-14")).toBe(7); // a Sunday (ISO 8601: Monday = 1 … Sunday = 7)
    expect(addDays("2027-02-28", 1)).toBe("2027-03-01");
    expect(addDays("2028-02-28", 1)).toBe("2028-02-29"); // 2028 is a leap year (Gregorian rule)
  });

  it("knows IANA names and refuses others", () => {
    expect(isTimeZone("America/Denver")).toBe(true);
    expect(isTimeZone("Europe/Berlin")).toBe(true);
    expect(isTimeZone("Mountain Time")).toBe(false);
    expect(isTimeZone("Mars/Olympus_Mons")).toBe(false);
  });

  it("reads and writes times of day as a time input holds them", () => {
    expect(hhmmToMinute("08:30")).toBe(510);
    expect(hhmmToMinute("24:00")).toBe(1440);
    expect(hhmmToMinute("24:30")).toBeNull();
    expect(hhmmToMinute("8.30")).toBeNull();
    expect(minuteToHhmm(1020)).toBe("17:00");
    expect(formatDuration(150)).toBe("2 h 30 min");
    expect(formatDuration(45)).toBe("45 min");
    expect(formatDuration(120)).toBe("2 h");
  });
});

describe("the shop's day of an instant", () => {
  it("is the day on the shop's clock, not UTC's: 03:30 UTC on Dec 4 is 8:30 PM on Dec 3 in Denver (MST, UTC−7, 49 CFR §71.9)", () => {
    expect(formatDayOf("2026-12-04T03:30:00Z", DENVER)).toBe("Thursday, December 3, 2026");
    expect(formatDayOf("2026-12-04T03:30:00Z", "UTC")).toBe("Friday, December 4, 2026");
    expect(formatDayOf(new Date("2026-12-04T03:30:00Z"), DENVER, "short")).toBe("Thu, Dec 3");
  });
  it("follows daylight time: 05:30 UTC on Jul 5 2027 is 11:30 PM on Jul 4 in Denver (MDT, UTC−6), Jul 5 at 06:30 UTC", () => {
    expect(formatDayOf("2027-07-05T05:30:00Z", DENVER)).toBe("Sunday, July 4, 2027");
    expect(formatDayOf("2027-07-05T06:30:00Z", DENVER)).toBe("Monday, July 5, 2027");
  });
});
