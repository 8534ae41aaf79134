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
    expect(c).toEqual({
      current_tire: f.currentTire,
      planned_tire: f.plannedTire,
      diameter_change_mm: f.diameterChangeMm,
      ground_clearance_change_mm: f.groundClearanceChangeMm,
      poke_change_mm: f.pokeChangeMm,
      scrub_change_mm: f.scrubChangeMm,
      speedometer_error_pct: f.speedometerErrorPct,
      suggested_ratio: f.suggestedRatio,
      warning_count: f.warningCount,
    });
  });
});
