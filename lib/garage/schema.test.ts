import { describe, expect, it } from "vitest";
import { clearanceSchema, vehicleMarginSchema, garageVehicleSchema } from "./schema";
import { issueAt } from "@/lib/setup/testUtil";
import { CUR } from "./testUtil";

/** The vehicle form's required fields, filled in. */
const REQUIRED = { name: "A", frontSuspension: "independent", boltPattern: "6x5.5", stockSetup: CUR, currentSetup: CUR };
/** The vehicle form: `fields` over the required ones. */
const vehicleForm = (fields: Record<string, unknown>) => ({ ...REQUIRED, ...fields });

describe("vehicle schema", () => {
  it("normalizes the bolt pattern: 5x4.5 and 5x114.3 are one pattern", () => {
    const a = garageVehicleSchema.parse(vehicleForm({ boltPattern: "5 on 4.5" }));
    expect(a.boltPattern).toBe("5x4.5");
    expect(a.year).toBeNull();
    expect(a.notes).toBe("");
  });
});

describe("units in the garage forms: a field reads the unit its label states", () => {
  it("lift height: typed in inches, its bound stated in inches, its example accepted", () => {
    const r = garageVehicleSchema.safeParse(vehicleForm({ liftHeightMm: "25" }));
    // 500 mm / 25.4 = 19.685 in, stated inward as 19.68 in.
    expect(issueAt(r, "liftHeightMm")).toBe("Lift height (in): must be between 0 and 19.68 in, e.g. 2-1/2 or 2.5.");
    expect(garageVehicleSchema.parse(vehicleForm({ liftHeightMm: "2-1/2" })).liftHeightMm).toBeCloseTo(63.5, 9);
    expect(garageVehicleSchema.parse(vehicleForm({ liftHeightMm: "2½" })).liftHeightMm).toBeCloseTo(63.5, 9);
    expect(garageVehicleSchema.parse(vehicleForm({ liftHeightMm: "2.5" })).liftHeightMm).toBeCloseTo(63.5, 9);
    expect(issueAt(garageVehicleSchema.safeParse(vehicleForm({ liftHeightMm: "lots" })), "liftHeightMm")).toBe(
      "Lift height (in): not a length in inches, e.g. 2-1/2 or 2.5.",
    );
  });

  it("names each field as the vehicle form labels it", () => {
    const r = garageVehicleSchema.safeParse(
      vehicleForm({ year: "1800", hubBoreMm: "3/4", axleRatio: "x", transmissionRatio: "20", kingpinInclinationDeg: "40" }),
    );
    expect(issueAt(r, "year")).toBe("Year: must be between 1900 and 2100, e.g. 2009.");
    expect(issueAt(r, "hubBoreMm")).toMatch(/^Hub bore \(mm\): “3\/4” is a fraction/);
    expect(issueAt(r, "axleRatio")).toBe("Axle ratio: enter a number, e.g. 3.73.");
    expect(issueAt(r, "transmissionRatio")).toBe("Top-gear ratio: must be between 0.3 and 10, e.g. 0.72.");
    expect(issueAt(r, "kingpinInclinationDeg")).toBe("Kingpin inclination (°): must be between 0 and 30°, e.g. 8.");
  });
});

describe("clearance input", () => {
  it("needs a unit: in the text or given apart", () => {
    const bare = clearanceSchema.safeParse({ label: "x", direction: "upward", distance: "38", suspensionState: "full-stuff" });
    expect(bare.success).toBe(false);
    expect(bare.error!.issues[0]!.message).toMatch(/Say which unit 38 is in/);
    expect(
      clearanceSchema.parse({ label: "x", direction: "upward", distance: "1-1/2", unit: "in", suspensionState: "full-stuff" }).distanceMm,
    ).toBeCloseTo(38.1, 9);
    expect(
      clearanceSchema.parse({ label: "x", direction: "upward", distance: "38 mm", unit: "in", suspensionState: "full-stuff" }).distanceMm,
    ).toBe(38);
    // A fraction with mm as the unit is not 1.5 mm.
    expect(
      clearanceSchema.safeParse({ label: "x", direction: "upward", distance: "1-1/2", unit: "mm", suspensionState: "full-stuff" }).success,
    ).toBe(false);
  });
});

describe("the vehicle's clearance margin", () => {
  it("reads blank as the 1/2 in default (common practice, no source), fractions as inches (1 in = 25.4 mm, NIST SP 811)", () => {
    expect(vehicleMarginSchema.parse("")).toBeCloseTo(12.7, 9);
    expect(vehicleMarginSchema.parse("  ")).toBeCloseTo(12.7, 9);
    expect(vehicleMarginSchema.parse(null)).toBeCloseTo(12.7, 9);
    expect(vehicleMarginSchema.parse(undefined)).toBeCloseTo(12.7, 9);
    expect(vehicleMarginSchema.parse("3/4")).toBeCloseTo(19.05, 9);
    expect(vehicleMarginSchema.parse("15 mm")).toBe(15);
    expect(vehicleMarginSchema.parse(20)).toBe(20);
  });

  it("says what a margin looks like when it cannot read one, and keeps it within 0–100 mm", () => {
    const msg = (v: unknown) => vehicleMarginSchema.safeParse(v).error?.issues[0]?.message;
    expect(msg("lots")).toBe("Clearance margin: not a length, e.g. 1/2 in or 12 mm.");
    expect(msg("-2 mm")).toBe("Clearance margin: cannot be negative, e.g. 1/2 in or 12 mm.");
    // 100 mm / 25.4 = 3.937 in, stated inward as 3.93 in (NIST SP 811).
    expect(msg("5 in")).toBe("Clearance margin: keep it at most 100 mm (3.93 in), e.g. 1/2 in or 12 mm.");
  });

  it("refuses a bare number in the margin (its label states no unit) instead of guessing inches", () => {
    const msg = (v: unknown) => vehicleMarginSchema.safeParse(v).error?.issues[0]?.message;
    expect(msg("12")).toBe("Clearance margin: say which unit 12 is in, e.g. 1/2 in or 12 mm.");
    expect(msg("0.5")).toBe("Clearance margin: say which unit 0.5 is in, e.g. 1/2 in or 12 mm.");
    expect(vehicleMarginSchema.parse("0")).toBe(0);
    // A fraction is an inch notation: ¾ in = 19.05 mm.
    expect(vehicleMarginSchema.parse("¾")).toBeCloseTo(19.05, 9);
    expect(vehicleMarginSchema.parse("1/2 in")).toBeCloseTo(12.7, 9);
    expect(vehicleMarginSchema.parse("12 mm")).toBe(12);
  });
});
