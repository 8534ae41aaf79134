import { describe, expect, it } from "vitest";
import { tirePressureLimits } from "./pressureLimit";
import { TORQUE_BANDS_NM, signStepSchema, signStepSchemaFor, torqueBandRefusal } from "./schema";
import { FIELD_LABEL } from "./vocabulary";

// Conversions by hand, NIST SP 811 B.8 and B.9: 1 ft·lbf = 1.355818 N·m, 1 psi = 6.894757 kPa.
const FT_LB = 1.355818;
const PSI = 6.894757;

/** The message on `field` when the schema refuses, or the recorded data when it accepts. */
function sign(body: object, limits: ReturnType<typeof tirePressureLimits> = null) {
  const r = signStepSchemaFor(limits).safeParse(body);
  if (r.success) return { data: r.data.data as Record<string, unknown> };
  return { issues: Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message])) };
}

const lug = (torque: string, unit: "ftlb" | "nm") => ({ step: "lug_torque", position: "LF", torque, unit, passesDone: true });
const ring = (torque: string, unit: "ftlb" | "nm") => ({
  step: "beadlock",
  position: "LF",
  ringBolts: "24",
  torque,
  unit,
  passesDone: true,
});

describe("a comma in a figure is refused and named as the reason (decimals or thousands? common practice, no source)", () => {
  it("in the cold pressure, with an example in the field's unit", () => {
    const why = "is ambiguous — a comma can mark decimals or thousands; write decimals with a point and no thousands separator";
    const pressure = (p: string, pressureUnit: "psi" | "kPa") => ({ step: "pressure", position: "LF", pressure: p, pressureUnit });
    expect(sign(pressure("32,5", "psi")).issues?.pressure).toBe(`Cold pressure set (psi): "32,5" ${why} (e.g. 35 psi).`);
    expect(sign(pressure("2,2", "kPa")).issues?.pressure).toBe(`Cold pressure set (kPa): "2,2" ${why} (e.g. 240 kPa).`);
    expect(sign({ step: "balance", position: "LF", innerGrams: "12,5", outerGrams: "0" }).issues?.innerGrams).toBe(
      `Inner plane weight (g): "12,5" ${why} (e.g. 12.5).`,
    );
  });
});

/** The whole refusal of a lug-nut torque typed in ft·lb: what was typed (with its N·m) and the likely meaning. */
const lugRefusal = (shown: string, guess: string) =>
  `Maker's torque (ft·lb): ${shown} is outside what lug nuts are torqued to, 29.6 to 516.2 ft·lb (40 to 700 N·m) ` +
  `(common practice, no source): a typo or a figure in the other unit? Did you mean ${guess}? ` +
  "Type the maker's figure in the unit it is given in, e.g. 140 ft·lb.";

