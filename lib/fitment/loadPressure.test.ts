import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { FitmentInputError, TireLimitError, TireSizeError } from "./errors";
import {
  LOAD_PRESSURE_EXPONENT,
  ROAD_MINIMUM_RATIO,
  loadAtPressure,
  loadIndexNeeded,
  loadPressureBasis,
  pressureForLoad,
} from "./loadPressure";
import { LOAD_RATED_TIRES, forTireShares } from "./loadPressureTestUtil";
import { LOAD_INDEX_KG, MAX_LOAD_INDEX } from "./loadSpeed";
import { errorField, nonFinite, real } from "./testUtil";
import { parseTireSize } from "./tireSize";
import { psiToKpa } from "./units";

// NIST SP 811 (2008) B.8: 1 psi = 6.894757 kPa (to 7 figures).
const PSI = 6.894757;

/** The TRA light-truck load formula, L = K·0.425·P^0.585·Sd^1.39·(DR + Sd) (TRA; NHTSA, The Pneumatic Tire, 2006). */
const traLightTruck = (k: number, p: number, sd: number, dr: number): number => k * 0.425 * p ** 0.585 * sd ** 1.39 * (dr + sd);
/** The TRA metric passenger form, L = K·P^0.5·Sd^1.39·(Dr + Sd) (TRA; NHTSA, The Pneumatic Tire, 2006). */
const traPassenger = (k: number, p: number, sd: number, dr: number): number => k * p ** 0.5 * sd ** 1.39 * (dr + sd);

describe("worked examples (TRA load formula; ISO 4000-1 load index; NIST SP 811 psi)", () => {
  it("LT265/75R16 123/120S load range E (80 psi, LI 123 = 1550 kg) carrying 1000 kg needs 80·(1000/1550)^(1/0.585) ≈ 37.82 psi", () => {
    const r = pressureForLoad("LT265/75R16 123/120S LRE", 1000);
    expect(r.exponent).toBe(0.585); // TRA light-truck formula
    expect(r.maxLoadKg).toBe(1550); // ISO 4000-1: LI 123 = 1550 kg
    expect(r.maxPressureKpa).toBeCloseTo(80 * PSI, 3); // load range E, 80 psi (from memory, TRA practice)
    // 80 × (1000/1550)^(1/0.585) = 37.8213 psi (by hand: ln(0.64516) = −0.43825, ÷ 0.585 = −0.74915, e^… = 0.47277)
    expect(r.pressurePsi).toBeCloseTo(37.8213, 3);
    expect(r.pressureKpa).toBeCloseTo(37.8213 * PSI, 2); // ≈ 260.77 kPa (NIST SP 811)
    // FMVSS 138 Table 1, load range E: 320 kPa (from memory) — the load needs less, so it is flagged.
    expect(r.belowMinimum).toBe(true);
    expect(r.minimumPressureKpa).toBe(320);
    expect(r.pressureToSetKpa).toBe(320);
    expect(r.pressureToSetPsi).toBeCloseTo(320 / PSI, 4); // 46.41 psi
    // Reserve at 320 kPa: 1550 × (320 / 551.58)^0.585 − 1000 = 127.2 kg (by hand)
    expect(r.reserveKg).toBeCloseTo(127.2, 1);
    expect(r.notes[0]).toMatch(/below the road minimum/);
  });

  it("P215/75R15 100S: exponent 0.5, TRA P-metric standard load 35 psi (from memory), LI 100 = 800 kg; at 30 psi 800·√(30/35) ≈ 740.66 kg", () => {
    const r = loadAtPressure("P215/75R15 100S", psiToKpa(30));
    expect(r.exponent).toBe(0.5);
    expect(r.tireClass).toBe("passenger");
    expect(r.maxLoadKg).toBe(800); // ISO 4000-1
    expect(r.maxPressureKpa).toBeCloseTo(35 * PSI, 3);
    expect(r.loadKg).toBeCloseTo(740.656, 2); // 800 × 0.925820 (by hand)
    expect(r.belowMinimum).toBe(false); // 206.8 kPa ≥ 140 kPa (FMVSS 138 Table 1, from memory)
  });

  it("LT265/75R16 123/120S LRE at 50 psi carries 1550·(50/80)^0.585 ≈ 1177.39 kg (TRA formula)", () => {
    expect(loadAtPressure("LT265/75R16 123/120S LRE", psiToKpa(50)).loadKg).toBeCloseTo(1177.39, 1);
  });

  it("reference pressures by designation: P-metric 35/41 psi (TRA), Euro-metric 250/290 kPa (ETRTO), both from memory", () => {
    expect(loadPressureBasis("P215/75R15 100S").maxPressureKpa).toBeCloseTo(35 * PSI, 3);
    expect(loadPressureBasis("P215/75R15 104S XL").maxPressureKpa).toBeCloseTo(41 * PSI, 3);
    expect(loadPressureBasis("215/75R15 100S").maxPressureKpa).toBe(250);
    expect(loadPressureBasis("215/75R15 104S XL").maxPressureKpa).toBe(290);
    expect(loadPressureBasis("215/75R15 104S Reinforced").maxPressureKpa).toBe(290);
    expect(loadPressureBasis("215/75R15 100S").sources.maxPressure).toMatch(/ETRTO/);
    expect(loadPressureBasis("P215/75R15 100S").sources.maxPressure).toMatch(/TRA P-metric/);
  });

  it("37x12.50R17LT 124Q load range D: flotation → exponent 0.585, 50 psi (common practice, no source), LI 124 = 1600 kg", () => {
    const b = loadPressureBasis("37x12.50R17LT 124Q LRD");
    expect(b).toMatchObject({ tireClass: "light-truck", exponent: 0.585, maxLoadKg: 1600 });
    expect(b.maxPressureKpa).toBeCloseTo(50 * PSI, 3);
    // Not in FMVSS 138 Table 1 (its LR D row is the 65 psi metric LT): 0.5833 × 50 psi = 29.17 psi (by proportion, no source).
    expect(b.minimumPressureKpa).toBeCloseTo(ROAD_MINIMUM_RATIO * psiToKpa(50), 9);
    expect(b.minimumPressureKpa / PSI).toBeCloseTo(29.1667, 3);
  });

  it("pressure in psi = kPa ÷ 6.894757 (NIST SP 811)", () => {
    const r = pressureForLoad("LT285/70R17 121/118Q LRE", 1200);
    expect(r.pressurePsi).toBeCloseTo(r.pressureKpa / PSI, 5);
  });
});

