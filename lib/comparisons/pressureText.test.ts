import { describe, expect, it } from "vitest";
import { pressureText, pressuresInOrder } from "./pressureText";

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
