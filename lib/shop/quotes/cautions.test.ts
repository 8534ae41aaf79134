import { describe, expect, it } from "vitest";
import { quotePressure } from "@/lib/shop/customers/counterPlacard";
import { COUNTER_PLACARD } from "@/lib/shop/customers/placardTestUtil";
import { quoteAngles } from "@/lib/shop/customers/counterBodyPoints";
import { quoteCautions } from "./cautions";
import { fitmentChangeRows, summarize } from "./fitment";

const current = { boltPattern: "6x5.5", tireSize: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
const LIFT = /^Lift and steering changes/;

describe("quote cautions", () => {
  const fit = summarize(current, "265/70R17", { diameterIn: 17, widthIn: 8, offsetMm: 25, beadlock: false });
  const lift = (f: Parameters<typeof quoteCautions>[0]) => quoteCautions(f).some((c) => LIFT.test(c));

  it("the lift and steering caution follows the diameter change: more than 50 mm either way (common practice, no source)", () => {
    expect(lift({ ...fit, diameterChangeMm: 50 })).toBe(false);
    expect(lift({ ...fit, diameterChangeMm: 50.1 })).toBe(true);
    expect(lift({ ...fit, diameterChangeMm: -50.1 })).toBe(true);
  });

  it("and not the words of a modification (a stored quote keeps its figures, not always its findings)", () => {
    const worded = {
      ...fit,
      diameterChangeMm: 20,
      modifications: ["A lift or levelling kit is usually needed for this much extra diameter; follow the lift maker's instructions."],
    };
    expect(lift(worded)).toBe(false);
  });

  it("a 315/70R17 (+70 mm, ISO 4000-1: D = d + 2H) on a beadlock wheel: bead seating, fasteners, beadlock rings, lift, nominal figures", () => {
    const big = summarize(current, "315/70R17", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: true });
    expect(quoteCautions(big).map((c) => c.split(":")[0]!.split(" ")[0])).toEqual(["Bead", "Wheel", "Cold", "Beadlock", "Lift", "All"]);
  });

  it("bounds the cold pressure by the quoted tire's limits, and defers to the placard and the tire maker", () => {
    // Flotation load range E: 65 psi (the engine's table, from memory); road minimum 58.3 % of it
    // = 37.9 psi (FMVSS 138 Table 1 ratio by proportion); 1 psi = 6.894757 kPa (NIST SP 811).
    const lt = summarize(current, "35x12.50R17LT 121Q E", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: false });
    const c = quoteCautions(lt).find((x) => x.startsWith("Cold pressure"))!;
    expect(c).toContain("35x12.50R17LT 121Q LRE allows at most 65 psi (448 kPa); road minimum 37.9 psi (261 kPa).");
    expect(c).toMatch(/door placard and the tire maker's load table/);
    expect(c).toMatch(/Never inflate above the maximum on the sidewall or the wheel\.$/);
    // A size without its load index says no limit: the caution stays, without figures.
    expect(quoteCautions(fit).find((x) => x.startsWith("Cold pressure"))).not.toMatch(/allows at most/);
  });

  it("with the counter's placard, gives the pressure to set per axle instead; without axle figures or a load index, says why", () => {
    const placard = COUNTER_PLACARD;
    const setups = {
      current: { ...fit.setups.current, tire: "265/70R17 113T" },
      planned: { ...fit.setups.planned, tire: "285/70R17 117T" },
    };
    // 250 kPa × (L113 / L117)² at 35 psi: 193 kPa = 28 psi (TRA passenger load formula, NHTSA "The Pneumatic Tire", 2006;
    // worked in lib/shop/customers/counterPlacard.test.ts).
    const pressure = quotePressure(placard, setups.current, setups.planned);
    const c = quoteCautions({ ...fit, pressure }).find((x) => x.startsWith("Cold pressure"))!;
    expect(c).toMatch(/^Cold pressure to set for 285\/70R17 117T: front 28 psi \(193 kPa\), rear 28 psi \(193 kPa\)/);
    expect(c).toMatch(/Never inflate above the sidewall maximum/);
    const noLoads = quotePressure({ ...placard, frontAxleKg: null, rearAxleKg: null }, setups.current, setups.planned);
    const d = quoteCautions({ ...fit, pressure: noLoads }).find((x) => x.startsWith("Cold pressure"))!;
    expect(d).toMatch(/door placard and the tire maker's load table/);
    expect(d).toMatch(/Enter the axle weights \(scale ticket\) or the axle ratings \(GAWR\)/);
  });

  it("with the counter's body points, the angle rows (now → quoted) and their caution, with any angle left out said why", () => {
    const big = summarize(current, "35x12.50R17LT", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: false });
    const points = {
      units: "metric" as const,
      frontCornerHeightMm: 750,
      frontCornerAheadMm: 900,
      rearCornerHeightMm: null,
      rearCornerBehindMm: null,
    };
    const angles = quoteAngles({ ...points, midHeightMm: null, wheelbaseMm: null }, big.setups.current, big.setups.planned);
    // 45.7° → 48.6°: the tangent construction worked in lib/shop/customers/counterBodyPoints.test.ts (SAE J1100 definition).
    expect(fitmentChangeRows({ ...big, angles })).toContainEqual(["Approach angle", "45.7° → 48.6°"]);
    expect(fitmentChangeRows(big).some(([k]) => /angle/.test(k))).toBe(false);
    const c = quoteCautions({ ...big, angles: { ...angles, messages: ["Ramp breakover: not computed."] } });
    expect(c.find((x) => x.startsWith("Trail angles:"))).toMatch(
      /measured with the current tires.*vehicle maker's guidance\. Ramp breakover: not computed\.$/,
    );
    expect(quoteCautions(big).some((x) => x.startsWith("Trail angles:"))).toBe(false);
  });
});
