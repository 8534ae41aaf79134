import { describe, expect, it } from "vitest";
import {
  approvedRimWidthRangeIn,
  formatNominalInchSize,
  measuringRimWidthIn,
  nominalSize,
  sectionWidthOnRimMm,
  tireDimensions,
} from "./dimensions";
import { FitmentInputError, TireSizeError } from "./errors";
import { parseTireSize } from "./tireSize";

describe("tireDimensions", () => {
  it("D = d + 2H worked examples (ISO 4000-1 / ETRTO / UN R30)", () => {
    expect(tireDimensions("205/55R16").overallDiameterMm).toBeCloseTo(631.9, 9);
    expect(tireDimensions("265/70R17").overallDiameterMm).toBeCloseTo(802.8, 9);
    expect(tireDimensions("315/70R17").overallDiameterMm).toBeCloseTo(872.8, 9);
    expect(tireDimensions("265/70R17").sidewallMm).toBeCloseTo(185.5, 9);
  });

  it("section width moves K = 0.4 × the rim width change (UN R30 §6.1.1.1)", () => {
    const t = parseTireSize("265/70R17");
    const a = tireDimensions(t, { rimWidthIn: 7 }).sectionWidthMm;
    const b = tireDimensions(t, { rimWidthIn: 9 }).sectionWidthMm;
    expect(b - a).toBeCloseTo(0.4 * 2 * 25.4, 9); // 20.32 mm for 2 in of rim
    expect(sectionWidthOnRimMm(t, 8.5) - sectionWidthOnRimMm(t, 8)).toBeCloseTo(0.4 * 12.7, 9);
  });

  it("on the measuring rim the section width is the nominal width (engine convention)", () => {
    const d = tireDimensions("265/70R17");
    expect(d.measuringRimWidthIn).toBe(8);
    expect(d.sectionWidthMm).toBe(265);
    expect(d.rimWidthIn).toBe(8);
  });

  it("measuring rims: S × x to the nearest 0.5 in (factor x from memory, R30/ETRTO series)", () => {
    expect(measuringRimWidthIn(parseTireSize("205/55R16"))).toBe(6.5); // 205 × 0.80 = 164 mm = 6.46 in
    expect(measuringRimWidthIn(parseTireSize("265/70R17"))).toBe(8); // 265 × 0.75 = 198.75 mm = 7.82 in
    expect(measuringRimWidthIn(parseTireSize("255/35R20"))).toBe(9); // 255 × 0.90 = 229.5 mm = 9.04 in
    expect(measuringRimWidthIn(parseTireSize("235/85R16"))).toBe(6.5); // 235 × 0.70 = 164.5 mm = 6.48 in
  });

  it("flotation measuring rims 0.8 × section (from memory: 10.50 → 8.5, 12.50 → 10, 13.50 → 11)", () => {
    expect(measuringRimWidthIn(parseTireSize("31x10.50R15LT"))).toBe(8.5);
    expect(measuringRimWidthIn(parseTireSize("37x12.50R17LT"))).toBe(10);
    expect(measuringRimWidthIn(parseTireSize("37x13.50R20LT"))).toBe(11);
  });

  it("approved rim range is the measuring rim ± 1 in (common practice, no source)", () => {
    expect(approvedRimWidthRangeIn(parseTireSize("265/70R17"))).toEqual({ min: 7, max: 9 });
  });

  it("circumference and revolutions: 1 mile = 1 609 344 mm exactly (NIST SP 811)", () => {
    const d = tireDimensions("37x12.50R17LT");
    expect(d.circumferenceMm).toBeCloseTo(Math.PI * 939.8, 9);
    expect(d.revsPerMile).toBeCloseTo(1_609_344 / (Math.PI * 939.8), 9); // ≈ 545.1
    expect(d.revsPerMile).toBeCloseTo(545.1, 1);
    expect(d.revsPerKm * 1.609344).toBeCloseTo(d.revsPerMile, 9);
  });

  it("invalid rim widths and sizes throw typed errors", () => {
    expect(() => tireDimensions("265/70R17", { rimWidthIn: 0 })).toThrow(FitmentInputError);
    expect(() => tireDimensions("265/70R17", { rimWidthIn: 0 })).toThrow(/rimWidthIn/);
    expect(() => tireDimensions("265/70R17", { rimWidthIn: Number.NaN })).toThrow(/finite/);
    expect(() => tireDimensions("bogus")).toThrow(TireSizeError);
  });
});

