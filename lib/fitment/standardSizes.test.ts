import { describe, expect, it } from "vitest";
import { STANDARD_FLOTATION_SIZES, STANDARD_METRIC_SIZES, STANDARD_SIZES, standardSizes } from "./standardSizes";

/** Fails naming each of `sizes` that `table` lacks. */
function expectAllIn(table: readonly { text: string }[], sizes: readonly string[]): void {
  const texts = new Set(table.map((t) => t.text));
  for (const s of sizes) expect(texts.has(s), s).toBe(true);
}

describe("standard sizes (data)", () => {
  it("contains the sizes the rest of the engine relies on", () => {
    expectAllIn(STANDARD_SIZES, [
      "205/55R16",
      "265/70R17",
      "285/70R17",
      "315/70R17",
      "275/65R20",
      "31x10.50R15LT",
      "33x12.50R15LT",
      "35x12.50R17LT",
      "37x12.50R17LT",
      "37x13.50R22LT",
      "40x13.50R24LT",
      "42x14.50R20LT",
    ]);
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

describe("standard sizes cover the usual truck rims", () => {
  const on = (system: "metric" | "flotation", rim: number) =>
    STANDARD_SIZES.filter((t) => t.system === system && t.rimDiameterIn === rim).map((t) => t.text);

  it("LT flotation sizes on 15, 16, 16.5, 17, 18, 20 and 22 in rims (common practice, from memory; not checked against the TRA Year Book)", () => {
    for (const rim of [15, 17, 18, 20, 22]) expect(on("flotation", rim).length, `${rim} in`).toBeGreaterThanOrEqual(4);
    expect(on("flotation", 16)).toContain("31x10.50R16LT");
    expect(on("flotation", 16.5)).toEqual(expect.arrayContaining(["33x12.50R16.5LT", "35x12.50R16.5LT"]));
    expect(on("flotation", 15)).toEqual(expect.arrayContaining(["27x8.50R15LT", "31x10.50R15LT", "33x12.50R15LT", "35x12.50R15LT"]));
  });

  it("the common metric LT and P sizes on those rims (common practice, no source)", () => {
    expectAllIn(STANDARD_METRIC_SIZES, [
      "215/75R15",
      "225/75R15",
      "235/75R15",
      "235/85R16",
      "245/75R16",
      "265/75R16",
      "285/75R16",
      "315/75R16",
      "245/75R17",
      "265/70R17",
      "285/70R17",
      "315/70R17",
      "315/80R17",
      "275/70R18",
      "295/70R18",
      "325/65R18",
      "275/65R20",
      "295/60R20",
      "305/55R20",
      "325/60R20",
      "285/45R22",
      "305/45R22",
      "325/50R22",
    ]);
  });
});
