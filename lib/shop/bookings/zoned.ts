/**
 * Wall-clock time in the shop's time zone, with the platform's Intl (its IANA time zone data),
 * no date library. Instants are UTC milliseconds; a shop's day is a "YYYY-MM-DD" string and a
 * time of day is minutes after local midnight. Pure: safe on the server and in the browser.
 */

const formats = new Map<string, Intl.DateTimeFormat>();

function partsFormat(timeZone: string): Intl.DateTimeFormat {
  let f = formats.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
    });
    formats.set(timeZone, f);
  }
  return f;
}

/**
 * True when the platform knows the zone by this IANA name.
 *
 * @example
 * isTimeZone("America/Denver"); // true
 * isTimeZone("Mountain"); // false
 */
export function isTimeZone(timeZone: string): boolean {
  if (!/^[A-Za-z_]+(\/[A-Za-z0-9_+-]+)*$/.test(timeZone)) return false;
  try {
    partsFormat(timeZone);
    return true;
  } catch {
    return false;
  }
}

interface Parts {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

function partsAt(instant: number, timeZone: string): Parts {
  const out: Record<string, number> = {};
  for (const p of partsFormat(timeZone).formatToParts(new Date(instant))) if (p.type !== "literal") out[p.type] = Number(p.value);
  return { year: out.year!, month: out.month!, day: out.day!, hour: out.hour! % 24, minute: out.minute!, second: out.second! };
}

/** Local time minus UTC at that instant, in milliseconds (−7 h = −25 200 000 for MST). */
function offsetAt(instant: number, timeZone: string): number {
  const whole = Math.floor(instant / 1000) * 1000;
  const p = partsAt(whole, timeZone);
  return Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second) - whole;
}

const pad = (n: number, w = 2) => String(n).padStart(w, "0");
const dateOf = (y: number, m: number, d: number) => `${pad(y, 4)}-${pad(m)}-${pad(d)}`;

/** ISO 8601 weekday of a calendar date: 1 = Monday … 7 = Sunday. */
export function weekdayOf(date: string): number {
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  const w = new Date(Date.UTC(y, m - 1, d)).getUTCDay();
  return w === 0 ? 7 : w;
}

/**
 * The calendar date `days` after `date` (negative goes back).
 *
 * @example
 * addDays("2027-02-28", 1); // "2027-03-01"
 */
export function addDays(date: string, days: number): string {
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  const t = new Date(Date.UTC(y, m - 1, d + days));
  return dateOf(t.getUTCFullYear(), t.getUTCMonth() + 1, t.getUTCDate());
}

export interface WallTime {
  /** "YYYY-MM-DD" in the zone. */
  date: string;
  /** Minutes after local midnight. */
  minute: number;
  /** ISO weekday, 1 = Monday. */
  weekday: number;
}

/**
 * Where an instant falls on the shop's wall clock.
 *
 * @example
 * wallTime(Date.UTC(2027, 2, 14, 15, 0), "America/Denver"); // { date: "2027-03-14", minute: 540, weekday: 7 } (9:00 MDT)
 */
export function wallTime(instant: Date | number, timeZone: string): WallTime {
  const p = partsAt(typeof instant === "number" ? instant : instant.getTime(), timeZone);
  const date = dateOf(p.year, p.month, p.day);
  return { date, minute: p.hour * 60 + p.minute, weekday: weekdayOf(date) };
}

/**
 * The instant a wall-clock time of a day has in the zone. `minute` may be 1440 (the next
 * midnight). A time the clocks skip (spring forward) resolves to the later side, as the
 * clock reads after the jump; a time that happens twice (fall back) to the first of the two.
 *
 * @example
 * zonedInstant("2027-03-13", 480, "America/Denver").toISOString(); // "2027-03-13T15:00:00.000Z" (MST, UTC−7)
 * zonedInstant("2027-03-14", 480, "America/Denver").toISOString(); // "2027-03-14T14:00:00.000Z" (MDT, UTC−6)
 */
export function zonedInstant(date: string, minute: number, timeZone: string): Date {
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  const naive = Date.UTC(y, m - 1, d, 0, minute);
  const first = naive - offsetAt(naive, timeZone);
  const o1 = offsetAt(first, timeZone);
  if (naive - first === o1) return new Date(first);
  const second = naive - o1;
  if (offsetAt(second, timeZone) === o1) return new Date(second);
  // Neither reading holds: the wall time is in the skipped hour.
  return new Date(Math.max(first, second));
}

/** "Sunday, March 14, 2027" for a calendar date (no time zone involved); "short": "Sun, Mar 14". */
export function formatDay(date: string, style: "long" | "short" = "long"): string {
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  return new Date(Date.UTC(y, m - 1, d, 12)).toLocaleDateString(
    "en-US",
    style === "long"
      ? { timeZone: "UTC", weekday: "long", year: "numeric", month: "long", day: "numeric" }
      : { timeZone: "UTC", weekday: "short", month: "short", day: "numeric" },
  );
}

/**
 * The shop's calendar day an instant falls on, as formatDay writes it: a quote valid until
 * 03:30 UTC on Dec 4 is valid until Dec 3 in Denver.
 *
 * @example
 * formatDayOf("2026-12-04T03:30:00Z", "America/Denver"); // "Thursday, December 3, 2026" (MST, UTC−7)
 */
export function formatDayOf(instant: Date | string, timeZone: string, style: "long" | "short" = "long"): string {
  return formatDay(wallTime(new Date(instant), timeZone).date, style);
}

/** "8:00 AM" for minutes after midnight. */
export function formatMinute(minute: number): string {
  const h = Math.floor(minute / 60) % 24;
  const m = minute % 60;
  return `${h % 12 === 0 ? 12 : h % 12}:${pad(m)} ${h < 12 ? "AM" : "PM"}`;
}

/** "08:00" for minutes after midnight (what a time input holds). */
export function minuteToHhmm(minute: number): string {
  return minute >= 1440 ? "24:00" : `${pad(Math.floor(minute / 60))}:${pad(minute % 60)}`;
}

/** Minutes after midnight from "HH:MM" ("24:00" allowed as the day's end), or null. */
export function hhmmToMinute(text: string): number | null {
  const m = /^(\d{1,2}):(\d{2})$/.exec(text.trim());
  if (!m) return null;
  const h = Number(m[1]);
  const min = Number(m[2]);
  if (min > 59 || h > 24 || (h === 24 && min !== 0)) return null;
  return h * 60 + min;
}

/** "Tue, Mar 16, 2027, 9:00 AM MDT": an instant as the shop's clock shows it. */
export function formatInstant(instant: Date | string, timeZone: string): string {
  return new Date(instant).toLocaleString("en-US", {
    timeZone,
    weekday: "short",
    month: "short",
    day: "numeric",
    year: "numeric",
    hour: "numeric",
    minute: "2-digit",
    timeZoneName: "short",
  });
}

/** "9:00 AM" in the zone. */
export function formatClock(instant: Date | string, timeZone: string): string {
  return new Date(instant).toLocaleTimeString("en-US", { timeZone, hour: "numeric", minute: "2-digit" });
}

/** "2 h 30 min", "45 min". */
export function formatDuration(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = Math.round(minutes % 60);
  return [h ? `${h} h` : "", m || !h ? `${m} min` : ""].filter(Boolean).join(" ");
}
