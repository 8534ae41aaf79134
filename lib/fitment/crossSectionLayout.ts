/**
 * Places the cross-section's text so that no two labels overlap at a given rendered width: the
 * legend on top, then rows of lateral dimensions and labelled features above the drawing, rows of
 * wheel dimensions below it, and columns of heights to its right. Each band is stacked greedily:
 * an item goes into the first row (nearest the drawing first) where its label and its dimension
 * line are free, and where its extension or leader lines, crossing the rows between it and the
 * drawing, pass no label there. Pure; text widths are estimated, not measured, so the same layout
 * comes out on the server, in the browser and in a PDF.
 *
 * Units: mm of the drawing (y up, as crossSection.ts). The font is `fontPx` at `widthPx`, so one
 * em is fontPx × (viewBox width / widthPx) mm; the drawing scales uniformly with the page, so
 * labels that do not overlap at `widthPx` do not overlap at any width.
 *
 * Text width: characters × {@link CHAR_EM} em. Inter, the product's face, averages about 0.5 em
 * on these labels and 0.59 em on digits (measured from its advance widths); 0.62 em leaves room
 * for wider fallback faces (common practice, no source).
 */
import { FitmentInputError, requireNumber } from "./errors";
import type { Pt } from "./wheelSection";

/** Estimated advance width per character, em. */
export const CHAR_EM = 0.62;
/** Height of a label box, em: Inter's ascent 0.97 + descent 0.24, rounded up. */
export const LABEL_EM = 1.25;
/** Descent below the baseline, em (Inter 0.24). */
export const DESCENT_EM = 0.24;
/** Row pitch of the bands and column pitch at the right, em. */
export const ROW_EM = 1.9;
/** Space kept free beside each label, em. */
export const PAD_EM = 0.4;
/** Gap between the drawing and its bands, em. */
export const GAP_EM = 0.8;
/** Legend: swatch length and the gap after it, em. */
export const SWATCH_EM = 2.4;

/** A label box, mm: x the left edge, y the bottom edge (y up). */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

/**
 * Where a dimension line runs: along x (a row above or below the drawing) or along y (a column
 * right of it), from `from` to `to` on that axis, with extension lines from the features `ends`.
 */
export interface DimensionLine {
  id: string;
  axis: "x" | "y";
  band: "above" | "below" | "right";
  from: number;
  to: number;
  ends: [Pt, Pt];
}

export interface LayoutDimension extends DimensionLine {
  text: string;
}

/**
 * A dimension line with its label, for the layout: only the line's own fields are taken (the
 * layout needs no more of crossSection.ts's figures, kinds or sources).
 *
 * @example
 * labelledDimension({ id: "d", axis: "x", band: "above", from: 0, to: 10, ends: [{ x: 0, y: 0 }, { x: 10, y: 0 }] }, "10 mm").text; // "10 mm"
 */
export function labelledDimension(d: DimensionLine, text: string): LayoutDimension {
  return { id: d.id, axis: d.axis, band: d.band, from: d.from, to: d.to, ends: d.ends, text };
}

export interface LayoutCallout {
  id: string;
  at: Pt;
  text: string;
}

export interface LayoutInput {
  extents: { minX: number; maxX: number; minY: number; maxY: number };
  dimensions: readonly LayoutDimension[];
  callouts: readonly LayoutCallout[];
  legend: readonly { id: string; text: string }[];
}

export interface PlacedDimension {
  id: string;
  axis: "x" | "y";
  text: string;
  /** The dimension line, between the measured ends, in its row or column. */
  line: [Pt, Pt];
  /** Extension lines from the features to the dimension line. */
  extensions: [Pt, Pt][];
  /** The dimension line continued to its label, when the label sits beside the line rather than over it. */
  run: Pt[] | null;
  label: Box;
  /** Heights read bottom to top (the label turned a quarter anticlockwise). */
  rotated: boolean;
}

export interface PlacedCallout {
  id: string;
  text: string;
  label: Box;
  /** From the feature up to the label's bottom edge. */
  leader: [Pt, Pt];
}

export interface PlacedLegendItem {
  id: string;
  text: string;
  swatch: [Pt, Pt];
  label: Box;
}

export interface CrossSectionLayout {
  /** What the SVG shows, mm (y up; y is the bottom edge). */
  viewBox: Box;
  fontMm: number;
  mmPerPx: number;
  dimensions: PlacedDimension[];
  callouts: PlacedCallout[];
  legend: PlacedLegendItem[];
  /** Every label box, for checks. */
  labels: { id: string; box: Box }[];
}

