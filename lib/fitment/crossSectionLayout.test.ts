import { describe, expect, it } from "vitest";
import { type CrossSectionModel, crossSection } from "./crossSection";
import {
  type Box,
  type CrossSectionLayout,
  type LayoutInput,
  BESIDE_EM,
  CHAR_EM,
  boxesOverlap,
  labelledDimension,
  layoutCrossSection,
  textWidthEm,
} from "./crossSectionLayout";
import { FitmentInputError } from "./errors";
import { type SetupGeometry, setupGeometry } from "./geometry";

/*
 * The layout is geometry about labels, not about tires: the checks are plain plane geometry
 * (two boxes overlap when both their x and y intervals do; a vertical segment crosses a box when
 * its x lies inside the box's and the y ranges meet). The setups are those of crossSection.test.ts.
 */
const A = setupGeometry({ tire: "35x12.50R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } });
const B = setupGeometry({ tire: "285/75R16", wheel: { diameterIn: 16, widthIn: 8, offsetMm: 0 }, spacerMm: 38 });
const C = setupGeometry({ tire: "33x12.50R15", wheel: { diameterIn: 15, widthIn: 10, offsetMm: -44 } });
const STOCK = setupGeometry({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } });
const STOCK_INPUT = { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } };

/**
 * Labels as long as the workspace writes them (lib/comparisons/crossSection/text.ts): the
 * kind of figure and its value in sixteenths of an inch, the longest style; the setup is told by
 * the line style and the legend, not repeated on every figure.
 */
const who = (s: string | null) => (s === "current" ? "Current" : s === "planned" ? "Planned" : "");
const len = (mm: number) => `${Math.floor(Math.abs(mm) / 25.4)}-15/16 in`;
const WORD: Record<string, string> = {
  "reach-inboard": "inboard",
  "reach-outboard": "outboard",
  backspacing: "backspacing",
  "flange-allowance": "flange",
  offset: "offset",
  spacer: "spacer",
  diameter: "diameter",
  "ground-change": "ground",
};
function texts(m: CrossSectionModel): LayoutInput {
  return {
    extents: m.extents,
    dimensions: m.dimensions.map((d) =>
      labelledDimension(
        d,
        d.kind === "offset"
          ? "offset −44 mm"
          : d.kind === "spacer"
            ? "spacer 1-1/2 in"
            : d.kind === "ground-change"
              ? `ground +${len(d.valueMm)}`
              : `${WORD[d.kind]} ${len(d.valueMm)}`,
      ),
    ),
    callouts: m.anchors.map((a) => ({
      id: a.id,
      at: a.at,
      text:
        a.kind === "part"
          ? "Lower arm front: contact"
          : a.kind === "tire"
            ? who(a.setup)
            : a.kind === "steering-axis"
              ? "steering axis 12.5°"
              : a.kind.replace("-", " "),
    })),
    legend: [
      { id: "legend-current", text: "Current 265/70R17 113T" },
      { id: "legend-planned", text: "Planned 37x12.50R17LT 124Q LRD" },
    ],
  };
}

function model(cur: SetupGeometry, pla: SetupGeometry, withVehicle: boolean): CrossSectionModel {
  return crossSection(
    { geometry: cur },
    { geometry: pla },
    withVehicle
      ? {
          kingpinInclinationDeg: 12.5,
          innerLimitMm: 174.8,
          fenderLipMm: 160,
          fenderLineMm: 139.7,
          parts: [
            {
              label: "Arm",
              direction: "inboard",
              state: "ride-height",
              distanceMm: 30,
              measuredWith: STOCK_INPUT,
              predictedMm: 1,
              status: "tight",
            },
            {
              label: "Flare",
              direction: "outboard",
              state: "ride-height",
              distanceMm: 20,
              measuredWith: STOCK_INPUT,
              predictedMm: -3,
              status: "contact",
            },
            {
              label: "Liner",
              direction: "upward",
              state: "ride-height",
              distanceMm: 40,
              measuredWith: STOCK_INPUT,
              predictedMm: -3,
              status: "contact",
            },
          ],
        }
      : {},
  );
}

const vSegCrossesBox = (x: number, y0: number, y1: number, b: Box) =>
  x > b.x && x < b.x + b.w && Math.max(y0, y1) > b.y && Math.min(y0, y1) < b.y + b.h;
const hSegCrossesBox = (y: number, x0: number, x1: number, b: Box) =>
  y > b.y && y < b.y + b.h && Math.max(x0, x1) > b.x && Math.min(x0, x1) < b.x + b.w;