describe("the ratio form agrees with the full TRA formulas (TRA; NHTSA, The Pneumatic Tire, 2006)", () => {
  it("for any K, design section and rim diameter, L(P)/L(Pmax) is the engine's loadKg/maxLoadKg (property)", () => {
    fc.assert(
      fc.property(real(0.5, 2), real(5, 16), real(14, 24), real(0.05, 1), (k, sd, dr, share) => {
        const lt = loadAtPressure("LT265/75R16 123/120S LRE", psiToKpa(share * 80));
        expect(lt.loadKg / lt.maxLoadKg).toBeCloseTo(traLightTruck(k, share * 80, sd, dr) / traLightTruck(k, 80, sd, dr), 9);
        const p = loadAtPressure("P215/75R15 100S", psiToKpa(share * 35));
        expect(p.loadKg / p.maxLoadKg).toBeCloseTo(traPassenger(k, share * 35, sd, dr) / traPassenger(k, 35, sd, dr), 9);
      }),
      { numRuns: 300 },
    );
  });
});

describe("passenger tire on a light truck, MPV or SUV: load ÷ 1.10 (FMVSS 120 S5.1.2; NHTSA interpretation 2351y; TRA)", () => {
  it("P215/75R15 100S: 800 kg becomes 727.27 kg and the pressure for 700 kg rises from 26.80 to 32.42 psi", () => {
    const car = pressureForLoad("P215/75R15 100S", 700);
    const truck = pressureForLoad("P215/75R15 100S", 700, { vehicle: "light-truck" });
    expect(truck.maxLoadKg).toBeCloseTo(800 / 1.1, 9);
    expect(car.pressurePsi).toBeCloseTo(35 * (700 / 800) ** 2, 6); // 26.797 psi
    expect(truck.pressurePsi).toBeCloseTo(35 * ((700 * 1.1) / 800) ** 2, 6); // 32.424 psi
    expect(truck.sources.derating).toMatch(/FMVSS 120 S5\.1\.2/);
    expect(car.sources.derating).toBeNull();
    expect(car.notes.join(" ")).toMatch(/light-truck/);
  });

  it("light-truck tires are not derated", () => {
    expect(loadPressureBasis("LT265/75R16 123/120S LRE", { vehicle: "light-truck" }).maxLoadKg).toBe(1550);
  });
});

