/**
 * One setup's wheel and tire cut by the vertical plane through the axle, seen from the front of
 * the vehicle, to scale (1 unit = 1 mm): the geometry of the cross-section drawing
 * (crossSection.ts overlays two of them). Pure numbers; the picture is drawn elsewhere.
 *
 * ## Frame
 * x: lateral, from the hub mounting face (x = 0), outboard positive — the engine's convention
 * (README: every lateral distance is measured from the hub face). y: up from this setup's ground
 * (y = 0); the axle is at y = R = D/2.
 *
 * ## Figures and where each comes from (engine functions)
 * - rim centreline x = −effective offset, effective offset = offset − spacer (geometry.ts
 *   `setupGeometry`, `effectiveOffsetMm`);
 * - mounting face of the wheel x = spacer thickness (the wheel sits on the spacer; offset.ts
 *   convention: offset = mounting face − centreline, so face − centreline = offset exactly);
 * - bead seats x = −`beadSeatInboardMm` and +`beadSeatOutboardMm` (geometry.ts: W/2 ± effective
 *   offset, W nominal between the bead seats), at the rim's radius d/2 from the axle (the rim
 *   diameter is the bead-seat diameter, ISO 4000-1 / ETRTO);
 * - flange outer edges: the bead seats widened by the flange allowance (offset.ts: backspacing to
 *   the flange = to the bead seat + allowance);
 * - backspacing: offset.ts `backspacingFromOffset` with the reference and allowance given (of the
 *   wheel itself, from its own mounting face: a spacer does not change it);
 * - tire: reaches −`innerSwingMm` and +`outerSwingMm` (geometry.ts; section width on the actual
 *   rim, UN R30 §6.1.1.1 K = 0.4), from the ground to y = D (`overallDiameterMm`), the sidewall
 *   H = `sidewallMm` = (D − d)/2 between the bead seat and the tread (ISO 4000-1).
 *
 * ## Schematic shapes ({@link SCHEMATIC}; they place nothing the figures above give)
 * Flange profile and height, bead-seat flat and safety hump, drop-centre well, rim thickness,
 * centre bore, mounting pad, disc and spacer diameters, the sidewall's curve, where it is widest
 * and the tread width: typical values, each marked "from memory" or "common practice, no
 * source". The drawn tire is held inside the engine's figures: every control point of its curves
 * lies within the reach and the diameter, the widest sidewall point is exactly at the engine's
 * reach and the tread exactly at the ground and at D (while the rim is narrower than the section).
 */
import { FitmentInputError } from "./errors";
import type { SetupGeometry } from "./geometry";
import { type BackspacingReference, DEFAULT_FLANGE_IN, backspacingFromOffset } from "./offset";
import { MM_PER_IN } from "./units";

/**
 * Typical dimensions of the parts drawn schematically, mm unless named otherwise.
 * None of them moves a figure the engine gives (bead seats, flanges' outer edges, mounting face,
 * tire reach, diameter).
 */
