import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { EQUIVALENT_WEIGHTS, equivalentDistance, equivalentSizes } from "./equivalents";
import { FitmentInputError } from "./errors";
import { STANDARD_METRIC_SIZES } from "./standardSizes";
import { parseTireSize } from "./tireSize";

// Every diameter below is D = d × 25.4 + 2 × W × AR / 100 for metric sizes (ISO 4000-1 / ETRTO
// design formula) and D × 25.4 for flotation sizes (TRA: the designation states D and W in
// inches); 1 in = 25.4 mm exactly (NIST SP 811). The distance weights (diameter 2, width 1)
// are a design choice (common practice, no source).

describe("equivalentSizes — the two ranking cases", () => {
  it("37x12.50R17LT → metric: 315/80R17 first (−4.0 mm, −2.5 mm), not 365/70R17 (+3.0 mm but 47.5 mm wider)", () => {
    const eq = equivalentSizes("37x12.50R17LT", { system: "metric" });
    expect(eq.map((e) => e.text)).toEqual(["315/80R17", "325/80R17", "335/75R17", "325/75R17", "305/80R17", "315/75R17"]);
    const [first, second] = eq;
    // 315/80R17: 431.8 + 2 × 315 × 0.80 = 935.8 mm vs 939.8 mm; 315 mm vs 12.5 × 25.4 = 317.5 mm.
    expect(first?.diameterDeltaMm).toBeCloseTo(-4, 9);
    expect(first?.diameterDeltaPct).toBeCloseTo((-4 / 939.8) * 100, 9); // −0.43 %
    expect(first?.widthDeltaMm).toBeCloseTo(-2.5, 9);
    expect(first?.widthDeltaPct).toBeCloseTo((-2.5 / 317.5) * 100, 9); // −0.79 %
    expect(first?.distance).toBeCloseTo(2 * 0.42562 + 0.7874, 4); // 1.64
    expect(first?.sameRim).toBe(true);
    // 325/80R17: 431.8 + 520 = 951.8 mm (+12.0, +1.28 %), 325 mm (+7.5, +2.36 %): 2 × 1.2769 + 2.3622 = 4.92.
    expect(second?.distance).toBeCloseTo(2 * 1.27687 + 2.3622, 4);
    // 365/70R17: 431.8 + 511 = 942.8 mm (+3.0, +0.32 %) but 365 mm (+47.5, +14.96 %): 2 × 0.3192 + 14.9606 = 15.60.
    const wide = equivalentSizes("37x12.50R17LT", { system: "metric", limit: 50 }).find((e) => e.text === "365/70R17");
    expect(wide?.distance).toBeCloseTo(2 * 0.31922 + 14.96063, 4);
    expect(wide!.distance).toBeGreaterThan(first!.distance);
  });

  it("285/75R16 → inch: the 16 in size first, then closer sizes on other rims, several of them", () => {
    const eq = equivalentSizes("285/75R16");
    expect(eq).toHaveLength(6);
    expect(eq.map((e) => e.text)).toEqual([
      "31x10.50R16LT",
      "33x10.50R15LT",
      "32x11.50R15LT",
      "33x12.50R16.5LT",
      "33x12.50R15LT",
      "33x12.50R17LT",
    ]);
    const [same, nearest] = eq;
    // 285/75R16 = 406.4 + 427.5 = 833.9 mm, 285 mm. 31x10.50R16LT = 787.4 mm, 266.7 mm:
    // −46.5 mm (−5.58 %), −18.3 mm (−6.42 %): 2 × 5.5762 + 6.4211 = 17.57.
    expect(same).toMatchObject({ sameRim: true });
    expect(same?.diameterDeltaMm).toBeCloseTo(-46.5, 9);
    expect(same?.diameterDeltaPct).toBeCloseTo(-5.5762, 4);
    expect(same?.widthDeltaMm).toBeCloseTo(-18.3, 9);
    expect(same?.widthDeltaPct).toBeCloseTo(-6.4211, 4);
    expect(same?.distance).toBeCloseTo(17.5735, 3);
    // 33x10.50R15LT = 838.2 mm (+4.3, +0.52 %), 266.7 mm (−6.42 %): 2 × 0.5156 + 6.4211 = 7.45, much closer.
    expect(nearest).toMatchObject({ sameRim: false });
    expect(nearest?.size.rimDiameterIn).toBe(15);
    expect(nearest?.diameterDeltaMm).toBeCloseTo(4.3, 9);
    expect(nearest?.distance).toBeCloseTo(7.4523, 3);
    expect(nearest!.distance).toBeLessThan(same!.distance);
    // 33x12.50R16.5LT = 838.2 mm, 317.5 mm: 2 × 0.5156 + 11.4035 = 12.43, the same as every 33x12.50;
    // the nearer rim (16.5 in) breaks the tie.
    expect(eq[3]?.distance).toBeCloseTo(12.4347, 3);
    expect(eq[4]?.distance).toBeCloseTo(eq[3]!.distance, 9);
  });

  it("285/75R17 → inch: 34x10.50R17LT first (863.6 vs 859.3 mm, +0.50 %; −6.42 % width)", () => {
    const eq = equivalentSizes("285/75R17");
    expect(eq[0]?.text).toBe("34x10.50R17LT");
    expect(eq[0]?.diameterDeltaMm).toBeCloseTo(4.3, 9);
    expect(eq[1]?.text).toBe("35x11.50R17LT"); // 889 mm (+3.46 %), 292.1 mm (+2.49 %): 9.40
  });
});