describe("limits: above the maximum is refused, below the minimum is flagged", () => {
  it("a load above the tire's maximum throws a FitmentInputError on loadKg that says why and gives an example", () => {
    expect(() => pressureForLoad("LT265/75R16 123/120S LRE", 1600)).toThrow(
      /loadKg 1600 kg is above the maximum load of LT265\/75R16 123\/120S LRE, 1550 kg.*e\.g\./,
    );
    expect(errorField(() => pressureForLoad("LT265/75R16 123/120S LRE", 1600))).toBe("loadKg");
    expect(() => pressureForLoad("LT265/75R16 123/120S LRE", 1600)).toThrow(TireLimitError);
    try {
      pressureForLoad("LT265/75R16 123/120S LRE", 1600);
    } catch (e) {
      expect(e).toMatchObject({ limit: 1550, unit: "kg", value: 1600 });
    }
    expect(() => pressureForLoad("LT265/75R16 123/120S LRE", -5)).not.toThrow(TireLimitError); // a typing error, not a limit
    expect(errorField(() => pressureForLoad("P215/75R15 100S", 750, { vehicle: "light-truck" }))).toBe("loadKg"); // 750 > 727.3
    expect(errorField(() => pressureForLoad("LT265/75R16 123/120S LRE", -5))).toBe("loadKg");
    expect(errorField(() => pressureForLoad("LT265/75R16 123/120S LRE", 0))).toBe("loadKg");
    expect(errorField(() => pressureForLoad("LT265/75R16 123/120S LRE", Number.NaN))).toBe("loadKg");
  });

  it("a pressure above the LT sidewall maximum is refused; a passenger tire may go above its reference up to its max press without gaining load", () => {
    expect(() => loadAtPressure("LT265/75R16 123/120S LRE", psiToKpa(85))).toThrow(/pressureKpa .* above the highest pressure/);
    expect(() => loadAtPressure("LT265/75R16 123/120S LRE", psiToKpa(85))).toThrow(TireLimitError);
    const p = loadAtPressure("P215/75R15 100S", psiToKpa(44));
    expect(p.loadKg).toBe(800);
    expect(p.aboveMaxPressure).toBe(true);
    expect(() => loadAtPressure("P215/75R15 100S", psiToKpa(52))).toThrow(FitmentInputError); // above 350 kPa default (from memory)
    expect(loadAtPressure("P215/75R15 100S", 340, { maxInflationKpa: 350 }).loadKg).toBe(800);
    expect(() => loadAtPressure("P215/75R15 100S", 320, { maxInflationKpa: 300 })).toThrow(/above the highest pressure/);
    expect(errorField(() => loadAtPressure("P215/75R15 100S", 320, { maxInflationKpa: 200 }))).toBe("maxInflationKpa");
  });

  it("a pressure below the road minimum is computed but flagged (FMVSS 138 Table 1: passenger 140 / XL 160 kPa, from memory)", () => {
    const low = loadAtPressure("P215/75R15 100S", 130);
    expect(low.belowMinimum).toBe(true);
    expect(low.loadKg).toBeCloseTo(800 * Math.sqrt(130 / (35 * PSI)), 3);
    expect(low.notes[0]).toMatch(/Below the road minimum 140 kPa/);
    expect(loadAtPressure("P215/75R15 100S", 150).belowMinimum).toBe(false);
    expect(loadPressureBasis("P215/75R15 104S XL").minimumPressureKpa).toBe(160);
    // A maker's minimum wins.
    const own = pressureForLoad("37x12.50R17LT 124Q LRD", 600, { minPressureKpa: 180 });
    expect(own).toMatchObject({ minimumPressureKpa: 180, belowMinimum: true, pressureToSetKpa: 180 });
  });

  it("a flat tire (0 kPa) carries nothing by the formula and is flagged, never NaN", () => {
    const r = loadAtPressure("LT265/75R16 123/120S LRE", 0);
    expect(r.loadKg).toBe(0);
    expect(r.belowMinimum).toBe(true);
  });
});