export const SCHEMATIC = Object.freeze({
  /** Flange height above the bead seat: about the "J" contour of passenger and light-truck rims, 17.3–17.5 mm (from memory of the ETRTO/TRA contour tables, not checked). */
  flangeHeightMm: 17.5,
  /** Rim (barrel) wall thickness (common practice, no source: cast light-truck rims 5–8 mm). */
  rimThicknessMm: 6,
  /** Bead-seat flat, lateral (from memory: roughly 20 mm on 15–17 in rims), at most this share of the rim width. */
  beadSeatWidthMm: 20,
  beadSeatWidthMaxShare: 0.15,
  /** Safety hump just inside each bead seat (from memory: a ridge of about 1–2 mm). */
  humpHeightMm: 1.5,
  humpWidthMm: 6,
  humpWidthMaxShare: 0.04,
  /** Drop-centre well depth below the bead seat and the ramp down to it (from memory: 15–20 mm deep on these rims). */
  wellDepthMm: 18,
  wellRampMm: 15,
  wellRampMaxShare: 0.1,
  /** Centre bore radius: 108 mm bores are common on six-lug trucks (from memory). */
  centreBoreRadiusMm: 54,
  /** Mounting pad outer radius: a bolt circle of 139.7 mm plus the nut seats (from memory). */
  padRadiusMm: 95,
  /** Pad and disc thickness of a cast wheel (common practice, no source). */
  padThicknessMm: 22,
  discThicknessMm: 14,
  /** Where the sidewall is widest, as a share of the sidewall height from the bead seat (from memory: about mid-height on radial tires). */
  widestAtShare: 0.5,
  /** Tread width as a share of the section width (from memory: light-truck treads are about 0.8 of the section). */
  treadShare: 0.8,
  /** Casing thickness drawn inside the tire: sidewall and under the tread (from memory: light-truck sidewalls about 10 mm, tread with belts about 25 mm). */
  sidewallThicknessMm: 10,
  treadThicknessMm: 25,
});

/** A point of the drawing, mm. */
export interface Pt {
  x: number;
  y: number;
}

/** One step of an outline (the SVG path commands M, L, C, Z). */
export type PathCmd = { op: "M"; to: Pt } | { op: "L"; to: Pt } | { op: "C"; c1: Pt; c2: Pt; to: Pt } | { op: "Z" };

/** An outline made of one or more closed or open paths. */
export type Outline = PathCmd[];

/** How one setup's backspacing is shown: its reference and flange allowance. */
export interface BackspacingChoice {
  /** Where the backspacing is measured to; the flange edge when not chosen (how a straight edge across the wheel's back measures it). */
  reference?: BackspacingReference;
  /** Flange allowance, inches (0–2; default 0.5, offset.ts). */
  flangeIn?: number;
}

/** One setup's cross-section in its own frame (ground y = 0) or moved onto a shared axle. */
export interface WheelSection {
  /** Height of the axle (wheel centre) above this setup's ground. */
  axleY: number;
  groundY: number;
  topY: number;
  /** Bead-seat radius (d/2) from the axle. */
  rimRadiusMm: number;
  overallDiameterMm: number;
  sidewallMm: number;
  sectionWidthMm: number;
  rimWidthMm: number;
  spacerMm: number;
  offsetMm: number;
  effectiveOffsetMm: number;
  centrelineX: number;
  mountingFaceX: number;
  beadSeat: { inboardX: number; outboardX: number; lowerY: number; upperY: number };
  flange: { inboardX: number; outboardX: number; allowanceMm: number; heightMm: number };
  tire: { innerX: number; outerX: number; widestLowerY: number; widestUpperY: number; treadHalfWidthMm: number };
  pad: { x0: number; x1: number; innerRadiusMm: number; outerRadiusMm: number };
  spacer: { x0: number; x1: number; innerRadiusMm: number; outerRadiusMm: number } | null;
  backspacing: { reference: BackspacingReference; fromX: number; toX: number; valueMm: number; valueIn: number };
  shapes: {
    /** The tire's section, below and above the axle. */
    tire: [Outline, Outline];
    /** The air chamber inside the casing (open at the rim, which closes it), below and above: filled, not stroked. */
    cavity: [Outline, Outline];
    /** The casing's inner wall, from bead to bead (stroked). */
    liner: [Outline, Outline];
    /** Barrel with both flanges, bead seats, humps and well, below and above the axle. */
    rim: [Outline, Outline];
    /** Disc from the pad to the barrel, below and above. */
    disc: [Outline, Outline];
    /** Mounting pad on the hub face, below and above the bore. */
    pad: [Outline, Outline];
    /** Spacer block between hub face and wheel, below and above the bore; empty without a spacer. */
    spacer: Outline[];
    /** Rim centreline, from the ground to the top of the tire. */
    centreline: [Pt, Pt];
  };
}

