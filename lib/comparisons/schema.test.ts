import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeComparison } from "./compute";
import { DEFAULT_INPUT, comparisonInputSchema } from "./schema";

describe("comparison input schema", () => {
  it("accepts the demo comparison", () => {
    expect(comparisonInputSchema.safeParse(DEFAULT_INPUT).success).toBe(true);
  });

  it("whatever passes the schema, computeComparison computes without throwing and without NaN (property)", () => {
    const setup = fc.record({
      tire: fc.constantFrom("265/70R17", "37x12.50R17LT", "LT285/70R17 121/118Q", "33x10.50R15LT", "7.50R16", "205/55R16 91V"),
      wheelWidthIn: fc.double({ min: 3, max: 20, noNaN: true }),
      offset: fc.double({ min: -200, max: 200, noNaN: true }),
      spacerMm: fc.double({ min: 0, max: 100, noNaN: true }),
    });
    fc.assert(
      fc.property(setup, setup, fc.option(fc.double({ min: 0, max: 30, noNaN: true })), (a, b, kpi) => {
        const mk = (s: typeof a) => ({
          tire: s.tire,
          wheelDiameterIn: Number(/R(\d+)/.exec(s.tire)?.[1]),
          wheelWidthIn: s.wheelWidthIn,
          position: { mode: "offset" as const, offsetMm: s.offset },
          spacerMm: s.spacerMm,
        });
        const input = {
          current: mk(a),
          planned: mk(b),
          vehicle: { ...DEFAULT_INPUT.vehicle, kingpinInclinationDeg: kpi, firstGearRatio: 4.03, transferLowRatio: 2.72 },
        };
        const parsed = comparisonInputSchema.safeParse(input);
        if (!parsed.success) return;
        const out = computeComparison(parsed.data);
        const nums = JSON.stringify(out.changes) + JSON.stringify(out.gearing);
        expect(nums).not.toMatch(/null|NaN/);
      }),
      { numRuns: 300 },
    );
  });
});

describe("crawl-ratio inputs (first-gear and transfer-case low ratios)", () => {
  it("an input saved before they existed loads with both as not entered", () => {
    const { firstGearRatio: _f, transferLowRatio: _l, ...older } = DEFAULT_INPUT.vehicle;
    const parsed = comparisonInputSchema.parse({ ...DEFAULT_INPUT, vehicle: older });
    expect(parsed.vehicle).toEqual({ ...older, firstGearRatio: null, transferLowRatio: null });
  });
  it("keeps entered ratios and bounds them like the other ratios", () => {
    const withGears = { ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, firstGearRatio: 4.03, transferLowRatio: 2.72 } };
    expect(comparisonInputSchema.parse(withGears).vehicle).toMatchObject({ firstGearRatio: 4.03, transferLowRatio: 2.72 });
    const bad = comparisonInputSchema.safeParse({
      ...DEFAULT_INPUT,
      vehicle: { ...DEFAULT_INPUT.vehicle, firstGearRatio: 0.5, transferLowRatio: "low" },
    });
    expect(bad.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["vehicle.firstGearRatio", "The first-gear ratio must be between 1 and 10 (e.g. 4.03)."],
      ["vehicle.transferLowRatio", "Enter the transfer-case low ratio as a number (e.g. 2.72)."],
    ]);
  });
});

describe("zod adapter over checkComparison", () => {
  it("returns the clean copy (unknown fields dropped, tire trimmed) and the same issues as checkInput.ts", async () => {
    const { checkComparison } = await import("./checkInput");
    const dirty = { ...DEFAULT_INPUT, extra: 1, planned: { ...DEFAULT_INPUT.planned, tire: "  37x12.50R17LT  ", note: "x" } };
    const parsed = comparisonInputSchema.parse(dirty);
    expect(parsed).toEqual({ ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, tire: "37x12.50R17LT" } });
    const bad = { ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, cruiseSpeedsMph: [60, 400] } };
    const z = comparisonInputSchema.safeParse(bad);
    const m = checkComparison(bad);
    expect(z.success).toBe(false);
    expect(m.ok).toBe(false);
    expect(z.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual(
      m.ok ? [] : m.issues.map((i) => [i.path.join("."), i.message]),
    );
    expect(z.error?.issues[0]?.message).toBe("A cruise speed must be between 5 and 150 mph (e.g. 65).");
  });
});