describe("nominalSize and formatNominalInchSize", () => {
  it("285/75R16 = 32.83 × 11.22 in (ISO 4000-1 / ETRTO design formula: 16 × 25.4 + 2 × 285 × 0.75 = 833.9 mm)", () => {
    const n = nominalSize("285/75R16");
    expect(n.sidewallMm).toBeCloseTo(213.75, 9); // H = 285 × 75 / 100
    expect(n.overallDiameterMm).toBeCloseTo(833.9, 9); // 406.4 + 427.5
    expect(n.overallDiameterIn).toBeCloseTo(32.83, 2); // 833.9 / 25.4 = 32.8307 (NIST SP 811 inch)
    expect(n.sectionWidthMm).toBe(285);
    expect(n.sectionWidthIn).toBeCloseTo(11.22, 2); // 285 / 25.4 = 11.2205
    expect(n.rimDiameterIn).toBe(16);
    expect(formatNominalInchSize("285/75R16")).toBe("32.8 × 11.2 in on 16 in");
  });

  it("315/70R17 = 34.36 in tall (ISO 4000-1: 431.8 + 2 × 315 × 0.70 = 872.8 mm)", () => {
    const n = nominalSize("LT315/70R17 121/118Q");
    expect(n.overallDiameterMm).toBeCloseTo(872.8, 9);
    expect(n.overallDiameterIn).toBeCloseTo(34.36, 2); // 872.8 / 25.4 = 34.362
    expect(n.sectionWidthIn).toBeCloseTo(12.4, 2); // 315 / 25.4 = 12.402
    expect(formatNominalInchSize("LT315/70R17 121/118Q")).toBe("34.4 × 12.4 in on 17 in");
  });

  it("flotation sizes state their nominal size (TRA): 37x12.50R17LT is 939.8 × 317.5 mm, sidewall (37 − 17)/2 in", () => {
    const n = nominalSize("37x12.50R17LT");
    expect(n.overallDiameterMm).toBeCloseTo(939.8, 9); // 37 × 25.4
    expect(n.sectionWidthMm).toBeCloseTo(317.5, 9); // 12.5 × 25.4
    expect(n.sidewallMm).toBeCloseTo(254, 9); // 10 in
    expect(n.overallDiameterIn).toBeCloseTo(37, 9);
    expect(n.sectionWidthIn).toBeCloseTo(12.5, 9);
    expect(formatNominalInchSize("37x12.50R17LT")).toBe("37.0 × 12.5 in on 17 in");
    expect(formatNominalInchSize("33x12.50R16.5LT")).toBe("33.0 × 12.5 in on 16.5 in");
  });

  it("decimals are chosen by the caller and checked", () => {
    expect(formatNominalInchSize("285/75R16", { decimals: 2 })).toBe("32.83 × 11.22 in on 16 in");
    // 315/80R17: 431.8 + 504 = 935.8 mm = 36.84 in; 315 mm = 12.40 in (ISO 4000-1 / ETRTO; NIST SP 811 inch).
    expect(formatNominalInchSize("315/80R17", { rim: false })).toBe("36.8 × 12.4 in");
    expect(() => formatNominalInchSize("285/75R16", { decimals: 7 })).toThrow(FitmentInputError);
    expect(() => nominalSize("bogus")).toThrow(TireSizeError);
  });
});