describe("missing or impossible figures name the field and show an example", () => {
  it("an LT size without load range needs maxPressureKpa; without load index, maxLoadKg", () => {
    expect(() => loadAtPressure("LT285/70R17 121/118Q", 300)).toThrow(/maxPressureKpa: LT285\/70R17 121\/118Q has no load range.*e\.g\./);
    expect(errorField(() => loadAtPressure("LT285/70R17 LRE", 300))).toBe("maxLoadKg");
    const given = loadAtPressure("LT285/70R17 121/118Q", 300, { maxPressureKpa: 551.6 });
    expect(given.sources.maxPressure).toMatch(/as given/);
    expect(given.minimumPressureKpa).toBeCloseTo(ROAD_MINIMUM_RATIO * 551.6, 9);
    expect(loadAtPressure("LT285/70R17 LRE", 300, { maxLoadKg: 1450 }).maxLoadKg).toBe(1450);
  });

  it("commercial C sizes: light-truck formula, single load index, sidewall pressure required (ETRTO C pressures not held)", () => {
    expect(errorField(() => loadPressureBasis("235/65R16C 121/119R"))).toBe("maxPressureKpa");
    const b = loadPressureBasis("235/65R16C 121/119R", { maxPressureKpa: 475 });
    expect(b).toMatchObject({ tireClass: "light-truck", exponent: 0.585, maxLoadKg: 1450, maxPressureKpa: 475 }); // LI 121 single = 1450 kg (ISO 4000-1)
  });

  it("temporary spares, trailer tires and P sizes with a load range are refused with a message", () => {
    expect(() => loadPressureBasis("T155/90D16 110M")).toThrow(/temporary spare/);
    expect(() => loadPressureBasis("ST225/75R15 117/112L LRE")).toThrow(/trailer/);
    expect(() => loadPressureBasis("P265/70R17 LRC")).toThrow(/passenger \(P\) size with a load range/);
  });

  it("bad text, bad options and a bad vehicle throw typed errors", () => {
    expect(() => loadAtPressure("265/7R17", 200)).toThrow(TireSizeError);
    expect(errorField(() => loadAtPressure("P215/75R15 100S", 200, { vehicle: "truck" as never }))).toBe("vehicle");
    expect(errorField(() => loadAtPressure("P215/75R15 100S", 200, { maxLoadKg: -1 }))).toBe("maxLoadKg");
    expect(errorField(() => loadAtPressure("P215/75R15 100S", 200, { maxPressureKpa: Number.POSITIVE_INFINITY }))).toBe("maxPressureKpa");
    expect(errorField(() => loadAtPressure("P215/75R15 100S", 200, { minPressureKpa: 400 }))).toBe("minPressureKpa");
    expect(errorField(() => loadAtPressure("P215/75R15 100S", Number.NaN))).toBe("pressureKpa");
    expect(errorField(() => loadAtPressure("P215/75R15 100S", -1))).toBe("pressureKpa");
  });

  it("accepts a parsed size as well as text", () => {
    expect(loadAtPressure(parseTireSize("LT265/75R16 123/120S LRE"), 400)).toEqual(loadAtPressure("LT265/75R16 123/120S LRE", 400));
  });
});

describe("properties (fast-check)", () => {
  it("pressure → load → pressure round-trips for every pressure up to the reference", () => {
    forTireShares(LOAD_RATED_TIRES, 0.01, 1000, (t, v, share, b) => {
      const p = share * b.maxPressureKpa;
      const load = loadAtPressure(t, p, { vehicle: v }).loadKg;
      expect(pressureForLoad(t, load, { vehicle: v }).pressureKpa).toBeCloseTo(p, 6);
    });
  });

  it("load → pressure → load round-trips for every load up to the maximum", () => {
    forTireShares(LOAD_RATED_TIRES, 0.01, 1000, (t, v, share, b) => {
      const load = share * b.maxLoadKg;
      const p = pressureForLoad(t, load, { vehicle: v });
      expect(loadAtPressure(t, p.pressureKpa, { vehicle: v }).loadKg).toBeCloseTo(load, 6);
      expect(p.pressureToSetKpa).toBeGreaterThanOrEqual(p.pressureKpa);
      expect(p.pressureToSetKpa).toBeGreaterThanOrEqual(p.minimumPressureKpa);
      expect(p.reserveKg).toBeGreaterThanOrEqual(0);
    });
  });

  it("load grows with pressure and pressure with load; the exponent is 0.585 or 0.5 (TRA)", () => {
    fc.assert(
      fc.property(LOAD_RATED_TIRES, real(0, 1), real(0, 1), (t, a, c) => {
        const b = loadPressureBasis(t);
        expect(Object.values(LOAD_PRESSURE_EXPONENT)).toContain(b.exponent);
        const [lo, hi] = a < c ? [a, c] : [c, a];
        expect(loadAtPressure(t, lo * b.maxPressureKpa).loadKg).toBeLessThanOrEqual(loadAtPressure(t, hi * b.maxPressureKpa).loadKg);
      }),
      { numRuns: 500 },
    );
  });

  it("no output is NaN or infinite over the valid domain", () => {
    forTireShares(LOAD_RATED_TIRES, 0, 500, (t, v, share, b) => {
      expect(nonFinite(loadAtPressure(t, share * b.maxInflationKpa, { vehicle: v }))).toEqual([]);
      if (share > 0) expect(nonFinite(pressureForLoad(t, share * b.maxLoadKg, { vehicle: v }))).toEqual([]);
    });
  });
});