function problems(l: CrossSectionLayout): string[] {
  const out: string[] = [];
  const v = l.viewBox;
  for (let i = 0; i < l.labels.length; i++) {
    const a = l.labels[i]!;
    if (a.box.x < v.x - 1e-9 || a.box.x + a.box.w > v.x + v.w + 1e-9 || a.box.y < v.y - 1e-9 || a.box.y + a.box.h > v.y + v.h + 1e-9)
      out.push(`${a.id} outside the view`);
    for (let j = i + 1; j < l.labels.length; j++)
      if (boxesOverlap(a.box, l.labels[j]!.box)) out.push(`${a.id} overlaps ${l.labels[j]!.id}`);
  }
  // Extension lines and leaders never cross their own label. (Other items' lines may pass behind
  // a label where two setups put more of them under the text than there is room to avoid: the
  // drawing breaks them at the text with a halo; see Lanes in crossSectionLayout.ts.)
  const lines: { id: string; seg: [{ x: number; y: number }, { x: number; y: number }] }[] = [
    ...l.dimensions.flatMap((d) => d.extensions.map((seg) => ({ id: d.id, seg }))),
    ...l.callouts.map((c) => ({ id: c.id, seg: c.leader })),
  ];
  for (const { id, seg } of lines) {
    for (const lab of l.labels.filter((x) => x.id === id)) {
      const crosses =
        seg[0].x === seg[1].x
          ? vSegCrossesBox(seg[0].x, seg[0].y, seg[1].y, lab.box)
          : hSegCrossesBox(seg[0].y, seg[0].x, seg[1].x, lab.box);
      if (crosses) out.push(`line of ${id} crosses label ${lab.id}`);
    }
  }
  return out;
}

const PAIRS: [string, SetupGeometry, SetupGeometry][] = [
  ["stock → A (17x9 −12, 35 in)", STOCK, A],
  ["stock → B (16x8 +0, 38 mm spacer)", STOCK, B],
  ["stock → C (15x10 −44, 33 in)", STOCK, C],
  ["A → B", A, B],
  ["B → C", B, C],
  ["C → A", C, A],
];

describe("layoutCrossSection: no two labels overlap", () => {
  for (const [name, cur, pla] of PAIRS) {
    for (const withVehicle of [false, true]) {
      for (const widthPx of [288, 343, 640]) {
        it(`${name}${withVehicle ? ", with a vehicle's parts and steering axis" : ""}, ${widthPx} px wide`, () => {
          const l = layoutCrossSection(texts(model(cur, pla, withVehicle)), { widthPx, fontPx: 12 });
          expect(problems(l)).toEqual([]);
          expect(l.labels.length).toBeGreaterThan(12);
          expect(l.mmPerPx).toBeCloseTo(l.viewBox.w / widthPx, 12);
          expect(l.fontMm).toBeCloseTo(12 * l.mmPerPx, 12);
        });
      }
    }
  }

  it("the drawing is not covered: every label lies outside the drawn extents", () => {
    const m = model(STOCK, A, true);
    const l = layoutCrossSection(texts(m), { widthPx: 343, fontPx: 12 });
    const e = m.extents;
    const drawing: Box = { x: e.minX, y: e.minY, w: e.maxX - e.minX, h: e.maxY - e.minY };
    expect(l.labels.filter((b) => boxesOverlap(b.box, drawing)).map((b) => b.id)).toEqual([]);
  });

  it("each label lies over its own dimension line, or beside it with the line continued to it", () => {
    for (const [, cur, pla] of PAIRS) {
      const l = layoutCrossSection(texts(model(cur, pla, true)), { widthPx: 343, fontPx: 12 });
      for (const d of l.dimensions) {
        const along = d.axis === "x" ? ([d.label.x, d.label.x + d.label.w] as const) : ([d.label.y, d.label.y + d.label.h] as const);
        const ends = d.axis === "x" ? [d.line[0].x, d.line[1].x] : [d.line[0].y, d.line[1].y];
        const lo = Math.min(...ends);
        const hi = Math.max(...ends);
        const over = along[0] < hi + 1e-9 && along[1] > lo - 1e-9;
        expect(over || along[0] - hi <= BESIDE_EM * l.fontMm + 1e-9 || lo - along[1] <= BESIDE_EM * l.fontMm + 1e-9, d.id).toBe(true);
        expect(d.run !== null, d.id).toBe(!over);
      }
    }
  });
});