const zero = (v: number) => (v === 0 ? 0 : v);
const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** Moves every point of an outline by dy. */
function shifted(o: Outline, dy: number): Outline {
  const m = (p: Pt): Pt => ({ x: p.x, y: p.y + dy });
  return o.map((c) => (c.op === "Z" ? c : c.op === "C" ? { op: "C", c1: m(c.c1), c2: m(c.c2), to: m(c.to) } : { op: c.op, to: m(c.to) }));
}

/** An outline given as (x, ρ) with ρ the distance from the axle, drawn below (−1) or above (+1) it. */
function radial(
  axleY: number,
  side: 1 | -1,
  cmds: ReadonlyArray<
    { op: "M" | "L"; x: number; r: number } | { op: "C"; c: [number, number, number, number]; x: number; r: number } | { op: "Z" }
  >,
): Outline {
  const at = (x: number, r: number): Pt => ({ x, y: axleY + side * r });
  return cmds.map((c) => {
    if (c.op === "Z") return { op: "Z" };
    if (c.op === "C") return { op: "C", c1: at(c.c[0], c.c[1]), c2: at(c.c[2], c.c[3]), to: at(c.x, c.r) };
    return { op: c.op, to: at(c.x, c.r) };
  });
}

type RCmd = Parameters<typeof radial>[2][number];

function rimProfile(xbi: number, xbo: number, f: number, r: number): RCmd[] {
  const S = SCHEMATIC;
  const w = xbo - xbi;
  const G = S.flangeHeightMm;
  const t = S.rimThicknessMm;
  const bs = Math.min(S.beadSeatWidthMm, w * S.beadSeatWidthMaxShare);
  const hw = Math.min(S.humpWidthMm, w * S.humpWidthMaxShare);
  const ramp = Math.min(S.wellRampMm, w * S.wellRampMaxShare);
  const wd = S.wellDepthMm;
  // Flange curl: top exactly at r + G (a cubic's peak is its end height + ¾ of the control rise).
  const k = Math.min(f / 2, G / 2);
  const lip = r + G - k;
  const ctl = r + G + k / 3;
  const xfi = xbi - f;
  const xfo = xbo + f;
  const inW0 = xbi + bs + hw + ramp;
  const inW1 = xbo - bs - hw - ramp;
  return [
    { op: "M", x: xfi, r: r - t },
    { op: "L", x: xfi, r: lip },
    { op: "C", c: [xfi, ctl, xbi, ctl], x: xbi, r: lip },
    { op: "L", x: xbi, r },
    { op: "L", x: xbi + bs, r },
    { op: "L", x: xbi + bs + hw / 2, r: r + S.humpHeightMm },
    { op: "L", x: xbi + bs + hw, r },
    { op: "L", x: inW0, r: r - wd },
    { op: "L", x: inW1, r: r - wd },
    { op: "L", x: xbo - bs - hw, r },
    { op: "L", x: xbo - bs - hw / 2, r: r + S.humpHeightMm },
    { op: "L", x: xbo - bs, r },
    { op: "L", x: xbo, r },
    { op: "L", x: xbo, r: lip },
    { op: "C", c: [xbo, ctl, xfo, ctl], x: xfo, r: lip },
    { op: "L", x: xfo, r: r - t },
    { op: "L", x: xbo - bs - hw, r: r - t },
    { op: "L", x: inW1, r: r - wd - t },
    { op: "L", x: inW0, r: r - wd - t },
    { op: "L", x: xbi + bs + hw, r: r - t },
    { op: "Z" },
  ];
}

/** Where one sidewall-and-crown outline runs: beads, widest points, tread edges and crown radius. */
interface OutlinePoints {
  xbi: number;
  xbo: number;
  xin: number;
  xout: number;
  ti: number;
  to: number;
  r: number;
  tip: number;
  wide: number;
  crown: number;
}

