import { describe, expect, it } from "vitest";
import { lbToKg, psiToKpa } from "@/lib/fitment";
import { CUR, PLAN } from "@/lib/garage/testUtil";
import type { Setup } from "@/lib/setup/model";
import { COUNTER_PLACARD } from "./placardTestUtil";
import { placardSchema, pressureToSetText, quotePressure } from "./counterPlacard";

// The invented counter truck: placarded for 265/70R17 113T at 35 psi, weighed on a scale.
const CURRENT: Setup = { ...CUR, tire: "265/70R17 113T" };
const TIRE = { text: "265/70R17 113T", diameterMm: 802.8 };
const PLACARD = COUNTER_PLACARD;
const parse = (v: unknown) => placardSchema(() => TIRE).safeParse(v);
const messages = (v: unknown) => {
  const r = parse(v);
  return r.success ? {} : Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message]));
};

describe("quotePressure: the cold pressure to set per axle from a counter vehicle's placard", () => {
  it("a 285/70R17 117T quoted on a truck placarded for 265/70R17 113T at 35 psi: the equivalent pressure by the TRA load formula", () => {
    const p = quotePressure(PLACARD, CURRENT, { ...PLAN, tire: "285/70R17 117T", wheelWidthIn: 8 });
    if ("missing" in p) throw new Error(p.missing);
    // TRA load formula, passenger form L ∝ P^0.5 (as reproduced in NHTSA, "The Pneumatic Tire", 2006):
    // placard tire LI 113 = 1150 kg (ISO 4000-1 load-index table) at 250 kPa (standard-load reference,
    // from memory), ÷ 1.10 for a P-type tire on a light truck (TRA); at 35 psi = 241.32 kPa (NIST SP 811).
    const placardKg = (1150 / 1.1) * Math.sqrt(psiToKpa(35) / 250);
    // Quoted tire LI 117 = 1285 kg, ÷ 1.10, at 250 kPa; P = 250 × (L / Lmax)² carries the same load.
    const expected = 250 * (placardKg / (1285 / 1.1)) ** 2;
    expect(expected).toBeCloseTo(193.3, 1); // 28.0 psi
    expect(p.axles.map((a) => a.axle)).toEqual(["front", "rear"]);
    for (const a of p.axles) {
      expect(a.kpa).toBeCloseTo(expected, 1);
      expect(a.decidedBy).toBe("placard");
    }
    expect(p.from).toBe("scale ticket");
    const text = pressureToSetText(p);
    expect(text).toMatch(/^Cold pressure to set for 285\/70R17 117T: front 28 psi \(193 kPa\), rear 28 psi \(193 kPa\)/);
    expect(text).toMatch(/Never inflate above the sidewall maximum/);
    expect(text).toMatch(/vehicle placard and the tire maker's load table take precedence/);
  });

  it("a 37x12.50R17LT load range D: the TRA light-truck exponent 0.585 gives less than the road minimum, which is set", () => {
    const p = quotePressure(PLACARD, CURRENT, { ...PLAN, tire: "37x12.50R17LT 124Q LRD" });
    if ("missing" in p) throw new Error(p.missing);
    // P = 50 psi × (L / 1600 kg)^(1/0.585) (TRA; NHTSA "The Pneumatic Tire", 2006) ≈ 27.2 psi, below
    // the flotation road minimum 0.5833 × 50 psi = 29.2 psi (the engine's FMVSS 138 proportion).
    const placardKg = (1150 / 1.1) * Math.sqrt(psiToKpa(35) / 250);
    expect(psiToKpa(50) * (placardKg / 1600) ** (1 / 0.585)).toBeLessThan(psiToKpa(29.2));
    expect(p.axles[0]!.decidedBy).toBe("road minimum");
    expect(p.axles[0]!.kpa).toBeCloseTo(psiToKpa(50) * 0.5833, 0);
    expect(p.maxKpa).toBeCloseTo(psiToKpa(50), 0);
  });

  it("the vehicle kind the counter chose: a passenger tire quoted on a car vs on a light truck gets different pressures", () => {
    // An invented van placarded for LT245/75R17 121/118S LRE at 35 psi, quoted a passenger 265/70R17 113T.
    const placard = { ...PLACARD, placardTire: "LT245/75R17 121/118S LRE" };
    const current: Setup = { ...CUR, tire: "LT245/75R17 121/118S LRE" };
    const planned: Setup = { ...PLAN, tire: "265/70R17 113T", wheelWidthIn: 8 };
    const car = quotePressure({ ...placard, vehicleKind: "passenger-car" }, current, planned);
    const truck = quotePressure({ ...placard, vehicleKind: "light-truck" }, current, planned);
    if ("missing" in car || "missing" in truck) throw new Error("no pressure");
    // TRA light-truck load formula L ∝ P^0.585 (NHTSA "The Pneumatic Tire", 2006): LI 121 = 1450 kg
    // (ISO 4000-1 load-index table) at the load range E maximum, 80 psi, so at 35 psi it carries
    // 1450 × (35 / 80)^0.585 = 894.0 kg. The passenger tire, TRA passenger form L ∝ P^0.5: LI 113 =
    // 1150 kg at 250 kPa (standard-load reference, from memory); on a light truck its load is divided
    // by 1.10 (TRA; FMVSS 120 S5.1.2), so the same 894.0 kg needs 1.10² = 1.21 times the pressure.
    const placardKg = 1450 * (35 / 80) ** 0.585;
    expect(placardKg).toBeCloseTo(894.0, 1);
    const onCar = 250 * (placardKg / 1150) ** 2;
    const onTruck = 250 * (placardKg / (1150 / 1.1)) ** 2;
    expect(onCar).toBeCloseTo(151.1, 1); // 21.9 psi
    expect(onTruck).toBeCloseTo(182.8, 1); // 26.5 psi
    for (const a of car.axles) expect([a.kpa, a.decidedBy]).toEqual([expect.closeTo(onCar, 1), "placard"]);
    for (const a of truck.axles) expect([a.kpa, a.decidedBy]).toEqual([expect.closeTo(onTruck, 1), "placard"]);
  });

  it("uses the axle ratings without a scale ticket", () => {
    const p = quotePressure(
      { ...PLACARD, frontAxleKg: null, rearAxleKg: null, frontGawrKg: lbToKg(3700), rearGawrKg: lbToKg(3900) },
      CURRENT,
      {
        ...PLAN,
        tire: "37x12.50R17LT 124Q LRD",
      },
    );
    expect("from" in p && p.from).toBe("GAWR axle ratings");
  });

  it("says so when the quoted tire names no load index, and when no axle figure was given", () => {
    const none = quotePressure(PLACARD, CURRENT, { ...PLAN, tire: "35x12.50R17LT" });
    expect("missing" in none && none.missing).toMatch(
      /^No pressure to set for 35x12.50R17LT: the quoted tire's size must carry a load index/,
    );
    const noLoads = quotePressure({ ...PLACARD, frontAxleKg: null, rearAxleKg: null }, CURRENT, PLAN);
    expect("missing" in noLoads && noLoads.missing).toMatch(/axle weights \(scale ticket\) or the axle ratings \(GAWR\)/);
  });
});

describe("placardSchema: the garage's load checks, messages naming the fields as the counter labels them", () => {
  it("keeps a whole placard in SI and reads nothing typed as no placard", () => {
    expect(parse(PLACARD)).toEqual({ success: true, data: PLACARD });
    expect(parse({ units: "metric", placardTire: " " })).toEqual({ success: true, data: null });
  });

  it("refuses a placard size without its pressures, and a lone axle weight, naming the fields", () => {
    expect(messages({ ...PLACARD, placardRearKpa: null })).toEqual({
      placardRearKpa: expect.stringMatching(/^Placard cold pressure, rear \(psi\): enter it too/),
    });
    expect(messages({ units: "metric", frontAxleKg: 1400, rearAxleKg: 1300 })).toEqual({
      placardTire: expect.stringMatching(/^Tire size on the placard: enter it/),
    });
  });

  it("refuses an axle the placard tire cannot carry, in the unit system it was typed in", () => {
    const m = messages({ ...PLACARD, units: "metric", frontAxleKg: 2600 });
    expect(m.frontAxleKg).toMatch(/^Front axle weight, scale ticket \(kg\):/);
  });
});