/**
 * Whether two label boxes share any area (touching edges do not count).
 *
 * @example
 * boxesOverlap({ x: 0, y: 0, w: 10, h: 5 }, { x: 9, y: 4, w: 5, h: 5 });  // true
 * boxesOverlap({ x: 0, y: 0, w: 10, h: 5 }, { x: 10, y: 0, w: 5, h: 5 }); // false
 */
export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

/**
 * Estimated width of a text, em.
 *
 * @example
 * textWidthEm("offset"); // 3.72  (6 × 0.62)
 */
export function textWidthEm(text: string): number {
  return [...text].length * CHAR_EM;
}

type Kind = "label" | "line" | "thin";
interface Span {
  kind: Kind;
  lo: number;
  hi: number;
}

const EPS = 1e-6;

/** What one item asks of a lane: a label of width w near its line, the line, and the lines it sends down to the drawing. */
interface Ask {
  w: number;
  /** Where the label would like to start (centred on its feature), kept inside the view. */
  prefer: number;
  /** The label must lie over this interval or beside it (within {@link BESIDE_EM}) to read as its own. */
  attach: [number, number];
  line: [number, number] | null;
  /** Positions of the extension lines or the leader, which cross every lane nearer the drawing. */
  thin: number[];
  /** Overrides how far beside `attach` the label may sit (0: it must lie over it, as a callout over its leader). */
  beside?: number;
}

/** How far beside its dimension line a label may sit (the line is continued to it), em. */
export const BESIDE_EM = 1.5;

/**
 * Lanes (rows or columns) of spans, filled greedily from the drawing outward, one item at a
 * time. Hard rules: a label keeps `pad` from every label and dimension line of its lane, and the
 * lines of one lane do not overlap (a chain of dimensions may meet end to end). Soft rule:
 * extension lines and leaders, which run from the drawing out to their own lane across the lanes
 * nearer to it, should cross no label; two overlaid setups at phone scale put more extension
 * lines under the labels than can always be avoided, so the fewest crossings win, then the lane
 * nearest the drawing, then the position nearest the centred one. (Drawn labels carry a halo that
 * interrupts any line behind them, as drafting practice breaks a line at its text.)
 */
class Lanes {
  private lanes: Span[][] = [];

  /**
   * @param ahead positions of every extension line and leader of the items still to come: a
   *   label over one of them will likely be crossed (those items go further out), so it counts
   *   half a crossing.
   */
  constructor(
    private readonly lo: number,
    private readonly hi: number,
    private readonly pad: number,
    private readonly beside: number,
    private ahead: number[][] = [],
  ) {}

  get count(): number {
    return this.lanes.filter((l) => l.some((s) => s.kind !== "thin")).length;
  }

  private clash(a: Span, b: Span): boolean {
    if (a.kind === "thin" || b.kind === "thin") return false;
    if (a.kind === "line" && b.kind === "line") return a.lo < b.hi - EPS && b.lo < a.hi - EPS;
    return a.lo < b.hi + this.pad && b.lo < a.hi + this.pad;
  }

  private static under(x: number, lo: number, hi: number): boolean {
    return x > lo + EPS && x < hi - EPS;
  }