/**
 * The open bead-to-bead outline both the casing's outside and its inside follow (schematic):
 * up from the bead to the flange tip, out to the widest point, over the shoulder to the crown.
 */
function sectionOutline(p: OutlinePoints): RCmd[] {
  const { xbi, xbo, xin, xout, ti, to, r, tip, wide, crown } = p;
  return [
    { op: "M", x: xbi, r },
    { op: "L", x: xbi, r: tip },
    { op: "C", c: [xbi + 0.6 * (xin - xbi), tip + 0.1 * (wide - tip), xin, wide - 0.45 * (wide - tip)], x: xin, r: wide },
    { op: "C", c: [xin, wide + 0.55 * (crown - wide), ti - 0.35 * (ti - xin), crown], x: ti, r: crown },
    { op: "L", x: to, r: crown },
    { op: "C", c: [to + 0.35 * (xout - to), crown, xout, wide + 0.55 * (crown - wide)], x: xout, r: wide },
    { op: "C", c: [xout, wide - 0.45 * (wide - tip), xbo + 0.6 * (xout - xbo), tip + 0.1 * (wide - tip)], x: xbo, r: tip },
    { op: "L", x: xbo, r },
  ];
}

function tireProfile(sec: {
  xbi: number;
  xbo: number;
  xin: number;
  xout: number;
  xc: number;
  r: number;
  R: number;
  H: number;
  tw: number;
}): RCmd[] {
  const { xbi, xbo, xin, xout, xc, r, R, H, tw } = sec;
  const S = SCHEMATIC;
  // Leaves the rim at the flange tip (or lower on a very low profile), widest at mid-sidewall.
  const tip = r + Math.min(S.flangeHeightMm, 0.4 * H);
  const wide = r + S.widestAtShare * H;
  const ti = xc - tw / 2;
  const to = xc + tw / 2;
  // Every control point lies within [xin, xout] × [r, R], so the curve stays inside the engine's
  // reach and diameter, and touches them where the tangent is vertical (widest) or level (tread).
  return [...sectionOutline({ xbi, xbo, xin, xout, ti, to, r, tip, wide, crown: R }), { op: "Z" }];
}

/**
 * The casing's inside: the outer profile moved in by the sidewall thickness at the sides and the
 * tread thickness at the crown (schematic). Open from bead to bead; `closed` adds the rim line.
 */
function cavityProfile(sec: Parameters<typeof tireProfile>[0], closed: boolean): RCmd[] {
  const S = SCHEMATIC;
  const t = S.sidewallThicknessMm;
  const { r, R, H, xc, tw } = sec;
  const xin = sec.xin + t;
  const xout = sec.xout - t;
  const xbi = Math.min(sec.xbi + t, xc);
  const xbo = Math.max(sec.xbo - t, xc);
  const Rin = R - Math.min(S.treadThicknessMm, 0.3 * H);
  const tip = r + Math.min(S.flangeHeightMm, 0.4 * H);
  const wide = r + S.widestAtShare * H;
  const ti = Math.max(xc - tw / 2 + t, xin);
  const to = Math.min(xc + tw / 2 - t, xout);
  const out = sectionOutline({ xbi, xbo, xin, xout, ti, to, r, tip, wide, crown: Rin });
  return closed ? [...out, { op: "Z" }] : out;
}

/**
 * One setup's cross-section in its own frame: hub face x = 0 (outboard +), ground y = 0.
 * Throws FitmentInputError for a flange allowance outside 0–2 in or an unknown reference
 * (offset.ts checks them).
 *
 * @example
 * const s = wheelSection(setupGeometry({ tire: "35x12.50R17LT", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } }));
 * s.beadSeat.inboardX;  // -102.3  (−(114.3 − 12))
 * s.tire.outerX;        // 165.67  (307.34/2 + 12)
 * s.backspacing.valueIn; // 4.5276 (to the flange edge: 4.0276 + 0.5)
 */
