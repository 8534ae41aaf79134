import { describe, expect, it } from "vitest";
import { lbToKg, psiToKpa } from "@/lib/fitment";
import { axleLoadsOf, checkLoadProfile, emptyProfile, profileLabels } from "./loadProfile";
import { DEMO_CURRENT, DEMO_PROFILE } from "./loadTestUtil";

const CURRENT = DEMO_CURRENT;
const FULL = DEMO_PROFILE;

describe("checkLoadProfile", () => {
  it("accepts a whole profile and an empty one", () => {
    expect(checkLoadProfile(FULL, CURRENT)).toEqual({});
    expect(checkLoadProfile(emptyProfile("metric"), CURRENT)).toEqual({});
  });

  it("refuses a placard pressure above what the placard tire allows, naming the field in the screen's unit", () => {
    // Standard-load metric passenger tire: 350 kPa (50.8 psi) highest inflation, as the engine's
    // table has it (ETRTO standard-load maximum, from memory).
    const e = checkLoadProfile({ ...FULL, placardFrontKpa: psiToKpa(58) }, CURRENT);
    expect(e.placardFrontKpa).toMatch(/^Placard cold pressure, front \(psi\): .*above the highest pressure 265\/70R17 113T allows/);
    expect(e.placardFrontKpa).toContain("never inflate above the sidewall maximum");
  });

  it("refuses axle weights one tire cannot carry: half the axle above the load index, ÷ 1.10 on a light truck", () => {
    // Load index 113 = 1150 kg (ISO 4000-1 / ETRTO load index table); a passenger tire on a light
    // truck carries 1150 / 1.10 = 1045.5 kg (TRA light-truck rule for P-type tires).
    const ok = checkLoadProfile({ ...FULL, frontAxleKg: 2080, rearAxleKg: 2080 }, CURRENT);
    expect(ok).toEqual({});
    const over = checkLoadProfile({ ...FULL, frontAxleKg: 2100, rearAxleKg: 1200 }, CURRENT);
    // In the field's unit first: 1050 kg = 1050 / 0.45359237 = 2314.85 lb (NIST SP 811 B.8: 1 lb = 0.45359237 kg exactly).
    expect(over.frontAxleKg).toMatch(
      /^Front axle weight, scale ticket \(lb\): one tire carries half the axle, and 2,315 lb \(1,050 kg\) is above/,
    );
    expect(over.rearAxleKg).toBeUndefined();
    const asCar = checkLoadProfile({ ...FULL, vehicleKind: "passenger-car", frontAxleKg: 2100, rearAxleKg: 1200 }, CURRENT);
    expect(asCar).toEqual({});
  });

  it("gives loads in lb, the unit the fields are in, with the engine's kg beside them (1 lb = 0.45359237 kg exactly, NIST SP 811 B.8)", () => {
    // A 7800 lb rear axle: 3900 lb per tire = 3900 × 0.45359237 = 1769.01 kg; the tire's 1150 / 1.10 = 1045.45 kg
    // (LI 113, ISO 4000-1 load index table; ÷ 1.10 on a light truck, FMVSS 120 S5.1.2) = 1045.45 / 0.45359237 = 2304.8 lb.
    expect(3900 * 0.45359237).toBeCloseTo(1769.01, 2);
    const e = checkLoadProfile({ ...FULL, rearAxleKg: lbToKg(7800) }, CURRENT);
    expect(e.rearAxleKg).toBe(
      "Rear axle weight, scale ticket (lb): one tire carries half the axle, and 3,900 lb (1,769 kg) is above the maximum load of " +
        "265/70R17 113T, 2,305 lb (1,045.5 kg) at 36.3 psi (250 kPa) (÷ 1.10 on a light truck); choose a tire with a higher load index or load range.",
    );
    // The metric screen keeps the engine's kg, grouped by thousands as the imperial screen groups them.
    expect(checkLoadProfile({ ...FULL, units: "metric", rearAxleKg: lbToKg(7800) }, CURRENT).rearAxleKg).toMatch(
      /^Rear axle weight, scale ticket \(kg\): one tire carries half the axle, and 1,769 kg is above the maximum load of 265\/70R17 113T, 1,045\.5 kg at 250 kPa/,
    );
  });

  it("checks the axle ratings against the placard tire as well", () => {
    const e = checkLoadProfile({ ...FULL, rearGawrKg: 2300 }, CURRENT);
    expect(e.rearGawrKg).toMatch(/^Rear axle rating, GAWR \(lb\): one tire carries half the axle/);
  });

  it("refuses a body point inside the current tire's circle (SAE J1100 geometry, the engine's check)", () => {
    // Radius 401.4 mm, centre 401.4 mm up: a point 100 mm ahead at 300 mm is 142 mm from the centre.
    const e = checkLoadProfile({ ...FULL, frontCornerHeightMm: 300, frontCornerAheadMm: 100 }, CURRENT);
    expect(e.frontCornerHeightMm).toMatch(/^Front corner height \(in\): the body point .* is inside the tire's circle/);
    expect(e.frontCornerHeightMm).toContain("measured with the current tire, 265/70R17 113T");
  });

  it("refuses negative and absurd figures with the bounds in the field's unit (1 lb = 0.45359237 kg, NIST SP 811)", () => {
    const e = checkLoadProfile({ ...FULL, frontAxleKg: -5, midHeightMm: 5000, placardRearKpa: 30 }, CURRENT);
    expect(e.frontAxleKg).toBe("Front axle weight, scale ticket (lb): must be between 221 and 44092 lb, e.g. 3100.");
    expect(e.midHeightMm).toMatch(/^Lowest point midway, height \(in\): must be between 0\.04 and 118\.11 in/);
    expect(e.placardRearKpa).toMatch(/^Placard cold pressure, rear \(psi\): must be between 14\.6 and/);
    const m = checkLoadProfile({ ...FULL, units: "metric", frontAxleKg: -5 }, CURRENT);
    expect(m.frontAxleKg).toBe("Front axle weight, scale ticket (kg): must be between 100 and 20000 kg, e.g. 1400.");
  });

  it("keeps groups whole: a placard size without pressures, a height without its distance", () => {
    const e = checkLoadProfile({ ...emptyProfile("metric"), placardTire: "265/70R17 113T", midHeightMm: 280 }, CURRENT);
    expect(e.placardFrontKpa).toBe(
      "Placard cold pressure, front (kPa): enter it too, or clear the others: the placard's size and both cold pressures go together.",
    );
    expect(e.placardRearKpa).toBeDefined();
    expect(e.wheelbaseMm).toMatch(/^Wheelbase \(mm\): enter it too/);
    expect(e.placardTire).toBeUndefined();
  });

  it("refuses a placard size that does not read, with an accepted example", () => {
    const e = checkLoadProfile({ ...FULL, placardTire: "big ones" }, CURRENT);
    expect(e.placardTire).toMatch(/^Tire size on the placard: .*accepted forms/);
  });
});

describe("profileLabels", () => {
  it("follows the unit system", () => {
    expect(profileLabels("imperial").placardFrontKpa).toBe("Placard cold pressure, front (psi)");
    expect(profileLabels("metric").placardFrontKpa).toBe("Placard cold pressure, front (kPa)");
    expect(profileLabels("metric").wheelbaseMm).toBe("Wheelbase (mm)");
  });
});

describe("axleLoadsOf", () => {
  it("prefers the scale ticket, then the axle ratings", () => {
    expect(axleLoadsOf(FULL)?.from).toBe("scale ticket");
    expect(axleLoadsOf({ ...FULL, frontAxleKg: null, rearAxleKg: null })).toEqual({
      frontKg: lbToKg(3700),
      rearKg: lbToKg(3900),
      from: "GAWR axle ratings",
    });
    expect(axleLoadsOf(emptyProfile("imperial"))).toBeNull();
  });
});
