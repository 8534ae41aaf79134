import { describe, expect, it } from "vitest";
import { lbToKg, psiToKpa } from "@/lib/fitment";
import type { Setup } from "@/lib/setup/model";
import { loadToCarry, missingText, setupFigures } from "./loadFigures";
import { emptyProfile } from "./loadProfile";
import { DEMO_PROFILE } from "./loadTestUtil";
import { CUR, PLAN } from "./testUtil";

// The vehicle on its placard size; the planned fit a 37 in flotation tire, load range D.
const CURRENT: Setup = { ...CUR, tire: "265/70R17 113T" };
const PLANNED: Setup = { ...PLAN, tire: "37x12.50R17LT 124Q LRD" };
const DEG = 180 / Math.PI;

// The SAE J1100 approach angle by the tangent from a point to a circle (handbook geometry): a body
// point d ahead of the axle and h high, a tire of radius r on the ground: θ = atan((h − r)/d) + asin(r/√(d² + (h − r)²)).
const tangentDeg = (r: number, d: number, h: number) => (Math.atan2(h - r, d) + Math.asin(r / Math.hypot(d, h - r))) * DEG;

describe("setupFigures: a 37x12.50R17LT load range D on a truck placarded for 265/70R17 113T at 35 psi", () => {
  const f = setupFigures(DEMO_PROFILE, CURRENT, PLANNED, "imperial");

  it("gives the equivalent pressure by the TRA load formula and sets the road minimum above it", () => {
    // Placard tire at 35 psi = 241.32 kPa: 1150 kg (LI 113, ISO 4000-1 table) ÷ 1.10 (P-type tire on a
    // light truck, TRA) = 1045.45 kg at 250 kPa, × (241.32/250)^0.5 (passenger exponent) = 1027.1 kg.
    const placardKg = (1150 / 1.1) * Math.sqrt(psiToKpa(35) / 250);
    // Planned: LI 124 = 1600 kg at the load-range D flotation maximum of 50 psi (the engine's table,
    // from memory); P = Pmax × (L/Lmax)^(1/0.585) (TRA light-truck exponent, NHTSA "The Pneumatic Tire" 2006).
    const equivalentKpa = psiToKpa(50) * (placardKg / 1600) ** (1 / 0.585);
    expect(f.load?.from).toBe("scale ticket");
    expect(f.load?.messages).toEqual([]);
    const front = f.load!.plan!.axles[0]!;
    expect(front.placardLoadKg).toBeCloseTo(placardKg, 1);
    expect(front.equivalentKpa).toBeCloseTo(equivalentKpa, 0);
    // Road minimum for flotation LRD: 0.5833 × 50 psi = 29.2 psi (the engine's FMVSS 138 proportion).
    expect(front.pressureToSetKpa).toBeGreaterThan(front.equivalentKpa);
    expect(front.decidedBy).toBe("road minimum");
  });

  it("raises each body point by the radius change and gives the steeper angles", () => {
    // 802.8 mm (265/70R17) and 939.8 mm (37 in × 25.4) across: ISO 4000-1 / TRA designation arithmetic.
    const rc = 802.8 / 2;
    const rp = 939.8 / 2;
    const approach = f.angles.find((a) => a.kind === "approach")!;
    expect(approach.currentDeg).toBeCloseTo(tangentDeg(rc, 840, 635), 1);
    expect(approach.plannedDeg).toBeCloseTo(tangentDeg(rp, 840, 635 + (rp - rc)), 1);
    const departure = f.angles.find((a) => a.kind === "departure")!;
    expect(departure.plannedDeg - departure.currentDeg).toBeCloseTo(tangentDeg(rp, 1120, 686 + rp - rc) - tangentDeg(rc, 1120, 686), 1);
    expect(f.angles.map((a) => a.kind)).toEqual(["approach", "departure", "breakover"]);
    expect(f.angleMessages).toEqual([]);
  });

  it("uses the axle ratings without a scale ticket, and says so", () => {
    const g = setupFigures({ ...DEMO_PROFILE, frontAxleKg: null, rearAxleKg: null }, CURRENT, PLANNED, "metric");
    expect(g.load?.from).toBe("GAWR axle ratings");
  });

  it("reports a planned tire that cannot carry the placard load instead of a pressure", () => {
    const small: Setup = { ...PLANNED, tire: "225/65R17 102H" };
    const g = setupFigures(
      { ...DEMO_PROFILE, vehicleKind: "light-truck", frontAxleKg: 2150, rearAxleKg: 1500 },
      CURRENT,
      small,
      "imperial",
    );
    expect(g.load?.plan).toBeNull();
    // LI 102 = 850 kg (ISO 4000-1 table) ÷ 1.10 on a light truck = 773 kg, below the placard tire's 1027 kg.
    // The imperial display gives lb first (1 lb = 0.45359237 kg exactly, NIST SP 811 B.8): 773 kg = 1704.2 lb, 1027 kg = 2264.2 lb.
    expect(g.load?.messages[0]).toMatch(
      /^Planned tire: 225\/65R17 102H carries at most 1,704 lb \(773 kg\) at its maximum 36 psi, less than the 2,264 lb \(1,027 kg\) 265\/70R17 113T carries/,
    );
  });

  it("is empty without the figures, and says what to add", () => {
    const e = setupFigures(emptyProfile("imperial"), CURRENT, PLANNED, "imperial");
    expect(e.load).toBeNull();
    expect(e.angles).toEqual([]);
    expect(missingText(null).load).toMatch(/placard/);
    expect(missingText(DEMO_PROFILE)).toEqual({ load: null, angles: null });
  });
});

describe("loadToCarry: what one planned tire must carry on the demo truck", () => {
  // 265/70R17 113T: LI 113 = 1150 kg (ISO 4000-1) at 250 kPa (ETRTO standard load, from memory); on a
  // light truck ÷ 1.10 (FMVSS 120 S5.1.2) = 1045.45 kg; at 35 psi = 241.317 kPa (NIST SP 811) it carries
  // 1045.45 × (241.317 / 250)^0.5 = 1027.15 kg (TRA passenger formula, by hand).
  const placardKg = (1150 / 1.1) * Math.sqrt(psiToKpa(35) / 250);

  it("is what the placard tire carries at the placard pressure when that is above each axle's share", () => {
    expect(placardKg).toBeCloseTo(1027.15, 1);
    const r = loadToCarry(DEMO_PROFILE)!;
    // Front share 3150 lb / 2 = 714.4 kg (NIST SP 811: 1 lb = 0.45359237 kg) is below it.
    expect(r).toMatchObject({ axle: "front", decidedBy: "placard", from: "scale ticket" });
    expect(r.loadKg).toBeCloseTo(placardKg, 6);
  });

  it("is the axle's share when the truck is loaded above the placard tire's capacity (scale ticket 5000 lb rear)", () => {
    const r = loadToCarry({ ...DEMO_PROFILE, rearAxleKg: lbToKg(5000) })!;
    expect(r).toMatchObject({ axle: "rear", decidedBy: "axle load" });
    expect(r.loadKg).toBeCloseTo(lbToKg(2500), 6); // 1133.98 kg
  });

  it("reads the axle ratings without a scale ticket, and is null without a placard or loads", () => {
    const noTicket = { ...DEMO_PROFILE, frontAxleKg: null, rearAxleKg: null };
    expect(loadToCarry(noTicket)?.from).toBe("GAWR axle ratings");
    expect(loadToCarry({ ...DEMO_PROFILE, placardTire: null })).toBeNull();
    expect(loadToCarry({ ...noTicket, frontGawrKg: null })).toBeNull();
  });
});
