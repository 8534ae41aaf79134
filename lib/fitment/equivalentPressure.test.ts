import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { TireLimitError, TireSizeError } from "./errors";
import { equivalentPressure } from "./equivalentPressure";
import { ROAD_MINIMUM_RATIO, loadPressureBasis } from "./loadPressure";
import { LOAD_RATED_TIRES, VEHICLE_KIND, forTireShares } from "./loadPressureTestUtil";
import { errorField, nonFinite, real } from "./testUtil";
import { psiToKpa } from "./units";

// NIST SP 811 (2008) B.8: 1 psi = 6.894757 kPa.
const PSI = 6.894757;

/** A light truck on its P-metric tire at the 35 psi placard pressure (invented example). */
const TRUCK_AT_PLACARD = { current: "P265/70R17 113S", currentPressureKpa: psiToKpa(35), vehicle: "light-truck" } as const;

describe("equivalentPressure (TRA load formulas; ISO 4000-1 load index; FMVSS 120 S5.1.2)", () => {
  it("P265/70R17 113S at its 35 psi placard on a light truck → LT285/70R17 121/118Q LRE: 1045.45 kg, 45.73 psi, set the LR E minimum 320 kPa", () => {
    const r = equivalentPressure({ ...TRUCK_AT_PLACARD, planned: "LT285/70R17 121/118Q LRE" });
    // LI 113 = 1150 kg (ISO 4000-1) ÷ 1.10 (FMVSS 120 S5.1.2) = 1045.4545 kg at the TRA 35 psi reference (from memory)
    expect(r.loadKg).toBeCloseTo(1045.4545, 3);
    // LI 121 = 1450 kg at 80 psi (LR E, from memory): 80 × (1045.4545/1450)^(1/0.585) = 45.7349 psi (by hand)
    expect(r.pressurePsi).toBeCloseTo(45.7349, 3);
    expect(r.pressureKpa).toBeCloseTo(45.7349 * PSI, 1);
    expect(r.belowMinimum).toBe(true); // FMVSS 138 Table 1, LR E 320 kPa (from memory)
    expect(r.pressureToSetKpa).toBe(320);
    expect(r.current.sources.derating).toMatch(/1\.10/);
    expect(r.planned.sources.derating).toBeNull();
  });

  it("the same truck on 37x12.50R17LT 124Q load range D (50 psi, LI 124 = 1600 kg): 24.16 psi by the formula, 29.17 psi to set (minimum by proportion, no source)", () => {
    const r = equivalentPressure({ ...TRUCK_AT_PLACARD, planned: "37x12.50R17LT 124Q LRD" });
    // 50 × (1045.4545/1600)^(1/0.585) = 24.1572 psi (by hand)
    expect(r.pressurePsi).toBeCloseTo(24.1572, 3);
    expect(r.belowMinimum).toBe(true);
    expect(r.pressureToSetPsi).toBeCloseTo(ROAD_MINIMUM_RATIO * 50, 9); // 29.17 psi
    // reserve at 29.17 psi: 1600 × (0.58333)^0.585 − 1045.45 = 1600 × 0.72955 − 1045.45 = 121.84 kg (by hand)
    expect(r.reserveKg).toBeCloseTo(1600 * ROAD_MINIMUM_RATIO ** 0.585 - 1150 / 1.1, 6);
    expect(r.reserveKg).toBeCloseTo(121.84, 1);
  });

  it("an LT tire replaced by a bigger LT tire at a placard of 80 psi rear: load 1550 kg, pressure on the planned tire 80·(1550/1800)^(1/0.585) (TRA)", () => {
    const r = equivalentPressure({
      current: "LT245/75R16 120/116S LRE",
      currentPressureKpa: psiToKpa(80),
      planned: "LT285/75R16 128/125Q LRE",
    });
    // LI 120 = 1400 kg, LI 128 = 1800 kg (ISO 4000-1). 80 × (1400/1800)^(1/0.585) = 52.06 psi (by hand: ln 0.77778 = −0.25131, ÷0.585 = −0.42960, e^… = 0.65077)
    expect(r.loadKg).toBe(1400);
    expect(r.pressurePsi).toBeCloseTo(52.06, 1);
    expect(r.pressurePsi).toBeCloseTo(80 * (1400 / 1800) ** (1 / 0.585), 9);
    expect(r.belowMinimum).toBe(false);
    expect(r.pressureToSetKpa).toBe(r.pressureKpa);
  });

  it("refuses, naming the planned tire, when it cannot carry the load even at its maximum", () => {
    const run = () =>
      equivalentPressure({ current: "LT285/70R17 121/118Q LRE", currentPressureKpa: psiToKpa(80), planned: "P265/70R17 113S" });
    expect(run).toThrow(TireLimitError);
    expect(run).toThrow(/planned: P265\/70R17 113S carries at most 1150 kg .* less than the 1450 kg/);
    expect(errorField(run)).toBe("planned");
  });

  it("names the field of every missing or impossible figure", () => {
    expect(
      errorField(() => equivalentPressure({ current: "P265/70R17 113S", currentPressureKpa: 241, planned: "LT285/70R17 121/118Q" })),
    ).toBe("plannedMaxPressureKpa");
    expect(
      errorField(() =>
        equivalentPressure({ current: "LT285/70R17 121/118Q", currentPressureKpa: 241, planned: "LT285/70R17 121/118Q LRE" }),
      ),
    ).toBe("currentMaxPressureKpa");
    expect(
      errorField(() => equivalentPressure({ current: "P265/70R17 113S", currentPressureKpa: 600, planned: "LT285/70R17 121/118Q LRE" })),
    ).toBe("currentPressureKpa");
    expect(
      errorField(() =>
        equivalentPressure({ current: "P265/70R17 113S", currentPressureKpa: Number.NaN, planned: "LT285/70R17 121/118Q LRE" }),
      ),
    ).toBe("currentPressureKpa");
    expect(
      errorField(() => equivalentPressure({ current: "P265/70R17", currentPressureKpa: 241, planned: "LT285/70R17 121/118Q LRE" })),
    ).toBe("currentMaxLoadKg");
    expect(() => equivalentPressure({ current: "P265/7R17", currentPressureKpa: 241, planned: "LT285/70R17 121/118Q LRE" })).toThrow(
      TireSizeError,
    );
    expect(
      errorField(() => equivalentPressure({ current: "P265/7R17", currentPressureKpa: 241, planned: "LT285/70R17 121/118Q LRE" })),
    ).toBe("current");
    expect(errorField(() => equivalentPressure(null as never))).toBe("input");
  });

  it("sidewall figures given override the engine's (LT size without load range)", () => {
    const r = equivalentPressure({ ...TRUCK_AT_PLACARD, planned: "LT285/70R17 121/118Q", plannedMaxPressureKpa: psiToKpa(80) });
    expect(r.pressurePsi).toBeCloseTo(45.7349, 3);
    expect(r.planned.sources.maxPressure).toMatch(/as given/);
  });
});

