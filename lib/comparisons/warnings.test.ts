import { describe, expect, it } from "vitest";
import { INNER_REACH_WARN_MM } from "./assess/thresholds";
import { computeComparison } from "./compute";
import { type ComparisonInput, DEFAULT_INPUT } from "./schema";

const planned = (patch: Partial<ComparisonInput["planned"]>): ComparisonInput => ({
  ...DEFAULT_INPUT,
  planned: { ...DEFAULT_INPUT.planned, ...patch },
});

describe("workspace warnings from findings", () => {
  it("lists only what the workspace words: not the counter's outer reach, diameter or alignment, nor the load note", () => {
    // The demo's wheel plane moves 37 mm outboard (+25 → −12 mm) and the tire grows 137 mm (939.8 − 802.8, ISO 4000-1):
    // the counter warns of both; the workspace shows them as figures.
    expect(computeComparison(DEFAULT_INPUT).warnings.map((w) => w.kind)).toEqual(["scrub", "speedometer", "regear"]);
  });

  it(`inner reach: a note up to ${INNER_REACH_WARN_MM} mm, a caution past it, as at the counter (common practice, no source)`, () => {
    // The current 265/70R17 on 17x8, offset +25 → +40 mm: the tire moves 15 mm inboard (inner swing = offset + half the width, engine).
    const inner = computeComparison(
      planned({ tire: "265/70R17", position: { mode: "offset", offsetMm: 40 }, wheelWidthIn: 8 }),
    ).warnings.find((w) => w.kind === "inner-reach");
    expect(inner?.lengthMm).toBeCloseTo(15, 9);
    expect(inner?.level).toBe("caution");
    expect(inner?.basis).toMatch(/more than 10 mm further inboard is a caution \(common practice, no source\)/);
    const slight = computeComparison(
      planned({ tire: "265/70R17", position: { mode: "offset", offsetMm: 30 }, wheelWidthIn: 8 }),
    ).warnings.find((w) => w.kind === "inner-reach");
    expect(slight?.lengthMm).toBeCloseTo(5, 9);
    expect(slight?.level).toBe("note");
    expect(slight?.basis).toBe("Inner swing from the hub face, current minus planned (engine).");
  });
});
