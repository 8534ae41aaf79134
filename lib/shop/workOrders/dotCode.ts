/**
 * The tire's date of manufacture as the DOT code gives it: the last four characters of the tire
 * identification number, two for the week and two for the year (49 CFR 574.5, for tires made
 * from the year 2000 on; earlier tires carried three digits). Weeks are counted as ISO 8601
 * weeks (ISO 8601-1:2019 §5.2.4.2), so a year has 52 or 53 of them.
 */

/** How the field reads on the work order, for messages that name it. */
export const DOT_FIELD_LABEL = "DOT date code";

export interface DotDate {
  /** The four digits as entered, e.g. "2326". */
  code: string;
  week: number;
  year: number;
}

/** ISO 8601 weeks in a year: 53 when 1 January is a Thursday, or a Wednesday in a leap year. */
export function isoWeeksInYear(year: number): 52 | 53 {
  const jan1 = new Date(Date.UTC(year, 0, 1)).getUTCDay();
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return jan1 === 4 || (leap && jan1 === 3) ? 53 : 52;
}

/** The Monday that starts ISO week `week` of `year` (UTC midnight). */
export function isoWeekStart(year: number, week: number): Date {
  const jan4 = new Date(Date.UTC(year, 0, 4));
  const mondayOfWeek1 = jan4.getTime() - ((jan4.getUTCDay() + 6) % 7) * 86_400_000;
  return new Date(mondayOfWeek1 + (week - 1) * 7 * 86_400_000);
}

/**
 * Reads a DOT date code typed on the work order. Refused, each with a message naming the field:
 * anything but four digits, the old three-digit code, a week 00 or past the year's last week,
 * and a week that has not started yet (a tire cannot be made in the future).
 *
 * @example
 * readDotDateCode("2326", new Date("2027-01-10")); // { ok: true, value: { code: "2326", week: 23, year: 2026 } }
 * readDotDateCode("5426", new Date("2027-01-10")); // { ok: false, message: "DOT date code: 2026 has 53 weeks …" }
 */
export function readDotDateCode(text: string, now: Date = new Date()): { ok: true; value: DotDate } | { ok: false; message: string } {
  const t = String(text ?? "").replace(/\s+/g, "");
  const refuse = (why: string) => ({ ok: false as const, message: `${DOT_FIELD_LABEL}: ${why}` });
  if (t === "") return refuse("enter the last four digits of the tire's DOT code, week then year (e.g. 2326 for week 23 of 2026).");
  if (/^\d{3}$/.test(t))
    return refuse(
      `"${t}" is a three-digit code from before 2000: such a tire is far too old to fit. Enter the four digits of the tire you fitted.`,
    );
  if (!/^\d{4}$/.test(t)) return refuse(`"${t}" is not four digits: enter week then year, e.g. 2326 for week 23 of 2026.`);
  const week = Number(t.slice(0, 2));
  const year = 2000 + Number(t.slice(2));
  const weeks = isoWeeksInYear(year);
  if (week < 1 || week > weeks) return refuse(`week ${t.slice(0, 2)} does not exist: ${year} has weeks 01 to ${weeks}.`);
  if (isoWeekStart(year, week).getTime() > now.getTime())
    return refuse(`week ${week} of ${year} has not started yet: check the code on the sidewall (week then year, e.g. 2326).`);
  return { ok: true, value: { code: t, week, year } };
}
