import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type ComparisonInput, DEFAULT_INPUT, comparisonInputSchema } from "./schema";
import { SETUP_PARAM, problemText } from "@/lib/setup/url";
import { setupAt } from "@/lib/setup/testUtil";
import { encodeComparison } from "./url";
import { decodeComparison, hasComparisonParams } from "./urlRead";

describe("comparison query string", () => {
  it("is compact and readable", () => {
    expect(encodeComparison(DEFAULT_INPUT)).toBe("ct=265/70R17+113T&cd=17&cw=8&co=25&pt=37x12.50R17LT+124Q+LRD&pd=17&pw=9&po=-12");
  });

  it("round-trips backspacing, reference, flange allowance, spacer and every vehicle figure", () => {
    const x: ComparisonInput = {
      current: { ...DEFAULT_INPUT.current, spacerMm: 12.5 },
      planned: {
        tire: "LT315/70R17 121/118Q",
        wheelDiameterIn: 17,
        wheelWidthIn: 8.5,
        position: { mode: "backspacing", backspacingIn: 4.75, reference: "bead-seat", flangeIn: 0.625 },
        spacerMm: 0,
      },
      vehicle: {
        kingpinInclinationDeg: 8.5,
        axleRatio: 4.1,
        transmissionRatio: 0.72,
        cruiseSpeedsMph: [55, 65, 75],
        fenderLineMm: 142,
        firstGearRatio: 4.03,
        transferLowRatio: 2.72,
      },
    };
    const q = encodeComparison(x);
    expect(q).toContain("pb=4.75&pr=bead&pf=0.625");
    expect(q).toContain("kpi=8.5&axle=4.1&top=0.72&cruise=55,65,75&fender=142&first=4.03&low=2.72");
    expect(decodeComparison(q)).toEqual({ input: x, problems: [] });
    expect(decodeComparison(`?${q}`).input).toEqual(x);
    expect(decodeComparison(new URLSearchParams(q)).input).toEqual(x);
  });

  it("round-trips any valid input (property)", () => {
    const four = (min: number, max: number) => fc.integer({ min: min * 10000, max: max * 10000 }).map((v) => v / 10000);
    const position = fc.oneof(
      four(-60, 60).map((offsetMm) => ({ mode: "offset" as const, offsetMm })),
      fc.record({
        mode: fc.constant("backspacing" as const),
        backspacingIn: four(3, 6),
        reference: fc.constantFrom("flange" as const, "bead-seat" as const),
        flangeIn: four(0, 2),
      }),
    );
    const setup = fc.record({
      tire: fc.constantFrom("265/70R17", "37x12.50R17LT", "LT285/70R17 121/118Q", "285/75R17 LRE"),
      wheelDiameterIn: fc.constant(17),
      wheelWidthIn: four(7, 12),
      position,
      spacerMm: four(0, 100),
    });
    const vehicle = fc.record({
      kingpinInclinationDeg: fc.option(four(0, 30)),
      axleRatio: four(1, 10),
      transmissionRatio: four(0.3, 10),
      cruiseSpeedsMph: fc.array(four(5, 150), { minLength: 1, maxLength: 6 }),
      fenderLineMm: fc.option(four(0, 500)),
      firstGearRatio: fc.option(four(1, 10)),
      transferLowRatio: fc.option(four(1, 10)),
    });
    fc.assert(
      fc.property(setup, setup, vehicle, (current, planned, v) => {
        const x = { current, planned, vehicle: v };
        fc.pre(comparisonInputSchema.safeParse(x).success);
        expect(decodeComparison(encodeComparison(x))).toEqual({ input: x, problems: [] });
      }),
      { numRuns: 300 },
    );
  });

  it("old links without the gear parameters still decode, with no crawl-ratio inputs; bad ones are named", () => {
    const old = "ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12&axle=4.1";
    expect(decodeComparison(old)).toEqual({
      input: {
        ...DEFAULT_INPUT,
        current: { ...DEFAULT_INPUT.current, tire: "265/70R17" },
        planned: { ...DEFAULT_INPUT.planned, tire: "37x12.50R17LT" },
        vehicle: { ...DEFAULT_INPUT.vehicle, axleRatio: 4.1, firstGearRatio: null, transferLowRatio: null },
      },
      problems: [],
    });
    expect(hasComparisonParams("first=4.03")).toBe(true);
    expect(decodeComparison("first=4.03&low=12").problems.map(problemText)).toEqual([
      "Transfer-case low ratio (optional): “12” is outside 1–10; using none (not entered).",
    ]);
  });

  it("falls back per parameter and names what it could not read", () => {
    const { input, problems } = decodeComparison(
      "ct=not-a-size&cw=abc&co=1e3&pt=35x12.50R15LT&pw=10&pb=3.75&pr=sideways&kpi=-4&axle=&cruise=60,x,70&fender=9999",
    );
    expect(input.current).toEqual(DEFAULT_INPUT.current);
    // The wheel diameter follows the tire when missing; an unknown reference reads as "flange".
    expect(input.planned).toEqual(
      setupAt("35x12.50R15LT", 15, 10, { mode: "backspacing", backspacingIn: 3.75, reference: "flange", flangeIn: 0.5 }, 0),
    );
    expect(input.vehicle).toEqual({ ...DEFAULT_INPUT.vehicle, cruiseSpeedsMph: [60, 70] });
    expect(problems.map(problemText)).toEqual([
      "Current setup · Tire size: “not-a-size” is not a tire size; using 265/70R17 113T.",
      "Current setup · Wheel width (in): “abc” is not a number; using 8 in.",
      "Current setup · Offset (mm): “1e3” is not a number; using an offset of 25 mm.",
      "Planned setup · Measured to: “sideways” is not flange or bead; using the flange edge.",
      "Kingpin inclination (°): “-4” is outside 0–30°; using none (not set).",
      "Axle ratio is empty; using 3.73.",
      "Cruise speeds: “60,x,70” has entries left out (“x” is not a number); using 60, 70 mph.",
      "Fender line from hub face: “9999” is outside 0–500 mm; using none (not measured).",
    ]);
  });

  it("drops a wheel diameter that does not match the tire, and a position outside the wheel", () => {
    const { input, problems } = decodeComparison("pt=33x10.50R15LT&pd=17&pw=8&po=190");
    expect(input.planned.wheelDiameterIn).toBe(15);
    // 8 in wheel: |offset| ≤ 101.6 + 76.2 = 177.8 mm, so 190 falls back to the demo's −12.
    expect(input.planned.position).toEqual({ mode: "offset", offsetMm: -12 });
    expect(problems.map(problemText)).toEqual([
      "Planned setup · Wheel diameter (in): “17” does not match the 15 in tire; using 15 in.",
      "Planned setup · Offset (mm): “190” puts the mounting face outside a 8 in wide wheel; using an offset of \u221212 mm.",
    ]);
  });

  it("names every value it leaves out or replaces, as the workspace labels it, with what it uses instead", () => {
    const one = (q: string) => decodeComparison(q).problems.map((p) => ({ field: p.field, used: p.used }));
    // One bad speed among good ones, speeds out of range, more than six speeds.
    expect(one("cruise=60,x,70")).toEqual([{ field: "Cruise speeds", used: "60, 70 mph" }]);
    expect(one("cruise=65,200")).toEqual([{ field: "Cruise speeds", used: "65 mph" }]);
    expect(decodeComparison("cruise=65,200").problems[0]?.reason).toMatch(/“200” is outside 5–150 mph/);
    expect(one("cruise=10,20,30,40,50,60,70,80")).toEqual([{ field: "Cruise speeds", used: "10, 20, 30, 40, 50, 60 mph" }]);
    // A bad backspacing beside a good offset; an offset beside a backspacing; a reference without a backspacing.
    expect(one("po=-12&pb=abc")).toEqual([{ field: "Planned setup · Backspacing (in)", used: "the link's offset, \u221212 mm" }]);
    expect(one("pb=4.5&po=10")).toEqual([{ field: "Planned setup · Offset (mm)", used: "the backspacing, 4.5 in" }]);
    expect(one("pr=bead&po=-5")).toEqual([{ field: "Planned setup · Measured to", used: "an offset of \u22125 mm" }]);
    expect(one("cb=4.5&cf=3")).toEqual([{ field: "Current setup · Flange allowance (in)", used: "0.5 in" }]);
    // A tire size too long is refused whole, not cut to 80 characters.
    const long = decodeComparison(`ct=${encodeURIComponent(`265/70R17 113T${" ".repeat(70)}X`)}`);
    expect(long.input.current.tire).toBe("265/70R17 113T");
    expect(long.problems.map(problemText)).toEqual([
      expect.stringMatching(/^Current setup · Tire size: .* is longer than 80 characters; using 265\/70R17 113T\.$/),
    ]);
    // Out of range numbers say the bounds in the link's unit.
    expect(decodeComparison("pw=25&axle=12&ps=150").problems.map((p) => `${p.field} ${p.reason}`)).toEqual([
      "Planned setup · Wheel width (in) is outside 3–20 in",
      "Planned setup · Spacer (mm, optional) is outside 0–100 mm",
      "Axle ratio is outside 1–10",
    ]);
    // A clean link has none.
    expect(decodeComparison(encodeComparison(DEFAULT_INPUT)).problems).toEqual([]);
  });

  it("never throws and always returns a valid input, whatever the query (property)", () => {
    // Every parameter of both setups (lib/setup's SETUP_PARAM after each prefix), the vehicle's first five and an unknown one.
    const setupKeys = (["c", "p"] as const).flatMap((side) => Object.values(SETUP_PARAM).map((key) => `${side}${key}`));
    const keys = fc.constantFrom(...setupKeys, "kpi", "axle", "top", "cruise", "fender", "zz");
    const value = fc.oneof(
      fc.string(),
      fc.double().map(String),
      fc.constantFrom("17", "-12", "NaN", "Infinity", "1e400", "4-3/4", "%", "%%41", "bead", "265/70R17"),
    );
    fc.assert(
      fc.property(fc.array(fc.tuple(keys, value), { maxLength: 12 }), fc.string(), (pairs, junk) => {
        const q = pairs.map(([k, v]) => `${k}=${v}`).join("&") + junk;
        const { input } = decodeComparison(q);
        expect(comparisonInputSchema.safeParse(input).success).toBe(true);
      }),
      { numRuns: 500 },
    );
    expect(decodeComparison({ ct: ["265/75R17", "x"], junk: undefined }).input.current.tire).toBe("265/75R17");
  });

  it("reads backspacing and wheel sizes written with fractions, as the form takes them (4-1/2 = 4½ = 4.5 in)", () => {
    const base = "ct=265/70R17&cd=17&cw=8&co=25&pt=35x12.50R17LT&pd=17";
    for (const [w, b] of [
      ["9", "4-1/2"],
      ["9", "4+1/2"],
      ["9", "4%C2%BD"],
      ["9", "4.5"],
      ["8-1/2+in", "4-1/2"],
    ]) {
      const { input, problems } = decodeComparison(`${base}&pw=${w}&pb=${b}&pr=flange`);
      expect(problems, `${w} ${b}`).toEqual([]);
      expect(input.planned.position).toEqual({ mode: "backspacing", backspacingIn: 4.5, reference: "flange", flangeIn: 0.5 });
      expect(input.planned.wheelWidthIn).toBe(w === "9" ? 9 : 8.5);
    }
    // The link still writes decimals.
    expect(encodeComparison(decodeComparison(`${base}&pw=9&pb=4-1/2&pr=flange`).input)).toContain("pb=4.5&pr=flange");
  });

  it("keeps reading the stored spelling bead-seat for the reference in old links", () => {
    const { input, problems } = decodeComparison("pt=35x12.50R17LT&pd=17&pw=9&pb=4.5&pr=bead-seat");
    expect(problems).toEqual([]);
    expect(input.planned.position).toMatchObject({ reference: "bead-seat" });
  });

  it("tells a comparison link from a bare page", () => {
    expect(hasComparisonParams("")).toBe(false);
    expect(hasComparisonParams("utm=1")).toBe(false);
    expect(hasComparisonParams("pt=35x12.50R17LT")).toBe(true);
  });
});
