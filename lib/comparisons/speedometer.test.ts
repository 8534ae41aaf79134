import { describe, expect, it } from "vitest";
import { HEADLINE_SPEED, REFERENCE_SPEEDS, enteredSpeed, speedometerPercents, speedometerSentence, toMph } from "./speedometer";

describe("reference speeds", () => {
  it("are whole figures of their own unit, the headline among them", () => {
    for (const system of ["imperial", "metric"] as const) {
      for (const v of REFERENCE_SPEEDS[system]) expect(Number.isInteger(v)).toBe(true);
      expect(REFERENCE_SPEEDS[system]).toContain(HEADLINE_SPEED[system]);
    }
    expect(REFERENCE_SPEEDS.metric).toEqual(expect.arrayContaining([30, 50, 80, 100, 120]));
  });

  it("reach the engine in mph: 100 km/h = 62.137 mph (1 mi = 1.609344 km exactly, NIST SP 811)", () => {
    expect(toMph(100, "metric")).toBeCloseTo(62.137119, 6);
    expect(toMph(60, "imperial")).toBe(60);
  });
});

describe("speedometer statement", () => {
  it("names both percentages of one ratio (speed ∝ rolling circumference; handbook, from memory)", () => {
    // r = 939.8 / 802.8: actual 17.07 % above indicated; speedometer shows 1/r = 85.42 % of actual, 14.58 % low.
    expect(speedometerPercents(939.8 / 802.8).trueAbovePct).toBeCloseTo(17.065, 3);
    expect(speedometerPercents(939.8 / 802.8).readsLowPct).toBeCloseTo(14.578, 3);
    expect(speedometerSentence(939.8 / 802.8)).toBe("Actual speed is 17.1 % above the speedometer; the speedometer reads 14.6 % low.");
    // A tire 10 % smaller (r = 0.9): actual 10 % below; the speedometer shows 1/0.9 = 111.1 % of actual, 11.1 % high.
    expect(speedometerSentence(0.9)).toBe("Actual speed is 10.0 % below the speedometer; the speedometer reads 11.1 % high.");
    expect(speedometerSentence(1)).toBe("Actual speed matches the speedometer (within 0.1 %).");
    expect(speedometerSentence(1.0004)).toBe("Actual speed matches the speedometer (within 0.1 %).");
  });
});

describe("cruise speeds as entered", () => {
  it("tells mph entries from km/h entries stored as km/h ÷ 1.609344", () => {
    expect(enteredSpeed(60.3)).toEqual({ value: 60.3, unit: "mph" });
    expect(enteredSpeed(100.5 / 1.609344)).toEqual({ value: 100.5, unit: "km/h" });
    expect(enteredSpeed(90 / 1.609344)).toEqual({ value: 90, unit: "km/h" });
    // Neither a tenth of an mph nor of a km/h (62.13 mph = 99.990 km/h): shown as the mph it is.
    expect(enteredSpeed(62.13)).toEqual({ value: 62.13, unit: "mph" });
  });
});
