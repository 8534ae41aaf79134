import { describe, expect, it } from "vitest";
import { keyFigureColumns, keyFigures } from "./keyFigures";
import { DEFAULT_INPUT } from "./schema";

describe("key figures of a saved comparison", () => {
  it("are the engine's figures of the demo comparison", () => {
    const f = keyFigures(DEFAULT_INPUT);
    // ISO 4000-1: 265/70R17 = 431.8 + 2 × 265 × 0.70 = 802.8 mm; flotation 37 in = 939.8 mm.
    expect(f.diameterChangeMm).toBeCloseTo(137, 9);
    // Speedometer error from the ratio of diameters (unloaded; common practice, no source).
    expect(f.speedometerErrorPct).toBeCloseTo((939.8 / 802.8 - 1) * 100, 9);
    expect(f.currentTire).toMatch(/^265\/70R17/);
    expect(f.plannedTire).toMatch(/^37x12\.50R17/);
  });

  it("name the same numbers as columns", () => {
    const f = keyFigures(DEFAULT_INPUT);
    const c = keyFigureColumns(DEFAULT_INPUT);
    // Every figure, and nothing else, under its name in snake case (the columns of `comparisons`):
    // written here as the rule, not as a copy of the module's list.
    const snake = (name: string) => name.replace(/[A-Z]/g, (l) => `_${l.toLowerCase()}`);
    expect(c).toEqual(Object.fromEntries(Object.entries(f).map(([name, value]) => [snake(name), value])));
    expect(Object.keys(c)).toContain("ground_clearance_change_mm");
  });
});
