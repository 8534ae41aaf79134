import { describe, expect, it } from "vitest";
import type { DisplayPrefs } from "./format";
import { type Draft, draftFromInput, followTire } from "./draft";
import { readDraft } from "./readDraft";
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
    const x = {
      ...DEFAULT_INPUT,
      planned: {
        ...DEFAULT_INPUT.planned,
        position: { mode: "backspacing" as const, backspacingIn: 4.8125, reference: "bead-seat" as const, flangeIn: 0.5 },
      },
    };
    expect(draftFromInput(x, frac).planned).toMatchObject({ backspacing: "4-13/16", flange: "1/2", reference: "bead-seat" });
    expect(draftFromInput(x, inch).planned).toMatchObject({ backspacing: "4.8125", flange: "0.5" });
  });

  it("names each unreadable field with an example", () => {
    const d = base();
    d.planned = { ...d.planned, width: "wide", offset: "minus twelve", tire: "37x12" };
    d.vehicle = { ...d.vehicle, axle: "fast", cruise: "", fender: "far" };
    const { input, errors } = readDraft(d, inch);
    expect(input).toBeNull();
    expect(errors["planned.wheelWidthIn"]).toBe("Wheel width (in): not a length in inches, e.g. 9 or 8-1/2.");
    expect(errors["planned.position.offsetMm"]).toMatch(/^Offset \(mm\): .*e\.g\. -12 or 25/);
    expect(errors["planned.tire"]).toMatch(/accepted forms/);
    expect(errors["vehicle.axleRatio"]).toMatch(/3\.73/);
    expect(errors["vehicle.cruiseSpeedsMph"]).toMatch(/60, 70/);
    expect(errors["vehicle.fenderLineMm"]).toMatch(/5-1\/2/);
    expect(Object.keys(errors).filter((k) => k.startsWith("current"))).toEqual([]);
  });

  it("names the tire field once, with the likely size for three numbers between slashes (the workspace's planned tire)", () => {
    const d = base();
    d.planned = { ...d.planned, tire: "285/70/17" };
    const message = readDraft(d, inch).errors["planned.tire"];
    expect(message).toMatch(
      /^Tire size: "285\/70\/17" — not a recognised tire size designation; did you mean 285\/70R17\? \(accepted forms:/,
    );
    expect(message?.match(/Tire size/g)).toHaveLength(1);
  });

  it("passes the schema's messages on (wheel diameter vs tire)", () => {
    const d = base();
    d.planned = { ...d.planned, diameter: "18" };
    expect(readDraft(d, inch).errors).toEqual({
      "planned.wheelDiameterIn": "Wheel diameter (in): a 17 in tire needs a 17 in wheel; this wheel is 18 in.",
    });
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

describe("units: a field reads its stated unit, fractions only as inches", () => {
  const setup = (patch: Partial<Draft["planned"]>, prefs: DisplayPrefs = inch) => {
    const d = base();
    d.planned = { ...d.planned, ...patch };
    return readDraft(d, prefs);
  };
  const vehicle = (patch: Partial<Draft["vehicle"]>, prefs: DisplayPrefs = inch) => {
    const d = draftFromInput(DEFAULT_INPUT, prefs);
    d.vehicle = { ...d.vehicle, ...patch };
    return readDraft(d, prefs);
  };

  it("refuses a spacer of 1-1/2 (a fraction in a mm field) instead of reading 1.5 mm; 1-1/2 in is 38.1 mm", () => {
    const r = setup({ spacer: "1-1/2" });
    expect(r.input).toBeNull();
    expect(r.errors["planned.spacerMm"]).toBe(
      "Spacer (mm, optional): “1-1/2” is a fraction, which is read only in inches — write “1-1/2 in”, or mm as a decimal, e.g. 25 (leave empty for none).",
    );
    // 1.5 in × 25.4 = 38.1 mm (NIST SP 811).
    expect(setup({ spacer: "1-1/2 in" }).input?.planned.spacerMm).toBeCloseTo(38.1, 9);
    expect(setup({ spacer: "1½ in" }).input?.planned.spacerMm).toBeCloseTo(38.1, 9);
    expect(setup({ spacer: "38" }).input?.planned.spacerMm).toBe(38);
    expect(setup({ offset: "1/2" }).errors["planned.position.offsetMm"]).toMatch(/^Offset \(mm\): “1\/2” is a fraction/);
  });

  it("reads Unicode fractions in inch fields: backspacing 4¾, width 8½, flange allowance ½", () => {
    const r = setup({ mode: "backspacing", backspacing: "4¾", reference: "flange", flange: "½", width: "8½" });
    expect(r.errors).toEqual({});
    expect(r.input?.planned.position).toEqual({ mode: "backspacing", backspacingIn: 4.75, reference: "flange", flangeIn: 0.5 });
    expect(r.input?.planned.wheelWidthIn).toBe(8.5);
    expect(setup({ mode: "backspacing", backspacing: "4 3⁄4", reference: "flange", flange: "1/2" }).input?.planned.position).toMatchObject({
      backspacingIn: 4.75,
    });
  });

  it("fender line in inches: bounds stated in inches with an example the field accepts (500 mm = 19.68 in, NIST SP 811)", () => {
    const r = vehicle({ fender: "140" });
    expect(r.errors["vehicle.fenderLineMm"]).toBe("Fender line from hub face (in): must be between 0 and 19.68 in, e.g. 5-1/2 or 5.5.");
    expect(vehicle({ fender: "5-1/2" }).input?.vehicle.fenderLineMm).toBeCloseTo(139.7, 9);
    expect(vehicle({ fender: "5½" }).input?.vehicle.fenderLineMm).toBeCloseTo(139.7, 9);
    expect(vehicle({ fender: "19.68" }).errors).toEqual({});
    // In mm: 140 is 140 mm; a fraction is refused; bounds in mm.
    expect(vehicle({ fender: "140" }, metric).input?.vehicle.fenderLineMm).toBe(140);
    expect(vehicle({ fender: "5-1/2" }, metric).errors["vehicle.fenderLineMm"]).toMatch(
      /^Fender line from hub face \(mm\): “5-1\/2” is a fraction/,
    );
    expect(vehicle({ fender: "600" }, metric).errors["vehicle.fenderLineMm"]).toBe(
      "Fender line from hub face (mm): must be between 0 and 500 mm, e.g. 140.",
    );
  });

  it("first-gear and transfer-case low ratios are optional: empty is not entered, 4.03:1 reads as 4.03, and they show back as typed", () => {
    expect(vehicle({}).input?.vehicle).toMatchObject({ firstGearRatio: null, transferLowRatio: null });
    const r = vehicle({ first: "4.03:1", low: "2.72" });
    expect(r.input?.vehicle).toMatchObject({ firstGearRatio: 4.03, transferLowRatio: 2.72 });
    expect(draftFromInput(r.input!, inch).vehicle).toMatchObject({ first: "4.03", low: "2.72" });
    expect(vehicle({ low: "two" }).errors["vehicle.transferLowRatio"]).toBe(
      "Transfer-case low ratio (optional): enter a ratio, e.g. 2.72 (or 2.72:1), or leave it empty.",
    );
  });

  it("cruise speeds out of bounds are stated in the unit shown (5–150 mph = 8.1–241.4 km/h inward, 1 mi = 1.609344 km)", () => {
    expect(vehicle({ cruise: "55, 200" }).errors["vehicle.cruiseSpeedsMph"]).toBe(
      "Cruise speeds (mph): each speed must be between 5 and 150 mph, e.g. 60, 70.",
    );
    expect(vehicle({ cruise: "100, 300" }, metric).errors["vehicle.cruiseSpeedsMph"]).toBe(
      "Cruise speeds (km/h): each speed must be between 8.1 and 241.4 km/h, e.g. 100, 110.",
    );
    expect(vehicle({ cruise: "8.1, 241.4" }, metric).errors).toEqual({});
    expect(vehicle({ cruise: "55, 65" }).input?.vehicle.cruiseSpeedsMph).toEqual([55, 65]);
  });

  describe("every message names its field as labelled and gives an example the field accepts", () => {
    const namesItsField = (field: string, label: string, bad: ReturnType<typeof readDraft>, good: ReturnType<typeof readDraft>) => {
      expect(bad.errors[field], field).toMatch(new RegExp(`^${label.replace(/[()]/g, "\\$&")}: .*e\\.g\\. `));
      expect(good.errors, field).toEqual({});
    };

    it.each<[string, string, Partial<Draft["planned"]>, Partial<Draft["planned"]>]>([
      ["planned.wheelDiameterIn", "Wheel diameter (in)", { diameter: "x" }, { diameter: "17" }],
      ["planned.wheelWidthIn", "Wheel width (in)", { width: "40" }, { width: "8-1/2" }],
      ["planned.position.offsetMm", "Offset (mm)", { offset: "300" }, { offset: "-12" }],
      [
        "planned.position.backspacingIn",
        "Backspacing (in)",
        { mode: "backspacing", backspacing: "x", flange: "1/2" },
        { mode: "backspacing", backspacing: "4¾", flange: "1/2" },
      ],
      [
        "planned.position.flangeIn",
        "Flange allowance (in)",
        { mode: "backspacing", backspacing: "4.75", flange: "3" },
        { mode: "backspacing", backspacing: "4.75", flange: "1/2" },
      ],
      ["planned.spacerMm", "Spacer (mm, optional)", { spacer: "200" }, { spacer: "25" }],
    ])("%s (%s)", (field, label, bad, good) => namesItsField(field, label, setup(bad), setup(good)));

    it.each<[string, string, Partial<Draft["vehicle"]>, Partial<Draft["vehicle"]>]>([
      ["vehicle.kingpinInclinationDeg", "Kingpin inclination (°)", { kpi: "45" }, { kpi: "8" }],
      ["vehicle.axleRatio", "Axle ratio", { axle: "" }, { axle: "3.73" }],
      ["vehicle.transmissionRatio", "Top-gear ratio", { top: "20" }, { top: "1.00" }],
      ["vehicle.firstGearRatio", "First-gear ratio (optional)", { first: "first" }, { first: "4.03:1" }],
      ["vehicle.transferLowRatio", "Transfer-case low ratio (optional)", { low: "0.5" }, { low: "2.72" }],
    ])("%s (%s)", (field, label, bad, good) => namesItsField(field, label, vehicle(bad), vehicle(good)));
  });
});
