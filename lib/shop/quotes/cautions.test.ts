import { describe, expect, it } from "vitest";
import { quoteCautions } from "./cautions";
import { summarize } from "./fitment";

const current = { boltPattern: "6x5.5", tireSize: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
const LIFT = /^Lift and steering changes/;

describe("quote cautions", () => {
  const fit = summarize(current, "265/70R17", { diameterIn: 17, widthIn: 8, offsetMm: 25, beadlock: false });
  const lift = (f: Parameters<typeof quoteCautions>[0]) => quoteCautions(f).some((c) => LIFT.test(c));

  it("the lift and steering caution follows the diameter change: more than 50 mm either way (common practice, no source)", () => {
    expect(lift({ ...fit, diameterChangeMm: 50 })).toBe(false);
    expect(lift({ ...fit, diameterChangeMm: 50.1 })).toBe(true);
    expect(lift({ ...fit, diameterChangeMm: -50.1 })).toBe(true);
  });

  it("and not the words of a modification (a stored quote keeps its figures, not always its findings)", () => {
    const worded = {
      ...fit,
      diameterChangeMm: 20,
      modifications: ["A lift or levelling kit is usually needed for this much extra diameter; follow the lift maker's instructions."],
    };
    expect(lift(worded)).toBe(false);
  });

  it("a 315/70R17 (+70 mm, ISO 4000-1: D = d + 2H) on a beadlock wheel: bead seating, fasteners, beadlock rings, lift, nominal figures", () => {
    const big = summarize(current, "315/70R17", { diameterIn: 17, widthIn: 9, offsetMm: -12, beadlock: true });
    expect(quoteCautions(big).map((c) => c.split(":")[0]!.split(" ")[0])).toEqual(["Bead", "Wheel", "Beadlock", "Lift", "All"]);
  });
});
