import { describe, expect, it } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type ComparisonInput, DEFAULT_INPUT } from "@/lib/comparisons/model";
import { SETUP_A, SETUP_B, SETUP_C, garageLimits } from "./testUtil";
import { boxesOverlap } from "@/lib/fitment/crossSectionLayout";
import { stockPart } from "@/lib/fitment/crossSectionTestUtil";
import { DESIGN_WIDTH_PX, type DrawnLimits, buildDrawing } from "./drawing";

/*
 * The words the drawing really writes (text.ts), in every display choice, laid out for a phone:
 * no two label boxes may share any area (plane geometry: both intervals overlap). Setups as in
 * lib/fitment/crossSection.test.ts, each planned against the demo's 265/70R17 17x8 +25 and
 * against each other; one opened from a backspacing to the bead seat.
 */
const [A, B, C] = [SETUP_A, SETUP_B, SETUP_C];
const PREFS: DisplayPrefs[] = [
  { units: "imperial", lengths: "decimal" },
  { units: "imperial", lengths: "fraction" },
  { units: "metric", lengths: "decimal" },
];
const GARAGE = garageLimits(
  stockPart("Lower control arm, front bolt", "inboard", "ride-height", 30, 2, "tight"),
  stockPart("Flare", "outboard", "full-stuff", 20, -38, "contact"),
  stockPart("Inner fender liner", "upward", "full-stuff", 60, 17, "clear"),
);

const cases: [string, ComparisonInput, DrawnLimits | null][] = [];
for (const [name, cur, pla] of [
  ["stock → A", DEFAULT_INPUT.current, A],
  ["stock → B", DEFAULT_INPUT.current, B],
  ["stock → C", DEFAULT_INPUT.current, C],
  ["A → B", A, B],
  ["B → C", B, C],
  ["C → A", C, A],
] as const) {
  cases.push([name, { ...DEFAULT_INPUT, current: cur, planned: pla }, null]);
  cases.push([
    `${name} with a vehicle, fender line and 12.5° KPI`,
    {
      ...DEFAULT_INPUT,
      current: cur,
      planned: pla,
      vehicle: { ...DEFAULT_INPUT.vehicle, kingpinInclinationDeg: 12.5, fenderLineMm: 139.7 },
    },
    GARAGE,
  ]);
}

describe(`buildDrawing: no two labels overlap at ${DESIGN_WIDTH_PX} px`, () => {
  for (const [name, input, limits] of cases) {
    it(name, () => {
      const r = computeComparison(input);
      for (const prefs of PREFS) {
        const { layout } = buildDrawing(r, prefs, limits);
        const hits: string[] = [];
        const ls = layout.labels;
        for (let i = 0; i < ls.length; i++)
          for (let j = i + 1; j < ls.length; j++) if (boxesOverlap(ls[i]!.box, ls[j]!.box)) hits.push(`${ls[i]!.id} × ${ls[j]!.id}`);
        expect(hits, `${prefs.units}/${prefs.lengths}`).toEqual([]);
        expect(ls.length).toBeGreaterThanOrEqual(limits ? 22 : 16);
      }
    });
  }
});

describe("buildDrawing: many measured parts", () => {
  it("names the six nearest to contact (contact first, then the smallest predicted gap) and marks all", () => {
    const statuses = ["clear", "tight", "contact", "clear", "tight", "clear", "clear", "contact", "clear"] as const;
    const parts = statuses.map((status, i) =>
      stockPart(`P${i}`, (["inboard", "outboard", "upward"] as const)[i % 3]!, "ride-height", 10 + i, 50 - i, status),
    );
    const d = buildDrawing(
      computeComparison(DEFAULT_INPUT),
      { units: "metric", lengths: "decimal" },
      { innerMm: null, outerMm: null, parts },
    );
    expect(d.model.parts.filter((p) => p.at)).toHaveLength(9);
    // contact: P7 (43), P2 (48); tight: P4 (46), P1 (49); clear: P8 (42), P6 (44).
    expect([...d.named].sort()).toEqual(["part-1", "part-2", "part-4", "part-6", "part-7", "part-8"]);
    expect(
      d.layout.callouts
        .filter((c) => c.id.startsWith("part-"))
        .map((c) => c.text)
        .sort(),
    ).toEqual(["P1: tight", "P2: contact", "P4: tight", "P6: clear", "P7: contact", "P8: clear"]);
  });
});
