import { describe, expect, it } from "vitest";
import type { SetupValues } from "@/lib/setup/schema";
import { buildChecklist } from "./checklist";
import type { Vehicle } from "./types";

const CUR: SetupValues = { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };
const RIG: Vehicle = {
  id: "v1", name: "Rig", year: null, make: null, model: null, trim: null, frontSuspension: "independent", boltPattern: "6x5.5", hubBoreMm: null,
  stockSetup: CUR, currentSetup: CUR, liftHeightMm: null, kingpinInclinationDeg: null, axleRatio: 3.73, transmissionRatio: 1, clearanceMarginMm: 12.7, notes: "", createdAt: "", updatedAt: "",
};
const regearItem = (tire: string) => buildChecklist({ vehicle: RIG, clearances: [], planned: { ...CUR, tire }, marginMm: 12.7 }).items.find((i) => i.id === "regear")!;

describe("install checklist: the regear item reads the regear finding", () => {
  it("no regear under the 5 % gap the workspace and the counter use (common practice, no source), though 3.92 is the nearer common ratio", () => {
    // 265/75R17: D = 431.8 + 2 × 198.75 = 829.3 mm vs 802.8 mm (ISO 4000-1): restoring 3.73 × 829.3 / 802.8 = 3.853, 3.3 % above 3.73.
    const item = regearItem("265/75R17");
    expect(item.title).toBe("Gearing: no regear suggested (stays 3.73)");
    expect(item.detail).toBe("The ratio that restores engine speed is 3.85, less than 5 % from the current 3.73: a regear is advised from 5 % (common practice, no source).");
    expect(item.caution).toBeUndefined();
  });

  it("a regear past it: 35x12.50R17LT restores with 4.13, nearest common ratio 4.10", () => {
    // 35 in = 889 mm (NIST SP 811: 1 in = 25.4 mm); 3.73 × 889 / 802.8 = 4.131, 10.7 % above 3.73.
    expect(regearItem("35x12.50R17LT").title).toBe("Regear from 3.73 to 4.10");
  });

  it("the same setup: stays, nearest the current ratio", () => {
    expect(regearItem("265/70R17").detail).toBe("The ratio that restores engine speed is 3.73, nearest the current 3.73.");
  });
});
