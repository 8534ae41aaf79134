import { describe, expect, it } from "vitest";
import { messageInUnits, pressureText, pressuresInOrder } from "./pressureText";

const IMPERIAL = { units: "imperial", lengths: "decimal" } as const;
const METRIC = { units: "metric", lengths: "decimal" } as const;

describe("pressures in the chosen unit's order", () => {
  // 166.6 kPa = 24.2 psi and 201.1 kPa = 29.2 psi (1 psi = 6.894757 kPa, NIST SP 811).
  const NOTE =
    "The load needs only 166.6 kPa (24.2 psi), below the road minimum 201.1 kPa (29.2 psi) (FMVSS 138): set at least the minimum.";

  it("turns every engine pair round to psi first in the imperial display, keeping the engine's figures", () => {
    expect(pressuresInOrder(NOTE, IMPERIAL)).toBe(
      "The load needs only 24.2 psi (166.6 kPa), below the road minimum 29.2 psi (201.1 kPa) (FMVSS 138): set at least the minimum.",
    );
    expect(pressuresInOrder("Above 550 kPa (79.8 psi) the tire carries no more than its maximum load.", IMPERIAL)).toBe(
      "Above 79.8 psi (550 kPa) the tire carries no more than its maximum load.",
    );
  });

  it("leaves the metric display and text without a pair as they are", () => {
    expect(pressuresInOrder(NOTE, METRIC)).toBe(NOTE);
    expect(pressuresInOrder("Load rating 1150 kg ÷ 1.10 = 1045.5 kg on a light truck.", IMPERIAL)).toBe(
      "Load rating 1150 kg ÷ 1.10 = 1045.5 kg on a light truck.",
    );
  });

  it("reads the same way round as the table's own pressures", () => {
    expect(pressureText(201.1, IMPERIAL).startsWith("29.2 psi (")).toBe(true);
    expect(pressuresInOrder("201.1 kPa (29.2 psi)", IMPERIAL).startsWith("29.2 psi (")).toBe(true);
  });
});

describe("engine messages in the units the fields are labelled in", () => {
  // 1 lb = 0.45359237 kg exactly (NIST SP 811, Appendix B.8): 1769 kg = 3899.98 lb, 1045.5 kg = 2304.9 lb, 850 kg = 1873.9 lb.
  const M = "and 1769 kg is above the maximum load of 265/70R17 113T, 1045.5 kg at 250 kPa (36.3 psi); 850 kg";
  it("gives each load in lb first with the engine's kg beside it, pressures psi first", () => {
    expect(messageInUnits(M, IMPERIAL)).toBe(
      "and 3,900 lb (1,769 kg) is above the maximum load of 265/70R17 113T, 2,305 lb (1,045.5 kg) at 36.3 psi (250 kPa); 1,874 lb (850 kg)",
    );
  });
  it("groups the metric display's loads by thousands as the imperial one does, and leaves figures already given in both units alone", () => {
    // Only the grouping changes: the engine's kg figures, decimals and pressures as printed (common practice, no source).
    expect(messageInUnits(M, METRIC)).toBe(
      "and 1,769 kg is above the maximum load of 265/70R17 113T, 1,045.5 kg at 250 kPa (36.3 psi); 850 kg",
    );
    expect(messageInUnits("3,527 lb (1,600 kg) at 50 psi", IMPERIAL)).toBe("3,527 lb (1,600 kg) at 50 psi");
    expect(messageInUnits("1 kgf·m", IMPERIAL)).toBe("1 kgf·m");
  });
});