describe("properties (fast-check)", () => {
  it("a tire replaced by itself keeps the placard pressure (between the minimum and the reference)", () => {
    forTireShares(LOAD_RATED_TIRES, 0, 500, (t, v, share, b) => {
      const placard = b.minimumPressureKpa + share * (b.maxPressureKpa - b.minimumPressureKpa);
      const r = equivalentPressure({ current: t, currentPressureKpa: placard, planned: t, vehicle: v });
      expect(r.pressureKpa).toBeCloseTo(placard, 6);
      expect(r.pressureToSetKpa).toBeCloseTo(placard, 6);
    });
  });

  it("a higher placard pressure never gives a lower equivalent pressure, and nothing is NaN", () => {
    fc.assert(
      fc.property(VEHICLE_KIND, real(0.3, 1), real(0.3, 1), (v, a, c) => {
        const ref = loadPressureBasis("P265/70R17 113S").maxPressureKpa;
        const run = (share: number) =>
          equivalentPressure({
            current: "P265/70R17 113S",
            currentPressureKpa: share * ref,
            planned: "LT285/70R17 121/118Q LRE",
            vehicle: v,
          });
        const [lo, hi] = a < c ? [a, c] : [c, a];
        expect(run(lo).pressureKpa).toBeLessThanOrEqual(run(hi).pressureKpa);
        expect(nonFinite(run(a))).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });
});
