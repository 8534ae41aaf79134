import { describe, expect, it } from "vitest";
import { isoWeekStart, isoWeeksInYear, readDotDateCode } from "./dotCode";

const NOW = new Date("2027-01-10T12:00:00Z");

describe("readDotDateCode (49 CFR 574.5: week then year, four digits from 2000 on)", () => {
  it("reads 2326 as week 23 of 2026", () => {
    expect(readDotDateCode("2326", NOW)).toEqual({ ok: true, value: { code: "2326", week: 23, year: 2026 } });
    expect(readDotDateCode(" 01 26 ", NOW)).toEqual({ ok: true, value: { code: "0126", week: 1, year: 2026 } });
  });

  it("refuses what it would have to guess at, naming the field", () => {
    for (const bad of ["", "23/26", "2326A", "232"]) {
      const r = readDotDateCode(bad, NOW);
      expect(r.ok, bad).toBe(false);
      if (!r.ok) expect(r.message).toMatch(/^DOT date code: /);
    }
    expect(readDotDateCode("0026", NOW)).toMatchObject({ ok: false, message: /week 00 does not exist/ });
  });

  it("knows which years have a week 53 (ISO 8601-1:2019 §5.2.4.2)", () => {
    // 2026 starts on a Thursday: 53 weeks. 2027 starts on a Friday: 52. 2020 (leap) starts on a Wednesday: 53.
    expect(isoWeeksInYear(2026)).toBe(53);
    expect(isoWeeksInYear(2027)).toBe(52);
    expect(isoWeeksInYear(2020)).toBe(53);
    expect(isoWeeksInYear(2021)).toBe(52);
    expect(readDotDateCode("5326", NOW).ok).toBe(true);
    expect(readDotDateCode("5321", NOW)).toMatchObject({ ok: false, message: /2021 has weeks 01 to 52/ });
  });

  it("refuses a week that has not started", () => {
    // ISO week 2 of 2027 starts on Monday 11 January 2027, the day after NOW.
    expect(isoWeekStart(2027, 2).toISOString().slice(0, 10)).toBe("2027-01-11");
    expect(isoWeekStart(2027, 1).toISOString().slice(0, 10)).toBe("2027-01-04");
    expect(readDotDateCode("0127", NOW).ok).toBe(true);
    expect(readDotDateCode("0227", NOW)).toMatchObject({ ok: false, message: /has not started yet/ });
  });
});