describe("loadIndexNeeded: the least load index a size must have (ISO 4000-1 table; FMVSS 120 S5.1.2 for × 1.10)", () => {
  it("35x12.50R17LT carrying 894 kg needs LI 104 (900 kg; 103 = 875 kg) — ISO 4000-1", () => {
    const r = loadIndexNeeded("35x12.50R17LT", 894);
    expect(r).toMatchObject({ loadIndex: 104, indexLoadKg: 900, ratingNeededKg: 894, tireClass: "light-truck", derated: false });
  });

  it("a passenger size on a light truck needs 1.10 × the load: 285/70R17 for 894 kg → 983.4 kg → LI 108 (1000 kg; 107 = 975 kg)", () => {
    const r = loadIndexNeeded("285/70R17", 894, { vehicle: "light-truck" });
    expect(r.ratingNeededKg).toBeCloseTo(983.4, 6);
    expect(r).toMatchObject({ loadIndex: 108, indexLoadKg: 1000, derated: true, tireClass: "passenger" });
    // On a car the same size needs LI 104 (900 kg).
    expect(loadIndexNeeded("285/70R17", 894, { vehicle: "passenger-car" }).loadIndex).toBe(104);
    // An LT size is never derated.
    expect(loadIndexNeeded("LT285/70R17", 894, { vehicle: "light-truck" }).derated).toBe(false);
  });

  it("a load exactly at a table figure needs that index: 1450 kg → LI 121 (ISO 4000-1: 121 = 1450 kg)", () => {
    expect(loadIndexNeeded("37x12.50R17LT", 1450).loadIndex).toBe(121);
    expect(loadIndexNeeded("37x12.50R17LT", 1450.01).loadIndex).toBe(122);
  });

  it("refuses a load above the table's top, a negative load and a temporary spare, naming the field", () => {
    const top = LOAD_INDEX_KG[MAX_LOAD_INDEX] as number;
    expect(() => loadIndexNeeded("37x12.50R17LT", top + 1)).toThrow(TireLimitError);
    expect(() => loadIndexNeeded("37x12.50R17LT", top + 1)).toThrow(/loadKg: .* above the load of the table's largest index/);
    expect(errorField(() => loadIndexNeeded("37x12.50R17LT", -5))).toBe("loadKg");
    expect(() => loadIndexNeeded("T135/70R16", 300)).toThrow(/temporary spare/);
  });

  it("agrees with pressureForLoad: a tire of that index carries the load at or below its maximum pressure, one index less cannot (property)", () => {
    fc.assert(
      fc.property(
        real(100, 2000),
        fc.constantFrom("passenger-car" as const, "light-truck" as const),
        fc.constantFrom("285/70R17", "35x12.50R17LT"),
        (load, vehicle, size) => {
          const need = loadIndexNeeded(size, load, { vehicle });
          expect(need.indexLoadKg).toBeGreaterThanOrEqual(need.ratingNeededKg);
          expect(LOAD_INDEX_KG[need.loadIndex - 1] as number).toBeLessThan(need.ratingNeededKg);
          // The flotation size needs a load range for its maximum pressure; D is any one of them.
          const withIndex = (li: number) => (size.endsWith("LT") ? `${size} ${li}Q LRD` : `${size} ${li}T`);
          expect(() => pressureForLoad(withIndex(need.loadIndex), load, { vehicle })).not.toThrow();
          expect(() => pressureForLoad(withIndex(need.loadIndex - 1), load, { vehicle })).toThrow(TireLimitError);
        },
      ),
      { numRuns: 300 },
    );
  });
});
