import { describe, expect, it } from "vitest";
import { boltPatternQuery, equivalentBoltPatterns } from "./boltPatternSearch";

describe("bolt pattern search", () => {
  it("finds the other spelling of the same pattern (1 in = 25.4 mm exactly, NIST SP 811: 5.5 in = 139.7 mm, 4.5 in = 114.3 mm, 6.5 in = 165.1 mm)", () => {
    const stored = ["6x5.5", "6x139.7", "6x135", "5x139.7", "5x4.5", "8x165.1", "not a pattern"];
    expect(equivalentBoltPatterns("6x139.7", stored)).toEqual(["6x5.5", "6x139.7"]);
    expect(equivalentBoltPatterns("6x5.5", stored)).toEqual(["6x5.5", "6x139.7"]);
    expect(equivalentBoltPatterns("6 × 5.5", stored)).toEqual(["6x5.5", "6x139.7"]);
    expect(equivalentBoltPatterns("5 on 114.3", stored)).toEqual(["5x4.5"]);
    expect(equivalentBoltPatterns("8x6.5", stored)).toEqual(["8x165.1"]);
  });

  it("keeps patterns apart that differ by more than the engine's 0.1 mm (5x4.75 = 120.65 mm is not 5x120)", () => {
    expect(equivalentBoltPatterns("5x4.75", ["5x120", "5x120.65", "5x120.7"])).toEqual(["5x120.65", "5x120.7"]);
  });

  it("is no bolt pattern search for other text", () => {
    for (const q of ["37x12.50", "WH-17", "", "Mount and balance", "35x12.50R17LT"]) expect(boltPatternQuery(q), q).toBeNull();
    expect(equivalentBoltPatterns("37x12.50", ["6x5.5"])).toEqual([]);
  });
});