export function wheelSection(g: SetupGeometry, choice: BackspacingChoice = {}): WheelSection {
  const S = SCHEMATIC;
  const reference = choice.reference ?? "flange";
  const flangeIn = choice.flangeIn ?? DEFAULT_FLANGE_IN;
  const valueIn = backspacingFromOffset({ widthIn: g.wheel.widthIn, offsetMm: g.wheel.offsetMm, measuredFrom: reference, flangeIn });
  const f = flangeIn * MM_PER_IN;
  const D = g.overallDiameterMm;
  const R = D / 2;
  const r = (g.wheel.diameterIn * MM_PER_IN) / 2;
  const H = g.sidewallMm;
  const xc = -g.effectiveOffsetMm;
  const xm = g.spacerMm;
  const xbi = -g.beadSeatInboardMm;
  const xbo = g.beadSeatOutboardMm;
  const xin = -g.innerSwingMm;
  const xout = g.outerSwingMm;
  const tw = S.treadShare * g.sectionWidthMm;
  const sec = { xbi, xbo, xin, xout, xc, r, R, H, tw };
  // The pad and bore shrink on small wheels so the disc still meets the barrel (schematic).
  const barrelIn = r - S.wellDepthMm - S.rimThicknessMm;
  const padR = Math.min(S.padRadiusMm, 0.8 * barrelIn);
  const boreR = Math.min(S.centreBoreRadiusMm, 0.6 * padR);
  const padT = S.padThicknessMm;
  const w = xbo - xbi;
  const wellLo =
    xbi +
    Math.min(S.beadSeatWidthMm, w * S.beadSeatWidthMaxShare) +
    Math.min(S.humpWidthMm, w * S.humpWidthMaxShare) +
    Math.min(S.wellRampMm, w * S.wellRampMaxShare);
  const wellHi = xbo - (wellLo - xbi);
  const half = S.discThicknessMm / 2;
  const joint = clamp(xm + padT / 2, Math.min(wellLo + half, (wellLo + wellHi) / 2), Math.max(wellHi - half, (wellLo + wellHi) / 2));
  const both = (cmds: RCmd[]): [Outline, Outline] => [radial(R, -1, cmds), radial(R, 1, cmds)];
  const box = (x0: number, x1: number, r0: number, r1: number): RCmd[] => [
    { op: "M", x: x0, r: r0 },
    { op: "L", x: x1, r: r0 },
    { op: "L", x: x1, r: r1 },
    { op: "L", x: x0, r: r1 },
    { op: "Z" },
  ];
  const spacer = g.spacerMm > 0 ? { x0: 0, x1: g.spacerMm, innerRadiusMm: boreR, outerRadiusMm: padR } : null;
  return {
    axleY: R,
    groundY: 0,
    topY: D,
    rimRadiusMm: r,
    overallDiameterMm: D,
    sidewallMm: H,
    sectionWidthMm: g.sectionWidthMm,
    rimWidthMm: g.rimWidthMm,
    spacerMm: g.spacerMm,
    offsetMm: g.wheel.offsetMm,
    effectiveOffsetMm: g.effectiveOffsetMm,
    centrelineX: zero(xc),
    mountingFaceX: xm,
    beadSeat: { inboardX: xbi, outboardX: xbo, lowerY: R - r, upperY: R + r },
    flange: { inboardX: xbi - f, outboardX: xbo + f, allowanceMm: f, heightMm: S.flangeHeightMm },
    tire: {
      innerX: xin,
      outerX: xout,
      widestLowerY: R - r - S.widestAtShare * H,
      widestUpperY: R + r + S.widestAtShare * H,
      treadHalfWidthMm: tw / 2,
    },
    pad: { x0: xm, x1: xm + padT, innerRadiusMm: boreR, outerRadiusMm: padR },
    spacer,
    backspacing: { reference, fromX: reference === "flange" ? xbi - f : xbi, toX: xm, valueMm: valueIn * MM_PER_IN, valueIn },
    shapes: {
      tire: both(tireProfile(sec)),
      cavity: both(cavityProfile(sec, true)),
      liner: both(cavityProfile(sec, false)),
      rim: both(rimProfile(xbi, xbo, f, r)),
      disc: both([
        { op: "M", x: xm, r: padR },
        { op: "L", x: joint - half, r: barrelIn },
        { op: "L", x: joint + half, r: barrelIn },
        { op: "L", x: xm + padT, r: padR },
        { op: "Z" },
      ]),
      pad: both(box(xm, xm + padT, boreR, padR)),
      spacer: spacer ? both(box(0, spacer.x1, boreR, padR)) : [],
      centreline: [
        { x: zero(xc), y: 0 },
        { x: zero(xc), y: D },
      ],
    },
  };
}

