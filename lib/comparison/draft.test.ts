import { describe, expect, it } from "vitest";
import type { DisplayPrefs } from "./format";
import { type Draft, draftFromInput, followTire, readDraft } from "./draft";
import { DEFAULT_INPUT } from "./schema";

const inch: DisplayPrefs = { units: "imperial", lengths: "decimal" };
const frac: DisplayPrefs = { units: "imperial", lengths: "fraction" };
const metric: DisplayPrefs = { units: "metric", lengths: "decimal" };
const base = (): Draft => draftFromInput(DEFAULT_INPUT, inch);

describe("form text ⇄ comparison input", () => {
  it("the demo's text reads back to the demo", () => {
    expect(readDraft(base(), inch)).toEqual({ input: DEFAULT_INPUT, errors: {} });
    expect(readDraft(draftFromInput(DEFAULT_INPUT, metric), metric).input).toEqual(DEFAULT_INPUT);
  });

  it("backspacing with fractions through the engine's parseLength: 4-3/4, 4 3/4 in, 4.75\" and 120.65 mm are the same", () => {
    for (const text of ["4-3/4", "4 3/4 in", '4.75"', "120.65 mm"]) {
      const d = base();
      d.planned = { ...d.planned, mode: "backspacing", backspacing: text, reference: "flange", flange: "1/2" };
      const got = readDraft(d, inch).input?.planned.position;
      expect(got).toEqual({ mode: "backspacing", backspacingIn: 4.75, reference: "flange", flangeIn: 0.5 });
    }
  });

  it("shows backspacing as sixteenths when fractions are chosen", () => {
    const x = { ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, position: { mode: "backspacing" as const, backspacingIn: 4.8125, reference: "bead-seat" as const, flangeIn: 0.5 } } };
    expect(draftFromInput(x, frac).planned).toMatchObject({ backspacing: "4-13/16", flange: "1/2", reference: "bead-seat" });
    expect(draftFromInput(x, inch).planned).toMatchObject({ backspacing: "4.8125", flange: "0.5" });
  });

  it("names each unreadable field with an example", () => {
    const d = base();
    d.planned = { ...d.planned, width: "wide", offset: "minus twelve", tire: "37x12" };
    d.vehicle = { ...d.vehicle, axle: "fast", cruise: "", fender: "far" };
    const { input, errors } = readDraft(d, inch);
    expect(input).toBeNull();
    expect(errors["planned.wheelWidthIn"]).toBe("Enter the wheel width in inches, like 9 or 8-1/2.");
    expect(errors["planned.position.offsetMm"]).toMatch(/like -12 or 25/);
    expect(errors["planned.tire"]).toMatch(/accepted forms/);
    expect(errors["vehicle.axleRatio"]).toMatch(/3\.73/);
    expect(errors["vehicle.cruiseSpeedsMph"]).toMatch(/60, 70/);
    expect(errors["vehicle.fenderLineMm"]).toMatch(/5-1\/2/);
    expect(Object.keys(errors).filter((k) => k.startsWith("current"))).toEqual([]);
  });

  it("passes the schema's messages on (wheel diameter vs tire)", () => {
    const d = base();
    d.planned = { ...d.planned, diameter: "18" };
    expect(readDraft(d, inch).errors).toEqual({ "planned.wheelDiameterIn": "A 17 in tire needs a 17 in wheel; this wheel is 18 in." });
  });

  it("metric units: cruise speeds in km/h (1 mi = 1.609344 km) and the fender line in mm", () => {
    const d = draftFromInput(DEFAULT_INPUT, metric);
    expect(d.vehicle.cruise).toBe("97, 113");
    d.vehicle = { ...d.vehicle, cruise: "100, 110", fender: "150" };
    const v = readDraft(d, metric).input?.vehicle;
    expect(v?.cruiseSpeedsMph[0]).toBeCloseTo(100 / 1.609344, 5);
    expect(v?.fenderLineMm).toBe(150);
    const i = base();
    i.vehicle = { ...i.vehicle, fender: "5-1/2" };
    expect(readDraft(i, inch).input?.vehicle.fenderLineMm).toBeCloseTo(139.7, 9);
  });

  it("accepts a typographic minus, 3.73:1, 8° and an empty spacer", () => {
    const d = base();
    d.planned = { ...d.planned, offset: "\u221212", spacer: "" };
    d.vehicle = { ...d.vehicle, axle: "4.10:1", kpi: "8°" };
    const x = readDraft(d, inch).input;
    expect(x?.planned.position).toEqual({ mode: "offset", offsetMm: -12 });
    expect(x?.vehicle.axleRatio).toBe(4.1);
    expect(x?.vehicle.kingpinInclinationDeg).toBe(8);
    expect(x?.planned.spacerMm).toBe(0);
  });

  it("the wheel diameter follows the tire while it matched the old one", () => {
    const d = base().planned;
    expect(followTire(d, "35x12.50R15LT").diameter).toBe("15");
    expect(followTire({ ...d, diameter: "18" }, "35x12.50R15LT").diameter).toBe("18");
    expect(followTire(d, "35x12.50R1").diameter).toBe("17");
  });
});

describe("switching units keeps the exact values", () => {
  it("60 and 70 mph shown as 97 and 113 km/h still read back as 60 and 70 mph while untouched", () => {
    const d = draftFromInput(DEFAULT_INPUT, metric);
    expect(readDraft(d, metric).input?.vehicle.cruiseSpeedsMph).toEqual([60, 70]);
    d.vehicle = { ...d.vehicle, cruise: "97, 114" };
    expect(readDraft(d, metric).input?.vehicle.cruiseSpeedsMph[1]).toBeCloseTo(114 / 1.609344, 5);
  });
});
