import { describe, expect, it } from "vitest";
import { tighteningSequence } from "@/lib/fitment";
import { buildChecklist } from "@/lib/garage/checklist";
import { finderGoalsSchema, finderPlan } from "@/lib/garage/finderGoals";
import { runFinderJob, type FinderReply } from "@/lib/garage/finderJob";
import { exclusionText } from "@/lib/garage/finderText";
import { predictPoints } from "@/lib/garage/predict";
import { vehicleWorkspaceUrl } from "@/lib/garage/links";
import type { Vehicle, VehicleClearance } from "@/lib/garage/types";
import { clearanceSchema, garageVehicleSchema, vehicleMarginSchema } from "@/lib/garage/schema";
import type { Setup } from "@/lib/setup/model";

const CUR: Setup = { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };
const PLAN: Setup = { tire: "35x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 };

const VEHICLE: Vehicle = {
  id: "v1", name: "Test rig", year: 2010, make: null, model: null, trim: null, frontSuspension: "solid-axle", boltPattern: "6x5.5", hubBoreMm: 108,
  stockSetup: CUR, currentSetup: CUR, liftHeightMm: null, kingpinInclinationDeg: null, axleRatio: 3.73, transmissionRatio: 1, clearanceMarginMm: 12.7, notes: "",
  createdAt: "", updatedAt: "",
};
const point = (id: string, direction: VehicleClearance["direction"], distanceMm: number): VehicleClearance => ({
  id, label: id, direction, distanceMm, distanceText: `${distanceMm} mm`, suspensionState: "ride-height", measuredSetup: CUR, createdAt: "",
});

describe("garage vehicle schema", () => {
  it("normalizes the bolt pattern: 5x4.5 and 5x114.3 are one pattern", () => {
    const a = garageVehicleSchema.parse({ name: "A", frontSuspension: "independent", boltPattern: "5 on 4.5", stockSetup: CUR, currentSetup: CUR });
    expect(a.boltPattern).toBe("5x4.5");
    expect(a.year).toBeNull();
    expect(a.notes).toBe("");
  });
});

describe("units in the garage forms: a field reads the unit its label states", () => {
  const issue = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }, path: string) =>
    r.error?.issues.find((i) => i.path.join(".") === path)?.message;

  it("lift height: typed in inches, its bound stated in inches, its example accepted", () => {
    const base = { name: "A", frontSuspension: "independent", boltPattern: "6x5.5", stockSetup: CUR, currentSetup: CUR };
    const r = garageVehicleSchema.safeParse({ ...base, liftHeightMm: "25" });
    // 500 mm / 25.4 = 19.685 in, stated inward as 19.68 in.
    expect(issue(r, "liftHeightMm")).toBe("Lift height (in): must be between 0 and 19.68 in, e.g. 2-1/2 or 2.5.");
    expect(garageVehicleSchema.parse({ ...base, liftHeightMm: "2-1/2" }).liftHeightMm).toBeCloseTo(63.5, 9);
    expect(garageVehicleSchema.parse({ ...base, liftHeightMm: "2½" }).liftHeightMm).toBeCloseTo(63.5, 9);
    expect(garageVehicleSchema.parse({ ...base, liftHeightMm: "2.5" }).liftHeightMm).toBeCloseTo(63.5, 9);
    expect(issue(garageVehicleSchema.safeParse({ ...base, liftHeightMm: "lots" }), "liftHeightMm")).toBe("Lift height (in): not a length in inches, e.g. 2-1/2 or 2.5.");
  });

  it("names each field as the vehicle form labels it", () => {
    const base = { name: "A", frontSuspension: "independent", boltPattern: "6x5.5", stockSetup: CUR, currentSetup: CUR };
    const r = garageVehicleSchema.safeParse({ ...base, year: "1800", hubBoreMm: "3/4", axleRatio: "x", transmissionRatio: "20", kingpinInclinationDeg: "40" });
    expect(issue(r, "year")).toBe("Year: must be between 1900 and 2100, e.g. 2009.");
    expect(issue(r, "hubBoreMm")).toMatch(/^Hub bore \(mm\): “3\/4” is a fraction/);
    expect(issue(r, "axleRatio")).toBe("Axle ratio: enter a number, e.g. 3.73.");
    expect(issue(r, "transmissionRatio")).toBe("Top-gear ratio: must be between 0.3 and 10, e.g. 0.72.");
    expect(issue(r, "kingpinInclinationDeg")).toBe("Kingpin inclination (°): must be between 0 and 30°, e.g. 8.");
  });
});

