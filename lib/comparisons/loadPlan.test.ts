import { describe, expect, it } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import { planLoad } from "./loadPlan";
import { LOAD_BASE as BASE, LOAD_LABELS as LABELS } from "./loadPlanTestUtil";
import type { DisplayPrefs } from "./format";

const IMPERIAL: DisplayPrefs = { units: "imperial", lengths: "decimal" };

// TRA light-truck load formula, L ∝ P^0.585 (NHTSA, The Pneumatic Tire, 2006): P = Pmax · (L / Lmax)^(1 / 0.585).
const traPsi = (loadKg: number, maxKg: number, maxPsi: number) => maxPsi * (loadKg / maxKg) ** (1 / 0.585);
// P-metric: LI 113 = 1150 kg (ISO 4000-1 load index table) at 35 psi (TRA P-metric standard load, from memory),
// ÷ 1.10 on a light truck (FMVSS 120 S5.1.2). 37x12.50R17LT LRD: LI 124 = 1600 kg at 50 psi (flotation load range D, from memory).
const PLACARD_KG = 1150 / 1.1;
// Road minimum of a flotation tire: 140/240 of its maximum pressure (FMVSS 138 Table 1 ratio applied by proportion, no source).
const MIN_PSI = 50 * (140 / 240);

describe("planLoad", () => {
  it("sets the road minimum when the placard load needs less (P265/70R17 113S at 35 psi → 37x12.50R17LT LRD)", () => {
    const { plan, errors } = planLoad(BASE, LABELS, IMPERIAL);
    expect(errors).toEqual({});
    const front = plan!.axles[0]!;
    expect(front.placardLoadKg).toBeCloseTo(PLACARD_KG, 1);
    expect(front.equivalentKpa).toBeCloseTo(psiToKpa(traPsi(PLACARD_KG, 1600, 50)), 1); // 24.2 psi
    expect(front.pressureToSetKpa).toBeCloseTo(psiToKpa(MIN_PSI), 1); // 29.2 psi
    expect(front.decidedBy).toBe("road minimum");
    // Reserve: 1600 · (29.17/50)^0.585 − 700 (TRA formula).
    expect(front.reserveKg).toBeCloseTo(1600 * (MIN_PSI / 50) ** 0.585 - 700, 1);
    expect(front.abovePlacard).toBe(false);
    expect(plan!.planned.maxLoadKg).toBe(1600);
    expect(plan!.planned.maxPressureKpa).toBeCloseTo(psiToKpa(50), 6);
  });

  it("lets the axle load decide when it is above what the placard tire carries", () => {
    const { plan } = planLoad({ ...BASE, rearAxleKg: 2800 }, LABELS, IMPERIAL);
    const rear = plan!.axles[1]!;
    expect(rear.axleLoadKpa).toBeCloseTo(psiToKpa(traPsi(1400, 1600, 50)), 1); // 39.8 psi
    expect(rear.pressureToSetKpa).toBeCloseTo(rear.axleLoadKpa, 9);
    expect(rear.decidedBy).toBe("axle load");
    expect(rear.abovePlacard).toBe(true);
    expect(rear.reserveKg).toBeCloseTo(0, 6);
  });

  it("refuses an axle load above the planned tire's maximum, beside that field, with nothing computed", () => {
    const { plan, errors } = planLoad({ ...BASE, rearAxleKg: 3400 }, LABELS, IMPERIAL);
    expect(plan).toBeNull();
    // In the field's unit first: 1700 kg = 1700 / 0.45359237 = 3747.9 lb, 1600 kg = 3527.4 lb (NIST SP 811 B.8, 1 lb = 0.45359237 kg exactly).
    expect(errors.rearAxle).toBe(
      "Rear axle load (lb): one tire carries half the axle, and 3,748 lb (1,700 kg) is above the maximum load of 37x12.50R17LT 124Q LRD, " +
        "3,527 lb (1,600 kg) at 50 psi (344.7 kPa); choose a tire with a higher load index or load range.",
    );
    expect(errors.frontAxle).toBeUndefined();
  });

  it("names the placard tire field when the size has no load index", () => {
    const { plan, errors } = planLoad({ ...BASE, placardTire: "265/70R17" }, LABELS, IMPERIAL);
    expect(plan).toBeNull();
    expect(errors.placardTire).toMatch(/^Placard tire size: 265\/70R17 has no load index/);
  });

  it("names the planned tire when it cannot carry the placard load even at its maximum", () => {
    const { errors } = planLoad({ ...BASE, plannedTire: "LT235/75R15 104/101Q LRC" }, LABELS, IMPERIAL);
    expect(errors.plannedTire).toMatch(/^Planned tire: LT235\/75R15/);
  });

  it("names the placard pressure field when it is above what the placard tire allows", () => {
    const { errors } = planLoad({ ...BASE, placardRearKpa: psiToKpa(80) }, LABELS, IMPERIAL);
    expect(errors.placardRear).toMatch(/^Placard pressure, rear \(psi\): /);
    expect(errors.placardFront).toBeUndefined();
  });

  it("draws both tires' load against pressure, rising, with no NaN", () => {
    const { plan } = planLoad(BASE, LABELS, IMPERIAL);
    const pts = plan!.curve.filter((c) => c.plannedKg !== null);
    expect(pts.length).toBeGreaterThan(20);
    for (let i = 1; i < pts.length; i++) expect(pts[i]!.plannedKg!).toBeGreaterThanOrEqual(pts[i - 1]!.plannedKg!);
    expect(plan!.curve.every((c) => Number.isFinite(c.pressureKpa) && (c.placardKg === null || Number.isFinite(c.placardKg)))).toBe(true);
    expect(pts.at(-1)!.plannedKg).toBeCloseTo(1600, 6);
  });
});
