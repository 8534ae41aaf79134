import { describe, expect, it } from "vitest";
import { tighteningSequence } from "@/lib/fitment";
import { buildChecklist } from "./checklist";
import { PLAN, VEHICLE, point } from "./testUtil";

describe("install checklist", () => {
  const list = buildChecklist({ vehicle: VEHICLE, clearances: [point("lock", "fore-aft", 25), point("rail", "inboard", 40)], planned: PLAN, marginMm: 12.7 });
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
