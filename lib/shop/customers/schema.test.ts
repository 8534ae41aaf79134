import { describe, expect, it } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import { counterVehicleSchema } from "./schema";

const VEHICLE = {
  description: "Invented counter pickup",
  boltPattern: "6x5.5",
  hubBoreMm: "",
  axleRatio: "",
  currentSetup: { tire: "265/70R17 113T", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 },
};
const PLACARD = {
  units: "metric",
  placardTire: "265/70R17 113T",
  placardFrontKpa: 240,
  placardRearKpa: 240,
  frontAxleKg: 1400,
  rearAxleKg: 1200,
};

describe("counterVehicleSchema: the door placard", () => {
  it("is optional: a vehicle without one reads as before", () => {
    const r = counterVehicleSchema.safeParse(VEHICLE);
    expect(r.success && r.data.placard).toBeUndefined();
  });

  it("is kept in SI with the units it was typed in", () => {
    const r = counterVehicleSchema.safeParse({ ...VEHICLE, placard: PLACARD });
    expect(r.success && r.data.placard).toEqual({ ...PLACARD, vehicleKind: "light-truck", frontGawrKg: null, rearGawrKg: null });
  });

  it("refuses a placard pressure above what the placard tire allows, beside its field (path placard.<field>)", () => {
    // 400 kPa is above a standard-load passenger tire's 350 kPa sidewall maximum (the engine's table, from memory).
    const r = counterVehicleSchema.safeParse({ ...VEHICLE, placard: { ...PLACARD, placardFrontKpa: 400 } });
    expect(r.success).toBe(false);
    const issue = r.error!.issues.find((i) => i.path.join(".") === "placard.placardFrontKpa");
    expect(issue?.message).toMatch(/^Placard cold pressure, front \(kPa\):/);
  });

  it("refuses a placard size without its rear pressure, naming the field in the unit typed", () => {
    const r = counterVehicleSchema.safeParse({
      ...VEHICLE,
      placard: { ...PLACARD, units: "imperial", placardFrontKpa: psiToKpa(35), placardRearKpa: null },
    });
    expect(r.error?.issues.map((i) => [i.path.join("."), i.message.split(":")[0]])).toEqual([
      ["placard.placardRearKpa", "Placard cold pressure, rear (psi)"],
    ]);
  });
});
