import { describe, expect, it } from "vitest";
import { equivalentSizes } from "./equivalents";
import { FitmentInputError } from "./errors";

describe("equivalentSizes", () => {
  it("metric equivalents of 37x12.50R17LT are sorted by |Δ diameter| and share the rim", () => {
    const eq = equivalentSizes("37x12.50R17LT", { system: "metric", limit: 5 });
    expect(eq).toHaveLength(5);
    for (const e of eq) {
      expect(e.size.rimDiameterIn).toBe(17);
      expect(e.diameterDeltaMm).toBeCloseTo(e.size.overallDiameterMm - 939.8, 9);
      expect(e.widthDeltaMm).toBeCloseTo(e.size.sectionWidthMm - 317.5, 9);
    }
    const abs = eq.map((e) => Math.abs(e.diameterDeltaMm));
    expect([...abs].sort((a, b) => a - b)).toEqual(abs);
    // D = d + 2H (ISO 4000-1): 365/70R17 = 431.8 + 511 = 942.8 mm (+3.0); 315/80R17 = 431.8 + 504 = 935.8 mm (−4.0)
    expect(eq[0]?.text).toBe("365/70R17");
    expect(eq[0]?.diameterDeltaMm).toBeCloseTo(3, 9);
    expect(eq[1]?.text).toBe("315/80R17");
    expect(eq[1]?.diameterDeltaMm).toBeCloseTo(-4, 9);
  });

  it("flotation equivalent of a metric size by default", () => {
    const eq = equivalentSizes("285/75R17");
    expect(eq[0]?.size.system).toBe("flotation");
    // 285/75R17 = 431.8 + 427.5 = 859.3 mm; 34x10.50R17LT = 863.6 mm (nearest)
    expect(eq[0]?.text).toBe("34x10.50R17LT");
  });

  it("invalid options throw", () => {
    expect(() => equivalentSizes("285/75R17", { limit: 0 })).toThrow(FitmentInputError);
    expect(() => equivalentSizes("285/75R17", { system: "numeric" as "metric" })).toThrow(/system/);
  });
});