describe("equivalentSizes — options and invariants", () => {
  it('rim: "same" keeps only the rim diameter of the size, "any" ranks by distance alone', () => {
    expect(equivalentSizes("285/75R16", { rim: "same" }).map((e) => e.text)).toEqual(["31x10.50R16LT"]);
    const any = equivalentSizes("285/75R16", { rim: "any", limit: 3 });
    // 33x10.50R15LT 7.45, 32x11.50R15LT 7.55 (812.8 mm, −2.53 %; 292.1 mm, +2.49 %), then the 33x12.50s at 12.43.
    expect(any.map((e) => e.text)).toEqual(["33x10.50R15LT", "32x11.50R15LT", "33x12.50R16.5LT"]);
  });

  it("the default system is the other one; a numeric size gets metric equivalents", () => {
    expect(equivalentSizes("37x12.50R17LT")[0]?.size.system).toBe("metric");
    expect(equivalentSizes("265/70R17")[0]?.size.system).toBe("flotation");
    expect(equivalentSizes("7.50R16")[0]?.size.system).toBe("metric");
  });

  it("a pasted 37×12.50R17 gives the same list as 37x12.50R17LT", () => {
    expect(equivalentSizes("37×12.50R17").map((e) => e.text)).toEqual(equivalentSizes("37x12.50R17LT").map((e) => e.text));
  });

  it("never returns the size itself (same dimensions) when asked for its own system", () => {
    const eq = equivalentSizes("LT315/70R17 121/118Q", { system: "metric", limit: 50 });
    expect(eq.some((e) => e.text === "315/70R17")).toBe(false);
  });

  it("distance = 2 × |Δ diameter %| + |Δ width %|; same rim first, then by distance (property)", () => {
    expect(EQUIVALENT_WEIGHTS).toEqual({ diameter: 2, width: 1 });
    expect(equivalentDistance(-0.5, 3)).toBeCloseTo(4, 12);
    fc.assert(
      fc.property(fc.constantFrom(...STANDARD_METRIC_SIZES), fc.integer({ min: 1, max: 20 }), (t, limit) => {
        const eq = equivalentSizes(t, { limit });
        expect(eq.length).toBeLessThanOrEqual(limit);
        for (const e of eq) {
          expect(e.diameterDeltaMm).toBeCloseTo(e.size.overallDiameterMm - t.overallDiameterMm, 9);
          expect(e.widthDeltaMm).toBeCloseTo(e.size.sectionWidthMm - t.sectionWidthMm, 9);
          expect(e.diameterDeltaPct).toBeCloseTo((e.diameterDeltaMm / t.overallDiameterMm) * 100, 9);
          expect(e.widthDeltaPct).toBeCloseTo((e.widthDeltaMm / t.sectionWidthMm) * 100, 9);
          expect(e.distance).toBeCloseTo(2 * Math.abs(e.diameterDeltaPct) + Math.abs(e.widthDeltaPct), 9);
          expect(e.sameRim).toBe(e.size.rimDiameterIn === t.rimDiameterIn);
        }
        for (let i = 1; i < eq.length; i++) {
          const a = eq[i - 1]!;
          const b = eq[i]!;
          if (a.sameRim === b.sameRim) expect(a.distance).toBeLessThanOrEqual(b.distance + 1e-12);
          else expect(a.sameRim).toBe(true);
        }
      }),
      { numRuns: 200 },
    );
  });

  it("invalid options throw, naming the option", () => {
    expect(() => equivalentSizes("285/75R17", { limit: 0 })).toThrow(FitmentInputError);
    expect(() => equivalentSizes("285/75R17", { system: "numeric" as "metric" })).toThrow(/system/);
    expect(() => equivalentSizes("285/75R17", { rim: "nearest" as "same" })).toThrow(/rim/);
    expect(() => equivalentSizes(parseTireSize("285/75R17"), { sizes: [] })).not.toThrow();
  });
});
