import { describe, expect, it } from "vitest";
import { computeComparison } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { type ComparisonInput, DEFAULT_INPUT } from "@/lib/comparisons/model";
import type { Setup } from "@/lib/setup/model";
import { boxesOverlap } from "@/lib/fitment/crossSectionLayout";
import { DESIGN_WIDTH_PX, type DrawnLimits, buildDrawing } from "./drawing";

/*
 * The words the drawing really writes (text.ts), in every display choice, laid out for a phone:
 * no two label boxes may share any area (plane geometry: both intervals overlap). Setups as in
 * lib/fitment/crossSection.test.ts, each planned against the demo's 265/70R17 17x8 +25 and
 * against each other; one opened from a backspacing to the bead seat.
 */
const A: Setup = { tire: "35x12.50R17", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 };
const B: Setup = { tire: "285/75R16", wheelDiameterIn: 16, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 0 }, spacerMm: 38 };
const C: Setup = {
  tire: "33x12.50R15",
  wheelDiameterIn: 15,
  wheelWidthIn: 10,
  position: { mode: "backspacing", backspacingIn: 3.25, reference: "bead-seat", flangeIn: 0.5 },
  spacerMm: 0,
};
const PREFS: DisplayPrefs[] = [
  { units: "imperial", lengths: "decimal" },
  { units: "imperial", lengths: "fraction" },
  { units: "metric", lengths: "decimal" },
];
const stock = { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };
const GARAGE: DrawnLimits = {
  innerMm: 187.5,
  outerMm: 127.5,
  parts: [
    {
      label: "Lower control arm, front bolt",
      direction: "inboard",
      state: "ride-height",
      distanceMm: 30,
      measuredWith: stock,
      predictedMm: 2,
      status: "tight",
    },
    {
      label: "Flare",
      direction: "outboard",
      state: "full-stuff",
      distanceMm: 20,
      measuredWith: stock,
      predictedMm: -38,
      status: "contact",
    },
    {
      label: "Inner fender liner",
      direction: "upward",
      state: "full-stuff",
      distanceMm: 60,
      measuredWith: stock,
      predictedMm: 17,
      status: "clear",
    },
  ],
};

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
    const parts = statuses.map((status, i) => ({
      label: `P${i}`,
      direction: (["inboard", "outboard", "upward"] as const)[i % 3]!,
      state: "ride-height" as const,
      distanceMm: 10 + i,
      measuredWith: stock,
      predictedMm: 50 - i,
      status,
    }));
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