describe("layoutCrossSection: greedy rows", () => {
  const base = { extents: { minX: -300, maxX: 300, minY: 0, maxY: 800 }, callouts: [], legend: [] };
  const dim = (id: string, from: number, to: number, text: string) => ({
    id,
    axis: "x" as const,
    band: "above" as const,
    from,
    to,
    ends: [
      { x: from, y: 700 },
      { x: to, y: 700 },
    ] as [{ x: number; y: number }, { x: number; y: number }],
    text,
  });

  it("two short labels of a chain share the first row; a long one that would meet them goes up a row", () => {
    const l = layoutCrossSection(
      {
        ...base,
        dimensions: [
          dim("in", -200, 0, "in 7 in"),
          dim("out", 0, 200, "out 7 in"),
          dim("wide", -150, 150, "a label long enough to meet both"),
        ],
      },
      { widthPx: 600, fontPx: 12 },
    );
    const y = Object.fromEntries(l.dimensions.map((d) => [d.id, d.line[0].y]));
    expect(y.in).toBe(y.out);
    expect(y.wide).toBeGreaterThan(y.in!);
    expect(problems(l)).toEqual([]);
  });

  it("a short dimension's label moves beside its line, rather than over the extension line of a longer one placed after it", () => {
    // Drafting: smaller dimensions nearer the part, text beside a line too short to hold it.
    const wide = { ...base, extents: { minX: -600, maxX: 600, minY: 0, maxY: 800 } };
    const l = layoutCrossSection(
      { ...wide, dimensions: [dim("big", -100, 0, "backspacing 4.53 in"), dim("small", -100, -87.3, "flange 0.50 in")] },
      { widthPx: 600, fontPx: 12 },
    );
    const small = l.dimensions.find((d) => d.id === "small")!;
    const big = l.dimensions.find((d) => d.id === "big")!;
    expect(small.line[0].y).toBeLessThan(big.line[0].y); // nearer the drawing
    expect(small.label.x + small.label.w).toBeLessThan(-100); // beside, left of both extension lines at −100 and 0
    expect(small.run).toEqual([
      { x: small.label.x + small.label.w, y: small.line[0].y },
      { x: -100, y: small.line[0].y },
    ]);
    expect(big.run).toBeNull();
    const crossings = l.dimensions.flatMap((d) =>
      d.extensions.filter(([a, b]) => l.labels.some((x) => x.id !== d.id && vSegCrossesBox(a.x, a.y, b.y, x.box))).map(() => d.id),
    );
    expect(crossings).toEqual([]);
  });

  it("the legend reads from the top down when it wraps", () => {
    const l = layoutCrossSection(
      {
        ...base,
        dimensions: [],
        legend: [
          { id: "first", text: "Current 265/70R17 113T" },
          { id: "second", text: "Planned 37x12.50R17LT 124Q LRD" },
        ],
      },
      { widthPx: 343, fontPx: 12 },
    );
    const [a, b] = l.legend;
    expect(a!.label.y).toBeGreaterThan(b!.label.y);
    expect(a!.label.y + a!.label.h).toBeLessThanOrEqual(l.viewBox.y + l.viewBox.h + 1e-9);
  });

  it("a label wider than its line is centred on it, kept inside the view", () => {
    const l = layoutCrossSection(
      { ...base, dimensions: [dim("edge", -300, -290, "a label at the very edge")] },
      { widthPx: 343, fontPx: 12 },
    );
    expect(l.dimensions[0]!.label.x).toBe(-300);
    expect(l.dimensions[0]!.label.w).toBeCloseTo(textWidthEm("a label at the very edge") * l.fontMm, 9);
  });

  it("estimates text at 0.62 em a character", () => {
    expect(CHAR_EM).toBe(0.62);
    expect(textWidthEm("offset")).toBeCloseTo(3.72, 12);
    // Code points, not UTF-16 units: "−" and "°" are one character each.
    expect(textWidthEm("−12°")).toBeCloseTo(4 * 0.62, 12);
  });

  it("refuses a width that cannot hold a label, naming widthPx", () => {
    const long = "x".repeat(40);
    expect(() => layoutCrossSection({ ...base, dimensions: [dim("d", 0, 10, long)] }, { widthPx: 200, fontPx: 12 })).toThrow(
      FitmentInputError,
    );
    expect(() => layoutCrossSection({ ...base, dimensions: [dim("d", 0, 10, long)] }, { widthPx: 200, fontPx: 12 })).toThrow(/widthPx/);
    expect(() => layoutCrossSection({ ...base, dimensions: [] }, { widthPx: 50, fontPx: 12 })).toThrow(/widthPx/);
  });
});
