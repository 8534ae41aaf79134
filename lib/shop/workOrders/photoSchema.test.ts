import { describe, expect, it } from "vitest";
import { mayRemoveStepPhoto, stepPhotoFieldsSchema } from "./photoSchema";

// The shop's own rule (photoSchema.ts), no outside source: staff fix their own mistakes until the
// step is signed; after that the photo is part of the record and only the owner takes it out.
describe("who may remove a step photo", () => {
  it("staff: only before the step is signed off and while the work order is not done", () => {
    expect(mayRemoveStepPhoto("shop_staff", false, false)).toBe(true);
    expect(mayRemoveStepPhoto("shop_staff", true, false)).toBe(false);
    expect(mayRemoveStepPhoto("shop_staff", false, true)).toBe(false);
  });
  it("the owner: always; anyone else: never", () => {
    expect(mayRemoveStepPhoto("shop_owner", true, true)).toBe(true);
    expect(mayRemoveStepPhoto("member", false, false)).toBe(false);
    expect(mayRemoveStepPhoto("admin", false, false)).toBe(false);
  });
});

describe("the fields beside a step photo", () => {
  it("takes a position and a step of the sheet, and names the field it refuses", () => {
    expect(stepPhotoFieldsSchema.parse({ position: "spare", step: "fitted" })).toEqual({ position: "spare", step: "fitted" });
    const r = stepPhotoFieldsSchema.safeParse({ position: "LM", step: null });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => [i.path[0], i.message])).toEqual([
      ["position", "Position: pick LF, RF, LR, RR, spare or vehicle."],
      ["step", "Step: pick a step of this work order."],
    ]);
  });
});