describe("clearance input", () => {
  it("needs a unit: in the text or given apart", () => {
    const bare = clearanceSchema.safeParse({ label: "x", direction: "upward", distance: "38", suspensionState: "full-stuff" });
    expect(bare.success).toBe(false);
    expect(bare.error!.issues[0]!.message).toMatch(/Say which unit 38 is in/);
    expect(clearanceSchema.parse({ label: "x", direction: "upward", distance: "1-1/2", unit: "in", suspensionState: "full-stuff" }).distanceMm).toBeCloseTo(38.1, 9);
    expect(clearanceSchema.parse({ label: "x", direction: "upward", distance: "38 mm", unit: "in", suspensionState: "full-stuff" }).distanceMm).toBe(38);
    // A fraction with mm as the unit is not 1.5 mm.
    expect(clearanceSchema.safeParse({ label: "x", direction: "upward", distance: "1-1/2", unit: "mm", suspensionState: "full-stuff" }).success).toBe(false);
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

describe("links in the workspace's query format", () => {
  it("matches the workspace's own example encoding", () => {
    const planned: Setup = { ...PLAN, tire: "37x12.50R17LT" };
    expect(vehicleWorkspaceUrl(CUR, planned, { kingpinInclinationDeg: null, axleRatio: 3.73, transmissionRatio: 1 })).toBe(
      "/workspace?ct=265/70R17&cd=17&cw=8&co=25&pt=37x12.50R17LT&pd=17&pw=9&po=-12",
    );
    expect(vehicleWorkspaceUrl(CUR, planned, { kingpinInclinationDeg: 8, axleRatio: 4.1, transmissionRatio: 0.7 })).toMatch(/&kpi=8&axle=4\.1&top=0\.7$/);
  });
});

describe("finder goals → engine constraints", () => {
  it("hands every measured point to the engine, with its state, label, the margin and the steering axis", () => {
    const goals = finderGoalsSchema.parse({
      targetDiameterMm: "35", minDiameterMm: "33", maxDiameterMm: "35-1/2", wheelDiameters: "17, 18", maxPokeMm: "1 in",
      usePoints: true, minWidthIn: "8", maxWidthIn: "9-1/2", margin: "1/2 in",
    });
    const lock = { ...point("b", "fore-aft", 19.05), suspensionState: "full-lock" as const };
    const plan = finderPlan(goals, VEHICLE, [point("a", "inboard", 30), lock]);
    expect(plan.constraints.clearancePoints).toEqual([
      expect.objectContaining({ label: "a", direction: "inboard", state: "ride-height", distanceMm: 30 }),
      expect.objectContaining({ label: "b", direction: "fore-aft", state: "full-lock", distanceMm: 19.05 }),
    ]);
    expect(plan.constraints.clearanceMarginMm).toBeCloseTo(12.7, 9);
    // No KPI recorded, no scrub known: the axis through the current tire's centre line, offset +25 → 25 mm inboard.
    expect(plan.constraints.steeringAxisInboardMm).toBe(25);
    // The inner limit is no longer a separate rule: the inboard point is one of the predictions.
    expect(plan.constraints.maxInnerSwingMm).toBeUndefined();
    expect(plan.constraints.maxOuterSwingMm).toBeCloseTo(107.5 + 25.4, 9);
    expect(plan.constraints.targetDiameterMm).toBeCloseTo(889, 9);
    expect(plan.constraints.maxDiameterMm).toBeCloseTo(901.7, 9);
    expect(plan.constraints.wheelDiametersIn).toEqual([17, 18]);
    expect(plan.constraints.boltPattern).toBe("6x5.5");
    expect(plan.wheelWidthsIn).toEqual([8, 8.5, 9, 9.5]);
    const off = finderPlan({ ...goals, usePoints: false }, VEHICLE, [point("a", "inboard", 30)]);
    expect(off.constraints.clearancePoints).toBeUndefined();
  });

  it("on the demo pickup, recommends nothing its own prediction says will rub, and says why the 37s are out", () => {
    // The demo member's pickup (db/seeds/04_demo_garage.ts): LT285/70R17 on 17x8.5 +18, KPI 12°, its five points.
    const cur: Setup = { tire: "LT285/70R17 121/118Q E", wheelDiameterIn: 17, wheelWidthIn: 8.5, position: { mode: "offset", offsetMm: 18 }, spacerMm: 0 };
    const pickup: Vehicle = { ...VEHICLE, frontSuspension: "independent", currentSetup: cur, stockSetup: cur, kingpinInclinationDeg: 12 };
    const at = (id: string, label: string, direction: VehicleClearance["direction"], distanceMm: number, suspensionState: VehicleClearance["suspensionState"]): VehicleClearance => ({
      ...point(id, direction, distanceMm), label, suspensionState, measuredSetup: cur,
    });
    const points = [
      at("1", "Frame rail, full left lock", "inboard", 31.75, "full-lock"),
      at("2", "Upper control arm", "inboard", 22, "ride-height"),
      at("3", "Front fender lip", "outboard", 25.4, "ride-height"),
      at("4", "Inner fender liner", "upward", 50.8, "full-stuff"),
      at("5", "Bumper corner, full right lock", "fore-aft", 38.1, "full-lock"),
    ];
    // The finder page's default goals.
    const goals = finderGoalsSchema.parse({ targetDiameterMm: "", minDiameterMm: "", maxDiameterMm: "", wheelDiameters: "17", maxPokeMm: "1 in", usePoints: true, minWidthIn: "", maxWidthIn: "", margin: "1/2 in" });
    const plan = finderPlan(goals, pickup, points);
    const replies: FinderReply[] = [];
    runFinderJob({ id: 1, constraints: plan.constraints, wheelWidthsIn: plan.wheelWidthsIn, limit: 200 }, (r) => replies.push(r));
    const done = replies.at(-1)!;
    if (done.type !== "done") throw new Error(`finder failed: ${JSON.stringify(done)}`);
    const setupOf = (m: { tire: { text: string }; wheel: { widthIn: number; offsetMm: number } }): Setup => ({
      tire: m.tire.text, wheelDiameterIn: 17, wheelWidthIn: m.wheel.widthIn, position: { mode: "offset", offsetMm: m.wheel.offsetMm }, spacerMm: 0,
    });
    expect(done.result.results.length).toBeGreaterThan(0);
    for (const m of done.result.results) {
      // The vehicle page's own predictions (lib/garage/predict.ts) for this candidate: all clear.
      expect(predictPoints(points, setupOf(m), 12.7, pickup).map((p) => p.status)).not.toContain("contact");
      expect(predictPoints(points, setupOf(m), 12.7, pickup).map((p) => p.status)).not.toContain("tight");
    }
    expect(done.result.results.some((m) => m.tire.text.startsWith("37x"))).toBe(false);
    // Today's second result, 37x12.50R17LT on 17x9.5 +12, as the vehicle page predicts it. Steering
    // axis 18 + 415.4 × tan 12° = 106.296 mm inboard of the hub face (zero scrub assumed).
    //   Frame rail (inboard, full lock): inner tread corner √(415.4² + (160.5 − 106.296)²) = 418.922 →
    //     √(469.9² + (168.21 − 106.296)²) = 473.961: 31.75 − 55.040 = −23.290 mm.
    //   Upper control arm (inboard, ride height): reach +7.71, rise +54.5; worst at 45° over the
    //     shoulder: 22 cos 45° − 7.71 = 7.846 mm.
    //   Fender lip (outboard): reach +19.71, rise +54.5; at 45° the part is 25.4 cos 45° = 17.961 out,
    //     inside the planned corner: −min(19.71 − 17.961, 54.5 − 17.961) = −1.749 mm.
    //   Liner (upward, full stuff): 50.8 − (469.9 − 415.4) = −3.7 mm.
    //   Bumper corner (fore/aft, full lock): outer corner √(415.4² + 230.796²) = 475.209 →
    //     √(469.9² + 250.506²) = 532.503: 38.1 − 57.293 = −19.193 mm.
    const old2: Setup = { tire: "37x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9.5, position: { mode: "offset", offsetMm: 12 }, spacerMm: 0 };
    const pred = predictPoints(points, old2, 12.7, pickup);
    expect(pred.map((p) => p.status)).toEqual(["contact", "tight", "contact", "contact", "contact"]);
    [-23.29, 7.846, -1.749, -3.7, -19.193].forEach((mm, i) => expect(pred[i]!.predictedMm).toBeCloseTo(mm, 2));
    // The size's nearest miss is 17x9 +6: inner corner √(469.9² + (159.67 − 106.296)²) = 472.922,
    // 31.75 − (472.922 − 418.922) = −22.250 mm, needing 34.950 mm; the lip, liner and bumper fail too.
    const x = done.result.excluded.find((e) => e.tire.text === "37x12.50R17LT")!;
    expect(x).toBeDefined();
    expect(x.wheel).toEqual({ diameterIn: 17, widthIn: 9, offsetMm: 6 });
    expect(x.reason).toMatchObject({ kind: "clearance", label: "Frame rail, full left lock", state: "full-lock", status: "contact" });
    expect(x.reason.kind === "clearance" && x.reason.predictedMm).toBeCloseTo(-22.25, 2);
    expect(x.reason.shortfallMm).toBeCloseTo(34.95, 2);
    expect(x.limitsFailed).toBe(4);
    expect(exclusionText(x)).toBe("Excluded: touches frame rail, full left lock (measured at full lock) — needs 35 mm (1-3/8 in) more; 3 other limits fail too.");
  });

  it("names each goal field as the finder form labels it", () => {
    const blank = { targetDiameterMm: "", minDiameterMm: "", maxDiameterMm: "", wheelDiameters: "", maxPokeMm: "", usePoints: false, minWidthIn: "", maxWidthIn: "", margin: "1/2 in" };
    const messages = (patch: object) => Object.fromEntries((finderGoalsSchema.safeParse({ ...blank, ...patch }).error?.issues ?? []).map((i) => [i.path.join("."), i.message]));
    expect(messages({ targetDiameterMm: "huge" }).targetDiameterMm).toMatch(/^Target diameter \(in\): /);
    expect(messages({ minDiameterMm: "x" }).minDiameterMm).toMatch(/^From \(in\): /);
    expect(messages({ minWidthIn: "40" }).minWidthIn).toMatch(/^Rim width from \(in\): /);
    expect(messages({ maxPokeMm: "far" }).maxPokeMm).toMatch(/^Most extra poke \(mm\): /);
    expect(messages({ wheelDiameters: "17, 99" }).wheelDiameters).toBe("Wheel diameters (in): list diameters between 8 and 30 in, e.g. 17, 18.");
    expect(messages({ margin: "12" }).margin).toBe("Margin: say which unit 12 is in, e.g. 1/2 in or 12 mm.");
    expect(messages({ minDiameterMm: "35", maxDiameterMm: "33" }).maxDiameterMm).toBe("To (in): must not be below From (in), e.g. 33 to 35-1/2.");
  });

  it("refuses reversed ranges", () => {
    const r = finderGoalsSchema.safeParse({ targetDiameterMm: "", minDiameterMm: "35", maxDiameterMm: "33", wheelDiameters: "", maxPokeMm: "", usePoints: false, minWidthIn: "", maxWidthIn: "", margin: "1/2 in" });
    expect(r.success).toBe(false);
  });

  it("the worker job posts progress, then a result within the constraints", () => {
    const replies: FinderReply[] = [];
    runFinderJob({ id: 7, constraints: { boltPattern: "6x5.5", minDiameterMm: 850, maxDiameterMm: 900, maxInnerSwingMm: 175 }, limit: 10 }, (r) => replies.push(r));
    const done = replies.at(-1)!;
    expect(replies.filter((r) => r.type === "progress").length).toBeGreaterThan(10);
    expect(done.type).toBe("done");
    if (done.type !== "done") return;
    expect(done.id).toBe(7);
    expect(done.result.results).toHaveLength(10);
    for (const m of done.result.results) {
      expect(m.overallDiameterMm).toBeGreaterThanOrEqual(850);
      expect(m.innerSwingMm).toBeLessThanOrEqual(175);
    }
    const bad: FinderReply[] = [];
    runFinderJob({ id: 8, constraints: { minDiameterMm: 900, maxDiameterMm: 800 } }, (r) => bad.push(r));
    expect(bad).toEqual([expect.objectContaining({ type: "error", id: 8 })]);
  });
});

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
