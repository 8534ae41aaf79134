import { describe, expect, it } from "vitest";
import type { DisplayPrefs } from "./format";
import { type MeasureSpec, convertEntry, readMeasure, typed } from "./measureEntry";

const IMPERIAL: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const METRIC: DisplayPrefs = { units: "metric", lengths: "decimal" };
const PRESSURE: MeasureSpec = { quantity: "pressure", min: 100, max: 1500, example: { imperial: "35", metric: "240" } };
const LOAD: MeasureSpec = { quantity: "load", min: 100, max: 20000, example: { imperial: "3100", metric: "1400" } };
const LENGTH: MeasureSpec = { quantity: "length", min: 1, max: 3000, example: { imperial: "24", metric: "600" } };

describe("readMeasure", () => {
  it("reads a bare number in the field's unit (1 psi = 6.894757 kPa, 1 lb = 0.45359237 kg: NIST SP 811)", () => {
    expect(readMeasure(typed("35"), PRESSURE, IMPERIAL, "P (psi)")).toEqual({ value: expect.closeTo(241.3165, 3) });
    expect(readMeasure(typed("3100 lb"), LOAD, IMPERIAL, "L (lb)")).toEqual({ value: expect.closeTo(1406.1363, 3) });
    expect(readMeasure(typed("24-1/2"), LENGTH, IMPERIAL, "H (in)")).toEqual({ value: 622.3 });
  });
  it("refuses another unit than the label's, with the conversion (1 bar = 100 kPa exactly)", () => {
    expect(readMeasure(typed("2.4 bar"), PRESSURE, METRIC, "Placard pressure, front (kPa)")).toEqual({
      error: "Placard pressure, front (kPa): the field is in kPa; “2.4 bar” is 240 kPa — enter that, or switch the units.",
    });
    expect(readMeasure(typed("1400 kg"), LOAD, IMPERIAL, "Front axle load (lb)")).toEqual({
      error: "Front axle load (lb): the field is in lb; “1400 kg” is 3086 lb — enter that, or switch the units.",
    });
  });
  it("refuses ranges, decimal commas and figures out of bounds, naming the field", () => {
    expect(readMeasure(typed("30-35"), PRESSURE, IMPERIAL, "P (psi)")).toEqual({
      error: "P (psi): enter one pressure in psi as a plain number, e.g. 35.",
    });
    expect(readMeasure(typed("2,4"), PRESSURE, METRIC, "P (kPa)")).toHaveProperty("error");
    // A bar figure typed in a kPa field is far below any cold tire pressure.
    expect(readMeasure(typed("2.4"), PRESSURE, METRIC, "P (kPa)")).toEqual({
      error: "P (kPa): must be between 100 and 1500 kPa, e.g. 240.",
    });
    expect(readMeasure(typed("1-1/2"), LENGTH, METRIC, "H (mm)")).toHaveProperty("error");
  });
});

describe("readMeasure: a comma is refused and named as the reason", () => {
  // Decimal comma or thousands separator? Never guessed (common practice, no source).
  const why = "is ambiguous — a comma can mark decimals or thousands; write decimals with a point and no thousands separator";
  it("in a pressure, a load and a length field, with an example in the field's unit", () => {
    expect(readMeasure(typed("32,5 psi"), PRESSURE, IMPERIAL, "Placard pressure, front (psi)")).toEqual({
      error: `Placard pressure, front (psi): “32,5 psi” ${why} (e.g. 35 psi).`,
    });
    expect(readMeasure(typed("2,2 bar"), PRESSURE, METRIC, "Placard pressure, front (kPa)")).toEqual({
      error: `Placard pressure, front (kPa): “2,2 bar” ${why} (e.g. 240 kPa).`,
    });
    expect(readMeasure(typed("3,900 lb"), LOAD, IMPERIAL, "Front axle load (lb)")).toEqual({
      error: `Front axle load (lb): “3,900 lb” ${why} (e.g. 3100 lb).`,
    });
    expect(readMeasure(typed("1,5"), LENGTH, IMPERIAL, "H (in)")).toEqual({ error: `H (in): “1,5” ${why} (e.g. 24).` });
  });
});

describe("convertEntry", () => {
  it("converts a typed figure and gives it back exactly when switched back", () => {
    const kpa = convertEntry(typed("35"), "pressure", IMPERIAL, METRIC);
    expect(kpa.entry.text).toBe("241");
    expect(readMeasure(kpa.entry, PRESSURE, METRIC, "P")).toEqual({ value: expect.closeTo(241.3165, 3) });
    expect(convertEntry(kpa.entry, "pressure", METRIC, IMPERIAL).entry.text).toBe("35");
    expect(convertEntry(typed("24"), "length", IMPERIAL, METRIC).entry.text).toBe("609.6");
  });
  it("keeps text that does not read, and says so when the unit changed", () => {
    expect(convertEntry(typed("about 35"), "pressure", IMPERIAL, METRIC)).toEqual({ entry: typed("about 35"), unconverted: true });
    expect(convertEntry(typed(""), "pressure", IMPERIAL, METRIC).unconverted).toBe(false);
  });
});
