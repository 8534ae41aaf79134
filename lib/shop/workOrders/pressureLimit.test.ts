import { describe, expect, it } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import {
  aboveMaximum,
  belowRoadMinimum,
  isBelowRoadMinimum,
  pressureRefusal,
  tirePressureLimits,
  toSetWords,
  withPressureToSet,
} from "./pressureLimit";

describe("the quoted tire's pressure limits", () => {
  it("reads the load range's maximum and the road minimum", () => {
    // Flotation load range D: 50 psi (the engine's load-range table, from memory); road minimum
    // 0.5833 × 50 = 29.2 psi (FMVSS 138 Table 1 ratio, as the engine applies it).
    const l = tirePressureLimits("37x12.50R17LT 124Q LRD")!;
    expect(l.maxKpa).toBeCloseTo(psiToKpa(50), 1);
    expect(l.minimumKpa).toBeCloseTo(0.5833 * psiToKpa(50), 0);
    // Load range E (LT metric): 80 psi = 551.6 kPa (TRA load range E reference pressure).
    expect(tirePressureLimits("LT285/70R17 121/118Q LRE")!.maxKpa).toBeCloseTo(551.6, 0);
  });

  it("is null for a description that is not a size, or says no limit", () => {
    expect(tirePressureLimits("Mud-terrain, black letters")).toBeNull();
    expect(tirePressureLimits("")).toBeNull();
    expect(tirePressureLimits(null)).toBeNull();
  });

  it("refuses a pressure above the maximum in the unit entered, the other beside it (1 psi = 6.894757 kPa, NIST SP 811)", () => {
    const l = tirePressureLimits("37x12.50R17LT 124Q LRD");
    expect(aboveMaximum(psiToKpa(50), "psi", l, "Cold pressure (psi)")).toBeNull();
    expect(aboveMaximum(psiToKpa(65), "psi", l, "Cold pressure (psi)")).toBe(
      "Cold pressure (psi): 65 psi (448 kPa) is above the highest pressure 37x12.50R17LT 124Q LRD allows, 50 psi (345 kPa); never inflate above the sidewall maximum.",
    );
    expect(aboveMaximum(400, "kPa", l, "Cold pressure (kPa)")).toMatch(/^Cold pressure \(kPa\): 400 kPa \(58(\.0)? psi\) is above/);
    expect(aboveMaximum(900, "kPa", null, "Cold pressure (kPa)")).toBeNull();
  });

  it("refuses below the road minimum unless the maker's load table is ticked (1 psi = 6.894757 kPa, NIST SP 811)", () => {
    // Flotation load range D: no FMVSS 138 row, so 0.5833 × 50 psi = 29.17 psi = 201.1 kPa (the engine's ratio, no source).
    const l = tirePressureLimits("37x12.50R17LT 124Q LRD");
    expect(isBelowRoadMinimum(psiToKpa(29.2), "psi", l)).toBe(false);
    expect(isBelowRoadMinimum(psiToKpa(29.1), "psi", l)).toBe(true);
    expect(isBelowRoadMinimum(psiToKpa(20), "psi", null)).toBe(false);
    expect(belowRoadMinimum(psiToKpa(25), "psi", l, "Cold pressure set (psi)", false)).toMatch(
      /^Cold pressure set \(psi\): 25 psi \(172 kPa\) is below the road minimum for 37x12\.50R17LT 124Q LRD, 29\.2 psi \(201 kPa\) \(58\.3 % of the pressure at maximum load/,
    );
    expect(belowRoadMinimum(psiToKpa(25), "psi", l, "Cold pressure set (psi)", true)).toBeNull();
    // The maximum holds whatever is ticked.
    expect(pressureRefusal(psiToKpa(65), "psi", l, "Cold pressure set (psi)", true)).toMatch(/is above the highest pressure/);
    expect(pressureRefusal(psiToKpa(35), "psi", l, "Cold pressure set (psi)", false)).toBeNull();
  });

  it("carries the quote's pressures to set per axle, in the sheet's unit; without them the limits alone", () => {
    const l = tirePressureLimits("37x12.50R17LT 124Q LRD");
    const toSet = [
      { axle: "front" as const, kpa: psiToKpa(29.2), decidedBy: "road minimum" as const },
      { axle: "rear" as const, kpa: psiToKpa(30), decidedBy: "placard" as const },
    ];
    const quoted = {
      placardTire: "265/70R17 113T",
      placardFrontKpa: 241,
      placardRearKpa: 241,
      from: "scale ticket" as const,
      tire: "37x12.50R17LT 124Q LRD",
      axles: toSet,
      maxKpa: l!.maxKpa,
    };
    expect(withPressureToSet(l, quoted)?.toSet).toEqual(toSet);
    expect(withPressureToSet(l, { placardTire: "265/70R17 113T", missing: "…" })).toBe(l);
    expect(withPressureToSet(l, null)).toBe(l);
    // 1 psi = 6.894757 kPa (NIST SP 811).
    expect(toSetWords(toSet, "psi")).toBe("front 29.2 psi (201 kPa), rear 30 psi (207 kPa)");
    expect(toSetWords(toSet, "kPa")).toBe("front 201 kPa (29.2 psi), rear 207 kPa (30 psi)");
  });
});
