import { describe, expect, it } from "vitest";
import { trailAnglesOf } from "./trailAngles";

// The angles themselves are the engine's (SAE J1100 definitions, tested in lib/fitment); here only
// what the work order takes from a quote's stored fitment summary.
describe("the work order's trail angles", () => {
  it("shows the quote's angles, now → with the quoted tires, one decimal, with the caution", () => {
    const t = trailAnglesOf({
      angles: {
        angles: [
          { kind: "approach", currentDeg: 45.7, plannedDeg: 48.6 },
          { kind: "breakover", currentDeg: 21.66, plannedDeg: 27.14 },
        ],
        messages: ["Departure angle: the rear corner is inside the quoted tire's circle."],
      },
    });
    expect(t?.rows).toEqual([
      { label: "Approach angle", change: "45.7° → 48.6°" },
      { label: "Ramp breakover angle", change: "21.7° → 27.1°" },
    ]);
    expect(t?.notes).toEqual(["Departure angle: the rear corner is inside the quoted tire's circle."]);
    expect(t?.caution).toMatch(/^Trail angles: .*vehicle maker's guidance\.$/);
  });

  it("is null for a quote without body points, an empty one, or no summary", () => {
    expect(trailAnglesOf({ pressure: null })).toBeNull();
    expect(trailAnglesOf({ angles: { angles: [], messages: [] } })).toBeNull();
    expect(trailAnglesOf(null)).toBeNull();
  });
});
