import { describe, expect, it } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import { aboveMaximum, tirePressureLimits } from "./pressureLimit";

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
});