/**
 * The same section moved up or down by dy (onto a shared axle).
 *
 * @example
 * movedSection(wheelSection(g), -43.1).groundY; // -43.1
 */
export function movedSection(s: WheelSection, dy: number): WheelSection {
  if (dy === 0) return s;
  const pair = (o: [Outline, Outline]): [Outline, Outline] => [shifted(o[0], dy), shifted(o[1], dy)];
  return {
    ...s,
    axleY: s.axleY + dy,
    groundY: s.groundY + dy,
    topY: s.topY + dy,
    beadSeat: { ...s.beadSeat, lowerY: s.beadSeat.lowerY + dy, upperY: s.beadSeat.upperY + dy },
    tire: { ...s.tire, widestLowerY: s.tire.widestLowerY + dy, widestUpperY: s.tire.widestUpperY + dy },
    shapes: {
      tire: pair(s.shapes.tire),
      cavity: pair(s.shapes.cavity),
      liner: pair(s.shapes.liner),
      rim: pair(s.shapes.rim),
      disc: pair(s.shapes.disc),
      pad: pair(s.shapes.pad),
      spacer: s.shapes.spacer.map((o) => shifted(o, dy)),
      centreline: [
        { x: s.shapes.centreline[0].x, y: s.shapes.centreline[0].y + dy },
        { x: s.shapes.centreline[1].x, y: s.shapes.centreline[1].y + dy },
      ],
    },
  };
}

/**
 * Bounding box of an outline, from its end points and 64 samples of every curve.
 *
 * @example
 * outlineExtents([{ op: "M", to: { x: 0, y: 0 } }, { op: "L", to: { x: 10, y: 5 } }]); // { minX: 0, maxX: 10, minY: 0, maxY: 5 }
 */
export function outlineExtents(o: Outline): { minX: number; maxX: number; minY: number; maxY: number } {
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  const add = (p: Pt) => {
    minX = Math.min(minX, p.x);
    maxX = Math.max(maxX, p.x);
    minY = Math.min(minY, p.y);
    maxY = Math.max(maxY, p.y);
  };
  let last: Pt | null = null;
  for (const c of o) {
    if (c.op === "Z") continue;
    if (c.op === "C" && last) {
      const p0 = last;
      for (let i = 1; i < 64; i++) {
        const t = i / 64;
        const u = 1 - t;
        const b = (a: number, b1: number, b2: number, e: number) => u * u * u * a + 3 * u * u * t * b1 + 3 * u * t * t * b2 + t * t * t * e;
        add({ x: b(p0.x, c.c1.x, c.c2.x, c.to.x), y: b(p0.y, c.c1.y, c.c2.y, c.to.y) });
      }
    }
    add(c.to);
    last = c.to;
  }
  if (minX === Infinity) throw new FitmentInputError("outline", 'outline has no points (e.g. [{ op: "M", to: { x: 0, y: 0 } }])', o);
  return { minX, maxX, minY, maxY };
}
