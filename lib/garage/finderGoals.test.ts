import { describe, expect, it } from "vitest";
import { finderGoalsSchema, finderPlan } from "./finderGoals";
import { VEHICLE, point } from "./testUtil";

/** The finder form as it opens: every goal empty, points not used, the default margin. */
const BLANK = {
  targetDiameterMm: "",
  minDiameterMm: "",
  maxDiameterMm: "",
  wheelDiameters: "",
  maxPokeMm: "",
  usePoints: false,
  minWidthIn: "",
  maxWidthIn: "",
  margin: "1/2 in",
};

describe("finder goals → engine constraints", () => {
  it("hands every measured point to the engine, with its state, label, the margin and the steering axis", () => {
    const goals = finderGoalsSchema.parse({
      targetDiameterMm: "35",
      minDiameterMm: "33",
      maxDiameterMm: "35-1/2",
      wheelDiameters: "17, 18",
      maxPokeMm: "1 in",
      usePoints: true,
      minWidthIn: "8",
      maxWidthIn: "9-1/2",
      margin: "1/2 in",
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

  it("names each goal field as the finder form labels it", () => {
    const messages = (patch: object) =>
      Object.fromEntries(
        (finderGoalsSchema.safeParse({ ...BLANK, ...patch }).error?.issues ?? []).map((i) => [i.path.join("."), i.message]),
      );
    expect(messages({ targetDiameterMm: "huge" }).targetDiameterMm).toMatch(/^Target diameter \(in\): /);
    expect(messages({ minDiameterMm: "x" }).minDiameterMm).toMatch(/^From \(in\): /);
    expect(messages({ minWidthIn: "40" }).minWidthIn).toMatch(/^Rim width from \(in\): /);
    expect(messages({ maxPokeMm: "far" }).maxPokeMm).toMatch(/^Most extra poke \(mm\): /);
    expect(messages({ wheelDiameters: "17, 99" }).wheelDiameters).toBe(
      "Wheel diameters (in): list diameters between 8 and 30 in, e.g. 17, 18.",
    );
    expect(messages({ margin: "12" }).margin).toBe("Margin: say which unit 12 is in, e.g. 1/2 in or 12 mm.");
    expect(messages({ minDiameterMm: "35", maxDiameterMm: "33" }).maxDiameterMm).toBe(
      "To (in): must not be below From (in), e.g. 33 to 35-1/2.",
    );
  });

  it("refuses reversed ranges", () => {
    const r = finderGoalsSchema.safeParse({ ...BLANK, minDiameterMm: "35", maxDiameterMm: "33" });
    expect(r.success).toBe(false);
  });
});
