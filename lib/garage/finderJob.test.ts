import { describe, expect, it } from "vitest";
import type { Setup } from "@/lib/setup/model";
import { finderGoalsSchema, finderPlan } from "./finderGoals";
import { runFinderJob, type FinderReply } from "./finderJob";
import { exclusionText } from "./finderText";
import { predictPoints } from "./predict";
import { VEHICLE, point } from "./testUtil";
import type { Vehicle, VehicleClearance } from "./types";

/** A setup on a 17 in wheel placed by its offset, no spacer: every setup this test builds. */
const on17 = (tire: string, wheelWidthIn: number, offsetMm: number): Setup => ({
  tire,
  wheelDiameterIn: 17,
  wheelWidthIn,
  position: { mode: "offset", offsetMm },
  spacerMm: 0,
});

describe("finder goals → engine constraints", () => {
  it("on the demo pickup, recommends nothing its own prediction says will rub, and says why the 37s are out", () => {
    // The demo member's pickup (db/seeds/04_demo_garage.ts): LT285/70R17 on 17x8.5 +18, KPI 12°, its five points.
    const cur = on17("LT285/70R17 121/118Q E", 8.5, 18);
    const pickup: Vehicle = { ...VEHICLE, frontSuspension: "independent", currentSetup: cur, stockSetup: cur, kingpinInclinationDeg: 12 };
    const at = (
      id: string,
      label: string,
      direction: VehicleClearance["direction"],
      distanceMm: number,
      suspensionState: VehicleClearance["suspensionState"],
    ): VehicleClearance => ({
      ...point(id, direction, distanceMm),
      label,
      suspensionState,
      measuredSetup: cur,
    });
    const points = [
      at("1", "Frame rail, full left lock", "inboard", 31.75, "full-lock"),
      at("2", "Upper control arm", "inboard", 22, "ride-height"),
      at("3", "Front fender lip", "outboard", 25.4, "ride-height"),
      at("4", "Inner fender liner", "upward", 50.8, "full-stuff"),
      at("5", "Bumper corner, full right lock", "fore-aft", 38.1, "full-lock"),
    ];
    // The finder page's default goals.
    const goals = finderGoalsSchema.parse({
      targetDiameterMm: "",
      minDiameterMm: "",
      maxDiameterMm: "",
      wheelDiameters: "17",
      maxPokeMm: "1 in",
      usePoints: true,
      minWidthIn: "",
      maxWidthIn: "",
      margin: "1/2 in",
    });
    const plan = finderPlan(goals, pickup, points);
    const replies: FinderReply[] = [];
    runFinderJob({ id: 1, constraints: plan.constraints, wheelWidthsIn: plan.wheelWidthsIn, limit: 200 }, (r) => replies.push(r));
    const done = replies.at(-1)!;
    if (done.type !== "done") throw new Error(`finder failed: ${JSON.stringify(done)}`);
    const setupOf = (m: { tire: { text: string }; wheel: { widthIn: number; offsetMm: number } }) =>
      on17(m.tire.text, m.wheel.widthIn, m.wheel.offsetMm);
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
    const old2 = on17("37x12.50R17LT", 9.5, 12);
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
    expect(exclusionText(x)).toBe(
      "Excluded: touches frame rail, full left lock (measured at full lock) — needs 35 mm (1-3/8 in) more; 3 other limits fail too.",
    );
  });

  it("the worker job posts progress, then a result within the constraints", () => {
    const replies: FinderReply[] = [];
    runFinderJob(
      { id: 7, constraints: { boltPattern: "6x5.5", minDiameterMm: 850, maxDiameterMm: 900, maxInnerSwingMm: 175 }, limit: 10 },
      (r) => replies.push(r),
    );
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
