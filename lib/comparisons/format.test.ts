import { describe, expect, it } from "vitest";
import { computeComparison } from "./compute";
import {
  DEFAULT_PREFS,
  type DisplayPrefs,
  MINUS,
  formatLen,
  formatLenOther,
  formatLoad,
  formatNumber,
  formatEnteredSpeed,
  formatPartThickness,
  formatPressure,
  formatSpeedIn,
  formatSpeedRating,
  parsePrefs,
  warningTitle,
} from "./format";
import { DEFAULT_INPUT } from "./schema";

const inch: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const frac: DisplayPrefs = { units: "imperial", lengths: "fraction" };
const metric: DisplayPrefs = { units: "metric", lengths: "decimal" };

describe("display helpers", () => {
  it("lengths: 120.65 mm = 4.75 in = 4-3/4 in (1 in = 25.4 mm exactly, NIST SP 811)", () => {
    expect(formatLen(120.65, inch)).toBe("4.75 in");
    expect(formatLen(120.65, frac)).toBe("4-3/4 in");
    expect(formatLen(120.65, metric)).toBe("121 mm");
    expect(formatLen(120.65, metric, { decimals: 1 })).toBe("120.7 mm");
    expect(formatLenOther(120.65, inch)).toBe("121 mm");
  });

  it("never writes a length that is not zero as 0 (1 in = 25.4 mm exactly, NIST SP 811)", () => {
    // 0.7 mm = 0.7 / 25.4 = 0.02756 in: under half a sixteenth (0.03125 in), so thousandths, as the garage shows it.
    expect(formatLen(0.7, frac)).toBe("0.028 in");
    expect(formatLen(-0.7, frac)).toBe(`${MINUS}0.028 in`);
    // 0.1 mm = 0.0039 in: two decimals would read 0.
    expect(formatLen(0.1, inch)).toBe("0.004 in");
    expect(formatLen(-0.1, inch)).toBe(`${MINUS}0.004 in`);
    expect(formatLen(-0.3, inch)).toBe(`${MINUS}0.01 in`); // 0.3 / 25.4 = 0.0118 in: two decimals show it
    expect(formatLen(0.4, metric)).toBe("0.4 mm");
    expect(formatLen(-0.4, metric)).toBe(`${MINUS}0.4 mm`);
    // Figures a step shows are unchanged: 0.8 mm = 0.504 sixteenth → 1/16 in; 0.7 mm = 0.03 in to two decimals.
    expect(formatLen(0.8, frac)).toBe("1/16 in");
    expect(formatLen(0.7, inch)).toBe("0.03 in");
    expect(formatLen(0, frac)).toBe("0 in");
  });

  it("signs: typographic minus, plus for gains, none for zero", () => {
    expect(formatLen(-12, metric, { signed: true })).toBe(`${MINUS}12 mm`);
    expect(formatLen(37, metric, { signed: true })).toBe("+37 mm");
    // 0.2 mm is a real figure: it shows, signed (it read "0 mm" before); under 0.05 mm it is zero, unsigned.
    expect(formatLen(0.2, metric, { signed: true })).toBe("+0.2 mm");
    expect(formatLen(0.03, metric, { signed: true })).toBe("0 mm");
    expect(formatLen(-0.03, frac, { signed: true })).toBe("0 in");
    // −12 mm = −0.472 in → nearest sixteenth −8/16 = −1/2 in.
    expect(formatLen(-12, frac, { signed: true })).toBe(`${MINUS}1/2 in`);
    expect(formatNumber(-0.001, 1)).toBe("0.0");
    expect(formatNumber(2380.13, 0)).toBe("2,380");
    expect(formatNumber(5, 1, { signed: true })).toBe("+5.0");
  });

  it("speeds in their own unit, never converted: 117.07 km/h → 117.1 km/h", () => {
    expect(formatSpeedIn(117.0653, "km/h")).toBe("117.1 km/h");
    expect(formatSpeedIn(60, "mph", 0)).toBe("60 mph");
  });

  it("cruise speeds show as entered; in the other unit converted to 0.1 with the entered figure beside (1 mi = 1.609344 km exactly, NIST SP 811)", () => {
    // The workspace stores 100 km/h as 100 / 1.609344 = 62.137 mph.
    expect(formatEnteredSpeed(100 / 1.609344, metric)).toBe("100 km/h");
    expect(formatEnteredSpeed(100 / 1.609344, inch)).toBe("62.1 mph (100 km/h)");
    // A link carries 4 decimals of mph: 62.1371 × 1.609344 = 99.99997 km/h, still 100 as typed.
    expect(formatEnteredSpeed(62.1371, metric)).toBe("100 km/h");
    expect(formatEnteredSpeed(65, inch)).toBe("65 mph");
    // 65 × 1.609344 = 104.607 km/h.
    expect(formatEnteredSpeed(65, metric)).toBe("104.6 km/h (65 mph)");
    expect(formatEnteredSpeed(62.5, inch)).toBe("62.5 mph");
    expect(formatSpeedRating(160, 160 / 1.609344, inch)).toBe("99 mph (160 km/h)");
  });

  it("part thickness as bought: a sixteenth only when exact (1 in = 25.4 mm exactly, NIST SP 811)", () => {
    expect(formatPartThickness(12.7, frac)).toBe("1/2 in (12.7 mm)");
    expect(formatPartThickness(6.35, frac)).toBe("1/4 in (6.35 mm)");
    expect(formatPartThickness(12.7, inch)).toBe("0.5 in (12.7 mm)");
    // 20 mm = 0.787 in: not 13/16 in (20.64 mm).
    expect(formatPartThickness(20, frac)).toBe("0.79 in (20 mm)");
    expect(formatPartThickness(20, metric)).toBe("20 mm");
  });

  it("loads and pressures: 1 lb = 0.45359237 kg, 1 psi = 6.894757 kPa (NIST SP 811)", () => {
    expect(formatLoad(1450, metric)).toBe("1,450 kg (3,197 lb)");
    expect(formatLoad(1450, inch)).toBe("3,197 lb (1,450 kg)");
    expect(formatPressure(50, inch)).toBe("50 psi (345 kPa)");
    expect(formatPressure(80, metric)).toBe("552 kPa (80 psi)");
  });

  it("warning titles carry their length in the reader's units", () => {
    const w = computeComparison(DEFAULT_INPUT).warnings.find((x) => x.kind === "scrub");
    if (!w) throw new Error("expected a scrub warning");
    expect(warningTitle(w, metric)).toBe("Scrub radius grows by 37 mm");
    // 37 mm = 1.457 in → 1.46 in; sixteenths: 23.3/16 → 1-7/16 in.
    expect(warningTitle(w, inch)).toBe("Scrub radius grows by 1.46 in");
    expect(warningTitle(w, frac)).toBe("Scrub radius grows by 1-7/16 in");
  });

  it("reads stored preferences tolerantly", () => {
    expect(parsePrefs(null)).toEqual(DEFAULT_PREFS);
    expect(parsePrefs("{bad json")).toEqual(DEFAULT_PREFS);
    expect(parsePrefs('{"units":"metric","lengths":"fraction"}')).toEqual({ units: "metric", lengths: "fraction" });
    expect(parsePrefs('{"units":"furlongs"}')).toEqual(DEFAULT_PREFS);
  });
});