describe("torque bands (common practice, no source): typos and unit mix-ups are refused", () => {
  it("refuses lug nuts at 1400 ft·lb = 1898.1 N·m (1400 × 1.355818 = 1898.145), suggesting the slipped digit", () => {
    expect(1400 * FT_LB).toBeCloseTo(1898.145, 3);
    // Band ends in ft·lb by hand, rounded inward: 40 / 1.355818 = 29.502 → 29.6; 700 / 1.355818 = 516.29 → 516.2.
    expect(sign(lug("1400", "ftlb")).issues?.torque).toBe(lugRefusal("1400 ft·lb (1898.1 N·m)", "140 ft·lb"));
  });

  it("the band's message wins beyond the engine's 2000 N·m too: 3000 ft·lb on lug nuts = 4067.5 N·m (3000 × 1.355818 = 4067.454)", () => {
    expect(3000 * FT_LB).toBeCloseTo(4067.454, 3);
    // 300 ft·lb = 406.7 N·m lies in the band (40–700 N·m); 3000 N·m and 30000 ft·lb do not.
    expect(sign(lug("3000", "ftlb")).issues?.torque).toBe(lugRefusal("3000 ft·lb (4067.5 N·m)", "300 ft·lb"));
    // 2500 N·m on ring bolts (5–70 N·m): no tenfold slip lands in the band, so no guess.
    expect(sign(ring("2500", "nm")).issues?.torque).toMatch(
      /^Maker's torque \(N·m\): 2500 N·m \(1843\.9 ft·lb\) is outside what beadlock ring bolts/,
    );
  });

  it("refuses beadlock ring bolts at 150 ft·lb = 203.4 N·m (150 × 1.355818 = 203.37)", () => {
    // 5 / 1.355818 = 3.688 → 3.7; 70 / 1.355818 = 51.629 → 51.6; 15 ft·lb = 20.3 N·m is inside.
    expect(sign(ring("150", "ftlb")).issues?.torque).toBe(
      "Maker's torque (ft·lb): 150 ft·lb (203.4 N·m) is outside what beadlock ring bolts are torqued to, 3.7 to 51.6 ft·lb (5 to 70 N·m) " +
        "(common practice, no source): a typo or a figure in the other unit? Did you mean 15 ft·lb? " +
        "Type the maker's figure in the unit it is given in, e.g. 17 ft·lb.",
    );
  });

  it("suggests the other unit when the figure fits there: 600 ft·lb = 813.5 N·m, but 600 N·m fits", () => {
    expect(600 * FT_LB).toBeCloseTo(813.49, 2);
    expect(torqueBandRefusal(600, "ftlb", "lug_torque", "Maker's torque (ft·lb)")).toMatch(/Did you mean 600 N·m or 60 ft·lb\?/);
    // 35 N·m = 25.8 ft·lb (35 / 1.355818 = 25.814): too low for a lug nut; 35 ft·lb = 47.5 N·m and 350 N·m both fit.
    expect(torqueBandRefusal(35, "nm", "lug_torque", "Maker's torque (N·m)")).toMatch(
      /^Maker's torque \(N·m\): 35 N·m \(25\.8 ft·lb\) is outside what lug nuts are torqued to, 40 to 700 N·m .*Did you mean 35 ft·lb or 350 N·m\? .*e\.g\. 190 N·m\.$/,
    );
  });

  it("accepts every figure shown inside the band and refuses the next 0.1 out", () => {
    // 29.6 × 1.355818 = 40.132 ≥ 40; 29.5 × 1.355818 = 39.997 < 40; 516.2 → 699.87; 516.3 → 700.01.
    expect(sign(lug("29.6", "ftlb")).data?.torqueNm).toBeCloseTo(40.132, 3);
    expect(sign(lug("29.5", "ftlb")).issues?.torque).toMatch(/is outside what lug nuts/);
    expect(sign(lug("516.2", "ftlb")).data?.torqueNm).toBeCloseTo(699.873, 3);
    expect(sign(lug("516.3", "ftlb")).issues?.torque).toMatch(/is outside what lug nuts/);
    // 3.7 × 1.355818 = 5.017 ≥ 5; 3.6 × 1.355818 = 4.881 < 5.
    expect(sign(ring("3.7", "ftlb")).data?.torqueNm).toBeCloseTo(5.017, 3);
    expect(sign(ring("3.6", "ftlb")).issues?.torque).toMatch(/is outside what beadlock ring bolts/);
    expect(sign(ring("70", "nm")).data?.torqueNm).toBe(70);
    expect(sign(ring("70.1", "nm")).issues?.torque).toMatch(/^Maker's torque \(N·m\): 70\.1 N·m \(51\.7 ft·lb\) is outside/);
  });

  it("keeps the usual figures and the shown examples inside their bands", () => {
    for (const [step, band] of Object.entries(TORQUE_BANDS_NM)) {
      for (const unit of ["ftlb", "nm"] as const) {
        expect(torqueBandRefusal(band.example[unit], unit, step as keyof typeof TORQUE_BANDS_NM, "x"), `${step} ${unit}`).toBeNull();
      }
    }
    // 140 ft·lb × 1.355818 = 189.8145 N·m, a light truck's lug nuts; 17 ft·lb = 23.05 N·m, a ring bolt.
    expect(sign(lug("140", "ftlb")).data?.torqueNm).toBeCloseTo(189.8145, 3);
    expect(sign(ring("17", "ftlb")).data?.torqueNm).toBeCloseTo(23.049, 3);
  });

  it("the route's schema applies the same bands", () => {
    expect(signStepSchema.safeParse(lug("1400", "ftlb")).success).toBe(false);
    expect(signStepSchema.safeParse(ring("150", "ftlb")).success).toBe(false);
  });
});

describe("cold pressure against the quoted tire's road minimum", () => {
  // Metric LT load range E: road minimum 320 kPa (FMVSS 138 Table 1, from memory, as the engine applies it)
  // = 320 / 6.894757 = 46.41 psi; maximum 80 psi (load range E, the engine's table).
  const LIMITS = tirePressureLimits("LT285/70R17 121/118Q LRE");
  const pressure = (p: string, unit: "psi" | "kPa", makerTable?: boolean) => ({
    step: "pressure",
    position: "LF",
    pressure: p,
    pressureUnit: unit,
    ...(makerTable === undefined ? {} : { makerTable }),
  });

  it("refuses 30 psi (206.8 kPa) below 46.4 psi (320 kPa), naming the field, the figure as typed and the minimum in both units", () => {
    expect(30 * PSI).toBeCloseTo(206.843, 3);
    expect(sign(pressure("30", "psi"), LIMITS).issues?.pressure).toBe(
      "Cold pressure set (psi): 30 psi (207 kPa) is below the road minimum for LT285/70R17 121/118Q LRE, 46.4 psi (320 kPa) " +
        "(FMVSS 138 Table 1, load range E 320 kPa (from memory)); set at least that, or tick " +
        `"${FIELD_LABEL.makerTable}" only if the tire maker's load table gives this pressure for this load.`,
    );
    expect(sign(pressure("207", "kPa"), LIMITS).issues?.pressure).toMatch(
      /^Cold pressure set \(kPa\): 207 kPa \(30 psi\) is below the road minimum for LT285\/70R17 121\/118Q LRE, 320 kPa \(46\.4 psi\)/,
    );
  });

  it("accepts the minimum as the card shows it: 46.4 psi = 319.92 kPa, 319.5 kPa; refuses 46.3 psi = 319.23 kPa and 319 kPa", () => {
    expect(46.4 * PSI).toBeCloseTo(319.917, 3);
    expect(sign(pressure("46.4", "psi"), LIMITS).data?.pressureKpa).toBeCloseTo(319.917, 3);
    expect(sign(pressure("319.5", "kPa"), LIMITS).data?.pressureKpa).toBe(319.5);
    expect(sign(pressure("46.3", "psi"), LIMITS).issues?.pressure).toMatch(/is below the road minimum/);
    expect(sign(pressure("319", "kPa"), LIMITS).issues?.pressure).toMatch(/is below the road minimum/);
  });

  it("accepts a figure below the minimum on the technician's tick for the maker's load table, never one above the maximum", () => {
    expect(sign(pressure("30", "psi", true), LIMITS).data).toEqual({
      pressureKpa: expect.closeTo(30 * PSI, 4),
      unit: "psi",
      makerTable: true,
    });
    // 95 psi = 655 kPa is above load range E's 80 psi whatever is ticked.
    expect(sign(pressure("95", "psi", true), LIMITS).issues?.pressure).toMatch(/^Cold pressure set \(psi\): 95 psi \(655 kPa\) is above/);
    expect(sign(pressure("40", "psi", "yes" as unknown as boolean), LIMITS).issues?.makerTable).toMatch(/^Below the road minimum/);
  });

  it("without the tire's limits (the route's schema: the server checks them once it has read the quote) only the wide range holds", () => {
    expect(signStepSchema.safeParse(pressure("30", "psi")).success).toBe(true);
    expect(sign(pressure("30", "psi"), null).data).toEqual({ pressureKpa: expect.closeTo(30 * PSI, 4), unit: "psi", makerTable: false });
  });
});