  /** Places an item (the next of those given as `ahead`, if any); returns its lane and where its label starts. */
  place(ask: Ask): { lane: number; at: number } {
    this.ahead = this.ahead.slice(1);
    const future = this.ahead.flat().sort((a, b) => a - b);
    const maxStart = this.hi - ask.w;
    const [a0, a1] = ask.attach;
    const beside = ask.beside ?? this.beside;
    const near = (x: number) => x < a1 + beside + EPS && x + ask.w > a0 - beside - EPS;
    let best: { lane: number; at: number; cost: number; shift: number } | null = null;
    // Crossings of this item's lines through the labels of the lanes below lane k: they only grow
    // with k, so once they reach the best cost found no farther lane can do better.
    let below = 0;
    for (let k = 0; k <= this.lanes.length; k++) {
      if (best && below >= best.cost) break;
      const lane = this.lanes[k] ?? [];
      const starts = [
        ask.prefer,
        a0,
        a1 - ask.w,
        a0 - this.pad - ask.w,
        a1 + this.pad,
        ...lane.flatMap((o) => [o.hi + this.pad + EPS, o.lo - this.pad - ask.w - EPS]),
      ];
      for (const raw of starts) {
        const x = Math.min(Math.max(raw, this.lo), maxStart);
        if (!near(x)) continue;
        const own: Span[] = [
          { kind: "label", lo: x, hi: x + ask.w },
          ...(ask.line ? [{ kind: "line" as const, lo: ask.line[0], hi: ask.line[1] }] : []),
        ];
        if (!own.every((sp) => lane.every((o) => !this.clash(sp, o)))) continue;
        // Lines passing through this lane under the label, and half for each line still to come under it.
        const passing = lane.filter((o) => o.kind === "thin" && Lanes.under(o.lo, x, x + ask.w)).length;
        const cost = below + passing + 0.5 * countBetween(future, x, x + ask.w);
        const shift = Math.abs(x - ask.prefer);
        if (!best || cost < best.cost || (cost === best.cost && k === best.lane && shift < best.shift - EPS))
          best = { lane: k, at: x, cost, shift };
      }
      for (const o of lane) if (o.kind === "label") for (const t of ask.thin) if (Lanes.under(t, o.lo, o.hi)) below++;
    }
    // A fresh lane beyond the last always takes the item (its centred start is near its line), so `best` is set.
    const { lane: k, at } = best!;
    while (this.lanes.length <= k) this.lanes.push([]);
    this.lanes[k]!.push({ kind: "label", lo: at, hi: at + ask.w });
    if (ask.line) this.lanes[k]!.push({ kind: "line", lo: ask.line[0], hi: ask.line[1] });
    for (let j = 0; j < k; j++) for (const x of ask.thin) this.lanes[j]!.push({ kind: "thin", lo: x, hi: x });
    return { lane: k, at };
  }
}

/** How many of the sorted values lie strictly between lo and hi (beyond EPS). */
function countBetween(sorted: readonly number[], lo: number, hi: number): number {
  const first = (v: number) => {
    let a = 0;
    let b = sorted.length;
    while (a < b) {
      const m = (a + b) >> 1;
      if (sorted[m]! <= v) a = m + 1;
      else b = m;
    }
    return a;
  };
  return Math.max(0, first(hi - EPS - EPS) - first(lo + EPS));
}

/** The stretch from a dimension line's end to its label, when the label lies beside the line. */
function runTo(lo: number, hi: number, a: number, b: number): [number, number] | null {
  if (a > hi) return [hi, a];
  if (b < lo) return [b, lo];
  return null;
}

/** Centres a span of width w on c, kept inside [lo, hi]. */
function within(c: number, w: number, lo: number, hi: number): number {
  return Math.min(Math.max(c - w / 2, lo), hi - w);
}

/**
 * Lays out every label of the drawing for a rendered width.
 * Throws FitmentInputError when the width cannot hold the drawing's columns or a label.
 *
 * @example
 * const l = layoutCrossSection({ extents: { minX: -200, maxX: 220, minY: -43, maxY: 870 }, dimensions: [], callouts: [{ id: "hub", at: { x: 0, y: 520 }, text: "hub face" }], legend: [] }, { widthPx: 343, fontPx: 12 });
 * l.mmPerPx;        // 1.2245  (420 mm over 343 px)
 * l.callouts[0]!.label.y; // 870 + 0.8 em + 0.45 em above the drawing
 */
