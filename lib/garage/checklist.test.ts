import { describe, expect, it } from "vitest";
import { tighteningSequence } from "@/lib/fitment";
import { buildChecklist } from "./checklist";
import { CUR, PLAN, VEHICLE, point, vehicleWith } from "./testUtil";

describe("install checklist", () => {
  const list = buildChecklist({
    vehicle: VEHICLE,
    clearances: [point("lock", "fore-aft", 25), point("rail", "inboard", 40)],
    planned: PLAN,
    marginMm: 12.7,
  });
  const byId = (id: string) => list.items.find((i) => i.id === id);

  it("asks for trimming where contact is predicted, by the shortfall", () => {
    // 35 in = 889 mm tall vs 802.8 mm (ISO 4000-1: D = d + 2H): radius +43.1 mm; 25 − 43.1 = −18.1; shortfall 12.7 + 18.1 = 30.8 mm
    const trim = byId("trim:lock")!;
    expect(trim.title).toMatch(/^Contact at lock: gain at least 30\.8 mm/);
    expect(byId("trim:rail")).toBeUndefined();
    expect(byId("lift")!.title).toMatch(/30\.8 mm/);
    expect(byId("lift")!.caution).toMatch(/qualified technician/);
  });

  it("suggests the regear and the speedometer factor from the engine", () => {
    // ratio to restore = 3.73 × 889 / 802.8 = 4.13 → nearest common ratio 4.10; factor 889 / 802.8 = 1.107
    expect(byId("regear")!.title).toBe("Regear from 3.73 to 4.10");
    expect(byId("speedometer")!.title).toBe("Speedometer correction factor 1.107");
    expect(byId("speedometer")!.detail).toMatch(/indicated 60 mph is 66\.4 mph/);
  });

  it("lists lug torque in a star pattern for 6 studs, the re-check, beadlock and pressure cautions", () => {
    // each bolt is followed by the one most opposite it: on 6 studs bolt 1 is opposite bolt 4
    expect(byId("lug-torque")!.title).toContain(`star pattern: ${tighteningSequence(6).join("-")}`);
    expect(tighteningSequence(6).slice(0, 2)).toEqual([1, 4]);
    expect(byId("lug-recheck")!.title).toMatch(/50–100 miles/);
    expect(byId("beadlock")!.caution).toMatch(/cage or with a clip-on chuck/);
    expect(byId("pressure")!.caution).toMatch(/standing clear/);
    expect(list.items.map((i) => i.id)).toEqual(expect.arrayContaining(["alignment", "spare", "load", "hub-bore", "brakes", "cycle"]));
  });
});

const RIG = vehicleWith({ name: "Rig", frontSuspension: "independent" });
const regearItem = (tire: string) =>
  buildChecklist({ vehicle: RIG, clearances: [], planned: { ...CUR, tire }, marginMm: 12.7 }).items.find((i) => i.id === "regear")!;

describe("install checklist: the regear item reads the regear finding", () => {
  it("no regear under the 5 % gap the workspace and the counter use (common practice, no source), though 3.92 is the nearer common ratio", () => {
    // 265/75R17: D = 431.8 + 2 × 198.75 = 829.3 mm vs 802.8 mm (ISO 4000-1): restoring 3.73 × 829.3 / 802.8 = 3.853, 3.3 % above 3.73.
    const item = regearItem("265/75R17");
    expect(item.title).toBe("Gearing: no regear suggested (stays 3.73)");
    expect(item.detail).toBe(
      "The ratio that restores engine speed is 3.85, less than 5 % from the current 3.73: a regear is advised from 5 % (common practice, no source).",
    );
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
