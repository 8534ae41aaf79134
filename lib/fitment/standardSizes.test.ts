import { describe, expect, it } from "vitest";
import { STANDARD_FLOTATION_SIZES, STANDARD_METRIC_SIZES, STANDARD_SIZES, standardSizes } from "./standardSizes";

describe("standard sizes (data)", () => {
  it("contains the sizes the rest of the engine relies on", () => {
    const texts = new Set(STANDARD_SIZES.map((t) => t.text));
    for (const s of ["205/55R16", "265/70R17", "285/70R17", "315/70R17", "275/65R20", "31x10.50R15LT", "33x12.50R15LT", "35x12.50R17LT", "37x12.50R17LT", "37x13.50R22LT", "40x13.50R24LT", "42x14.50R20LT"]) {
      expect(texts.has(s)).toBe(true);
    }
  });
  it("metric series: widths 175–375 ending in 5, aspect 30–85 in steps of 5, rims 14–24 (rule of the data)", () => {
    for (const t of STANDARD_METRIC_SIZES) {
      expect(t.sectionWidthMm % 10).toBe(5);
      expect(t.sectionWidthMm).toBeGreaterThanOrEqual(175);
      expect(t.sectionWidthMm).toBeLessThanOrEqual(375);
      expect(t.aspectRatio % 5).toBe(0);
      expect(t.rimDiameterIn).toBeGreaterThanOrEqual(14);
      expect(t.rimDiameterIn).toBeLessThanOrEqual(24);
    }
    expect(STANDARD_METRIC_SIZES.length).toBeGreaterThan(500);
  });
  it("no duplicates, flotation all LT", () => {
    expect(new Set(STANDARD_SIZES.map((t) => t.text)).size).toBe(STANDARD_SIZES.length);
    expect(STANDARD_FLOTATION_SIZES.every((t) => t.service === "LT" && t.system === "flotation")).toBe(true);
    expect(standardSizes("flotation")).toBe(STANDARD_FLOTATION_SIZES);
  });
});