export function layoutCrossSection(input: LayoutInput, options: { widthPx: number; fontPx: number }): CrossSectionLayout {
  const widthPx = requireNumber("widthPx", options.widthPx, 120, 4000, "343", "px");
  const fontPx = requireNumber("fontPx", options.fontPx, 6, 40, "12", "px");
  const ex = input.extents;
  const drawW = ex.maxX - ex.minX;
  if (!(drawW > 0) || !(ex.maxY > ex.minY))
    throw new FitmentInputError(
      "extents",
      "extents must span a positive width and height (e.g. { minX: -200, maxX: 220, minY: 0, maxY: 900 })",
      ex,
    );
  const ydims = input.dimensions.filter((d) => d.axis === "y");

  // The columns at the right take em-sized room, and an em depends on the whole width: grow the
  // column count until the greedy packing needs no more than was allowed for.
  let columns = ydims.length > 0 ? 1 : 0;
  let em = 0;
  let vbW = 0;
  let placedY: PlacedDimension[] = [];
  for (;;) {
    const share = columns > 0 ? (GAP_EM + columns * ROW_EM) * (fontPx / widthPx) : 0;
    if (share >= 0.6)
      throw new FitmentInputError(
        "widthPx",
        `widthPx ${widthPx} px is too narrow for the drawing's ${columns} height columns at ${fontPx} px text (e.g. 343)`,
        widthPx,
      );
    vbW = drawW / (1 - share);
    em = fontPx * (vbW / widthPx);
    const lanes = new Lanes(ex.minY, ex.maxY, PAD_EM * em, BESIDE_EM * em);
    const left0 = ex.maxX + GAP_EM * em;
    placedY = ydims.map((d) => {
      const lo = Math.min(d.from, d.to);
      const hi = Math.max(d.from, d.to);
      const len = textWidthEm(d.text) * em;
      if (len > ex.maxY - ex.minY)
        throw new FitmentInputError("dimensions", `dimensions: the label "${d.text}" is longer than the drawing is tall`, d.text);
      const { lane: k, at: y0 } = lanes.place({
        w: len,
        prefer: within((lo + hi) / 2, len, ex.minY, ex.maxY),
        attach: [lo, hi],
        line: [lo, hi],
        thin: d.ends.map((p) => p.y),
      });
      // Line on the column's left, label to its right: the extension lines, coming from the
      // drawing on the left, stop at the line and never cross their own label.
      const colX = left0 + k * ROW_EM * em;
      const lineX = colX + 0.2 * em;
      return {
        id: d.id,
        axis: "y",
        text: d.text,
        line: [
          { x: lineX, y: d.from },
          { x: lineX, y: d.to },
        ],
        extensions: d.ends.map((p): [Pt, Pt] => [p, { x: lineX + 0.1 * em, y: p.y }]),
        run: runTo(lo, hi, y0, y0 + len)?.map((v): Pt => ({ x: lineX, y: v })) ?? null,
        label: { x: colX + 0.45 * em, y: y0, w: LABEL_EM * em, h: len },
        rotated: true,
      };
    });
    if (lanes.count <= columns) break;
    columns = lanes.count;
  }
  const x0 = ex.minX;
  const x1 = ex.minX + vbW;
  const labelW = (text: string) => {
    const w = textWidthEm(text) * em;
    if (w > vbW)
      throw new FitmentInputError("widthPx", `widthPx ${widthPx} px cannot hold the label "${text}" at ${fontPx} px text (e.g. 343)`, text);
    return w;
  };

  // Rows above (lateral reach, labelled features) and below (the wheel's own dimensions).
  // Order within a band: labelled features first (short labels, long leaders), then dimensions
  // from the shortest to the longest, as drafting puts the smaller dimensions nearer the part.
  const baseAbove = ex.maxY + GAP_EM * em;
  const baseBelow = ex.minY - GAP_EM * em;
  // Above: the line low in its row and the label over it; below: the line high in its row and the
  // label under it. Either way the extension lines, coming from the drawing, stop at the line
  // (0.1 em past it, less than the 0.15 em to the label) and never cross their own label.
  const rowLineY = (band: "above" | "below", k: number) =>
    band === "above" ? baseAbove + (k * ROW_EM + 0.3) * em : baseBelow - (k * ROW_EM + 0.3) * em;
  const span = (d: LayoutDimension) => Math.abs(d.to - d.from);
  const xdims = input.dimensions.filter((d) => d.axis === "x");
  type Item = { callout: LayoutCallout; dim?: undefined } | { dim: LayoutDimension; callout?: undefined };
  const bandItems = (band: "above" | "below"): Item[] => [
    ...(band === "above" ? input.callouts.map((c): Item => ({ callout: c })) : []),
    ...xdims
      .filter((d) => (d.band === "below" ? "below" : "above") === band)
      .map((d, i) => ({ d, i }))
      .sort((a, b) => span(a.d) - span(b.d) || a.i - b.i)
      .map(({ d }): Item => ({ dim: d })),
  ];
  const placedX: PlacedDimension[] = [];
  const callouts: PlacedCallout[] = [];
  const lanesOf: Record<"above" | "below", Lanes> = {
    above: new Lanes(x0, x1, PAD_EM * em, BESIDE_EM * em),
    below: new Lanes(x0, x1, PAD_EM * em, BESIDE_EM * em),
  };
  for (const band of ["above", "below"] as const) {
    const items = bandItems(band);
    const lanes = new Lanes(
      x0,
      x1,
      PAD_EM * em,
      BESIDE_EM * em,
      items.map((it) => (it.dim ? it.dim.ends.map((p) => p.x) : [it.callout.at.x])),
    );
    lanesOf[band] = lanes;
    const up = band === "above";
    for (const it of items) {
      if (it.callout) {
        const c = it.callout;
        const w = labelW(c.text);
        const { lane: k, at: lx } = lanes.place({
          w,
          prefer: within(c.at.x, w, x0, x1),
          attach: [c.at.x, c.at.x],
          line: null,
          thin: [c.at.x],
          beside: 0,
        });
        const y = rowLineY("above", k) + 0.15 * em;
        callouts.push({ id: c.id, text: c.text, label: { x: lx, y, w, h: LABEL_EM * em }, leader: [c.at, { x: c.at.x, y }] });
        continue;
      }
      const d = it.dim;
      const lo = Math.min(d.from, d.to);
      const hi = Math.max(d.from, d.to);
      const w = labelW(d.text);
      const { lane: k, at: lx } = lanes.place({
        w,
        prefer: within((lo + hi) / 2, w, x0, x1),
        attach: [lo, hi],
        line: [lo, hi],
        thin: d.ends.map((p) => p.x),
      });
      const y = rowLineY(band, k);
      placedX.push({
        id: d.id,
        axis: "x",
        text: d.text,
        line: [
          { x: d.from, y },
          { x: d.to, y },
        ],
        extensions: d.ends.map((p): [Pt, Pt] => [p, { x: p.x, y: y + (up ? 0.1 : -0.1) * em }]),
        run: runTo(lo, hi, lx, lx + w)?.map((v): Pt => ({ x: v, y })) ?? null,
        label: { x: lx, y: up ? y + 0.15 * em : y - (0.15 + LABEL_EM) * em, w, h: LABEL_EM * em },
        rotated: false,
      });
    }
  }
  const above = lanesOf.above;
  const below = lanesOf.below;
  const aboveRows = above.count;
  const belowRows = below.count;

  // The legend, flowing left to right in rows on top, read from the top down.
  const legendBase = baseAbove + aboveRows * ROW_EM * em + (aboveRows > 0 ? GAP_EM * em : 0);
  const flow: { item: LayoutInput["legend"][number]; w: number; x: number; row: number }[] = [];
  let row = 0;
  let x = x0;
  for (const item of input.legend) {
    const w = labelW(item.text);
    const need = (SWATCH_EM + 0.4) * em + w;
    if (need > vbW)
      throw new FitmentInputError(
        "widthPx",
        `widthPx ${widthPx} px cannot hold the legend "${item.text}" at ${fontPx} px text (e.g. 343)`,
        item.text,
      );
    if (x > x0 && x + need > x1) {
      row += 1;
      x = x0;
    }
    flow.push({ item, w, x, row });
    x += need + 1.2 * em;
  }
  const legend: PlacedLegendItem[] = flow.map(({ item, w, x: at, row: k }) => {
    const y = legendBase + ((row - k) * ROW_EM + 0.3) * em;
    const mid = y + (DESCENT_EM + 0.35) * em;
    return {
      id: item.id,
      text: item.text,
      swatch: [
        { x: at, y: mid },
        { x: at + SWATCH_EM * em, y: mid },
      ],
      label: { x: at + (SWATCH_EM + 0.4) * em, y, w, h: LABEL_EM * em },
    };
  });
  const legendRows = input.legend.length > 0 ? row + 1 : 0;
  const top = legendBase + legendRows * ROW_EM * em;
  const bottom = baseBelow - belowRows * ROW_EM * em;
  // Back in the order given (the drawing's order), whatever order they were placed in.
  const order = new Map(input.dimensions.map((d, i) => [d.id, i]));
  const dimensions = [...placedX, ...placedY].sort((a, b) => order.get(a.id)! - order.get(b.id)!);
  const labels = [
    ...dimensions.map((d) => ({ id: d.id, box: d.label })),
    ...callouts.map((c) => ({ id: c.id, box: c.label })),
    ...legend.map((l) => ({ id: l.id, box: l.label })),
  ];
  return {
    viewBox: { x: x0, y: bottom, w: vbW, h: top - bottom },
    fontMm: em,
    mmPerPx: vbW / widthPx,
    dimensions,
    callouts,
    legend,
    labels,
  };
}
