import { describe, expect, it } from "vitest";
import { compareSetups } from "./compare";
import { crossSection, partPosition } from "./crossSection";
import { stockPart } from "./crossSectionTestUtil";
import { FitmentInputError } from "./errors";
import { setupGeometry } from "./geometry";
import { backspacingFromOffset } from "./offset";
import { nonFinite } from "./testUtil";
import { SCHEMATIC, outlineExtents, wheelSection } from "./wheelSection";

/*
 * The three setups, worked by hand. Sources: 1 in = 25.4 mm exactly (NIST SP 811); flotation
 * sizes D x W R d in inches, sidewall H = (D − d)/2 (TRA); metric D = d + 2H, H = W × AR/100
 * (ISO 4000-1 / ETRTO); section width on another rim S = S1 + 0.4 × (A − A1) (UN R30 §6.1.1.1)
 * from the measuring rim A1 (from memory of the ETRTO factor, see dimensions.ts); offset,
 * backspacing and flange allowance as offset.ts defines them (common practice, no source).
 *
 * A — 35x12.50R17 on 17x9, offset −12 mm, no spacer.
 *   D = 35 × 25.4 = 889 mm, R = 444.5; d = 17 × 25.4 = 431.8, r = 215.9; H = (889 − 431.8)/2 = 228.6.
 *   Measuring rim 0.8 × 12.5 = 10 in; on 9 in: S = 317.5 + 0.4 × (9 − 10) × 25.4 = 307.34 mm.
 *   W = 9 × 25.4 = 228.6, W/2 = 114.3. Centreline x = +12 (a negative offset puts the mounting
 *   face inboard of the centreline). Bead seats x = 12 ∓ 114.3 = −102.3 / +126.3; flange edges
 *   (0.5 in = 12.7 mm) −115.0 / +139.0. Backspacing to the bead seat 102.3 mm = 4.0276 in, to the
 *   flange 115.0 mm = 4.5276 in. Tire edges x = 12 ∓ 153.67 = −141.67 / +165.67. Bead seats at
 *   y = R − r = 228.6 (= H) and R + r = 660.4 above the ground; tire top y = 889.
 *
 * B — 285/75R16 on 16x8, offset 0, 38 mm spacer.
 *   H = 285 × 0.75 = 213.75, D = 406.4 + 427.5 = 833.9, R = 416.95, r = 203.2.
 *   Measuring rim 285/25.4 × 0.70 = 7.85 → 8 in, so on 8 in S = 285.
 *   Effective offset 0 − 38 = −38: centreline x = +38, the wheel's mounting face on the spacer at
 *   x = +38, spacer block x = 0 … 38. W/2 = 101.6: bead seats 38 ∓ 101.6 = −63.6 / +139.6; flange
 *   edges −76.3 / +152.3. The wheel's own backspacing (from its face at x = 38): to the flange
 *   38 + 76.3 = 114.3 mm = 4.5 in (= W/2 + 0 + 0.5 in). Tire edges 38 ∓ 142.5 = −104.5 / +180.5.
 *   Bead seats at y = 416.95 − 203.2 = 213.75 (= H) and 620.15; top 833.9.
 *
 * C — 33x12.50R15 on 15x10, offset −44 mm, no spacer.
 *   D = 33 × 25.4 = 838.2, R = 419.1; d = 381, r = 190.5; H = (838.2 − 381)/2 = 228.6.
 *   Measuring rim 10 in: S = 317.5 on the 10 in wheel. W/2 = 127, centreline x = +44: bead seats
 *   −83 / +171, flange edges −95.7 / +183.7; backspacing to the bead seat 83 mm = 3.2677 in, to
 *   the flange 95.7 mm = 3.7677 in. Tire edges 44 ∓ 158.75 = −114.75 / +202.75.
 *   Bead seats at y = 419.1 − 190.5 = 228.6 and 609.6; top 838.2.
 */
const A = setupGeometry({ tire: "35x12.50R17", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } });
const B = setupGeometry({ tire: "285/75R16", wheel: { diameterIn: 16, widthIn: 8, offsetMm: 0 }, spacerMm: 38 });
const C = setupGeometry({ tire: "33x12.50R15", wheel: { diameterIn: 15, widthIn: 10, offsetMm: -44 } });
/** 265/70R17 on 17x8 +25: D = 431.8 + 2 × 185.5 = 802.8 mm (ISO 4000-1), S = 265 on its 8 in measuring rim. */
const STOCK = setupGeometry({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } });

const HAND = [
  {
    name: "A 35x12.50R17 on 17x9 −12",
    g: A,
    centre: 12,
    face: 0,
    bead: [-102.3, 126.3],
    flange: [-115, 139],
    tire: [-141.67, 165.67],
    beadY: [228.6, 660.4],
    top: 889,
    sidewall: 228.6,
    bsFlangeIn: 4.5276,
    bsBeadIn: 4.0276,
    spacer: null,
  },
  {
    name: "B 285/75R16 on 16x8 +0 with a 38 mm spacer",
    g: B,
    centre: 38,
    face: 38,
    bead: [-63.6, 139.6],
    flange: [-76.3, 152.3],
    tire: [-104.5, 180.5],
    beadY: [213.75, 620.15],
    top: 833.9,
    sidewall: 213.75,
    bsFlangeIn: 4.5,
    bsBeadIn: 4.0,
    spacer: [0, 38],
  },
  {
    name: "C 33x12.50R15 on 15x10 −44",
    g: C,
    centre: 44,
    face: 0,
    bead: [-83, 171],
    flange: [-95.7, 183.7],
    tire: [-114.75, 202.75],
    beadY: [228.6, 609.6],
    top: 838.2,
    sidewall: 228.6,
    bsFlangeIn: 3.7677,
    bsBeadIn: 3.2677,
    spacer: null,
  },
] as const;

describe("wheelSection: positions against the hand-worked figures and the engine's", () => {
  for (const h of HAND) {
    describe(h.name, () => {
      const s = wheelSection(h.g);

      it("rim centreline, mounting face and the offset between them", () => {
        expect(s.centrelineX).toBeCloseTo(h.centre, 9);
        expect(s.centrelineX).toBeCloseTo(-h.g.effectiveOffsetMm, 9);
        expect(s.mountingFaceX).toBeCloseTo(h.face, 9);
        // Offset = mounting face − centreline (offset.ts convention).
        expect(s.mountingFaceX - s.centrelineX).toBeCloseTo(h.g.wheel.offsetMm, 9);
        expect(s.shapes.centreline).toEqual(
          [
            { x: s.centrelineX, y: 0 },
            { x: s.centrelineX, y: h.top },
          ].map((p) => ({ x: expect.closeTo(p.x, 9), y: expect.closeTo(p.y, 9) })),
        );
      });

      it("bead seats at the engine's distances, at the rim radius below and above the axle", () => {
        expect(s.beadSeat.inboardX).toBeCloseTo(h.bead[0], 9);
        expect(s.beadSeat.outboardX).toBeCloseTo(h.bead[1], 9);
        expect(s.beadSeat.inboardX).toBeCloseTo(-h.g.beadSeatInboardMm, 9);
        expect(s.beadSeat.outboardX).toBeCloseTo(h.g.beadSeatOutboardMm, 9);
        expect(s.beadSeat.outboardX - s.beadSeat.inboardX).toBeCloseTo(h.g.rimWidthMm, 9);
        expect(s.beadSeat.lowerY).toBeCloseTo(h.beadY[0], 9);
        expect(s.beadSeat.upperY).toBeCloseTo(h.beadY[1], 9);
      });

      it("flanges: outer edges one flange allowance beyond the bead seats, tips one flange height above them (schematic)", () => {
        expect(s.flange.inboardX).toBeCloseTo(h.flange[0], 9);
        expect(s.flange.outboardX).toBeCloseTo(h.flange[1], 9);
        const [low, up] = s.shapes.rim.map(outlineExtents);
        expect(low!.minX).toBeCloseTo(h.flange[0], 9);
        expect(low!.maxX).toBeCloseTo(h.flange[1], 9);
        expect(up!.minX).toBeCloseTo(h.flange[0], 9);
        expect(up!.maxX).toBeCloseTo(h.flange[1], 9);
        // The curl's peak is exactly at the flange height (sampled at t = ½, where it lies).
        expect(low!.minY).toBeCloseTo(h.beadY[0] - SCHEMATIC.flangeHeightMm, 9);
        expect(up!.maxY).toBeCloseTo(h.beadY[1] + SCHEMATIC.flangeHeightMm, 9);
      });

      it("backspacing from the flange edge (default) and from the bead seat, as offset.ts gives it", () => {
        expect(s.backspacing.valueIn).toBeCloseTo(h.bsFlangeIn, 4);
        expect(s.backspacing.valueIn).toBe(
          backspacingFromOffset({ widthIn: h.g.wheel.widthIn, offsetMm: h.g.wheel.offsetMm, measuredFrom: "flange" }),
        );
        expect(s.backspacing.toX - s.backspacing.fromX).toBeCloseTo(s.backspacing.valueMm, 9);
        expect(s.backspacing.fromX).toBeCloseTo(h.flange[0], 9);
        const bead = wheelSection(h.g, { reference: "bead-seat" });
        expect(bead.backspacing.valueIn).toBeCloseTo(h.bsBeadIn, 4);
        expect(bead.backspacing.fromX).toBeCloseTo(h.bead[0], 9);
        expect(bead.backspacing.toX - bead.backspacing.fromX).toBeCloseTo(bead.backspacing.valueMm, 9);
      });

      it("mounting pad on the wheel's face, spacer block between hub face and wheel", () => {
        expect(s.pad.x0).toBeCloseTo(h.face, 9);
        const pad = outlineExtents(s.shapes.pad[0]);
        expect(pad.minX).toBeCloseTo(h.face, 9);
        // The pad sits around the axle, below and above it.
        expect(pad.maxY).toBeLessThan(s.axleY);
        expect(outlineExtents(s.shapes.pad[1]).minY).toBeGreaterThan(s.axleY);
        if (h.spacer === null) {
          expect(s.spacer).toBeNull();
          expect(s.shapes.spacer).toEqual([]);
        } else {
          expect(s.spacer).toMatchObject({ x0: h.spacer[0], x1: h.spacer[1] });
          const block = outlineExtents(s.shapes.spacer[0]!);
          expect([block.minX, block.maxX]).toEqual([h.spacer[0], h.spacer[1]]);
          // The spacer fills exactly the gap between the hub face and the wheel's pad.
          expect(block.maxX).toBeCloseTo(pad.minX, 9);
        }
      });

      it("tire edges at the engine's reach, tread at the ground and at D, sidewall H from the bead seat", () => {
        expect(s.tire.innerX).toBeCloseTo(h.tire[0], 9);
        expect(s.tire.outerX).toBeCloseTo(h.tire[1], 9);
        expect(s.tire.outerX - s.tire.innerX).toBeCloseTo(h.g.sectionWidthMm, 9);
        const [low, up] = s.shapes.tire.map(outlineExtents);
        for (const e of [low!, up!]) {
          expect(e.minX).toBeCloseTo(-h.g.innerSwingMm, 9);
          expect(e.maxX).toBeCloseTo(h.g.outerSwingMm, 9);
        }
        expect(low!.minY).toBeCloseTo(0, 9);
        expect(low!.maxY).toBeCloseTo(h.beadY[0], 9);
        expect(up!.minY).toBeCloseTo(h.beadY[1], 9);
        expect(up!.maxY).toBeCloseTo(h.top, 9);
        expect(s.sidewallMm).toBeCloseTo(h.sidewall, 9);
        expect(s.beadSeat.lowerY - s.groundY).toBeCloseTo(h.sidewall, 9);
        expect(s.topY - s.beadSeat.upperY).toBeCloseTo(h.sidewall, 9);
        // The casing's inside (schematic thickness) stays inside the tire, open at the rim.
        const [cl, cu] = s.shapes.cavity.map(outlineExtents);
        expect(cl!.minX).toBeCloseTo(h.tire[0] + SCHEMATIC.sidewallThicknessMm, 9);
        expect(cl!.maxX).toBeCloseTo(h.tire[1] - SCHEMATIC.sidewallThicknessMm, 9);
        expect(cl!.minY).toBeCloseTo(SCHEMATIC.treadThicknessMm, 9);
        expect(cu!.maxY).toBeCloseTo(h.top - SCHEMATIC.treadThicknessMm, 9);
        // Widest at mid-sidewall (schematic share, from memory).
        expect(s.tire.widestLowerY).toBeCloseTo(h.sidewall * (1 - SCHEMATIC.widestAtShare), 9);
      });

      it("every number is finite", () => {
        expect(nonFinite(s)).toEqual([]);
      });
    });
  }

  it("a flange allowance typed for the wheel moves the flange edge and the backspacing with it", () => {
    // B with 0.75 in measured to the flange: 4 + 0.75 = 4.75 in, edge at 38 − 101.6 − 19.05 = −82.65.
    const s = wheelSection(B, { reference: "flange", flangeIn: 0.75 });
    expect(s.backspacing.valueIn).toBeCloseTo(4.75, 9);
    expect(s.flange.inboardX).toBeCloseTo(-82.65, 9);
    expect(outlineExtents(s.shapes.rim[0]).minX).toBeCloseTo(-82.65, 9);
  });

  it("refuses a flange allowance outside 0–2 in, naming the field", () => {
    expect(() => wheelSection(A, { flangeIn: 3 })).toThrow(FitmentInputError);
    expect(() => wheelSection(A, { flangeIn: 3 })).toThrow(/flangeIn/);
  });
});

describe("crossSection: two setups on one axle", () => {
  it("current 265/70R17 +25 and planned A: axles shared, planned ground 43.1 mm lower (ΔD/2 = (889 − 802.8)/2)", () => {
    const m = crossSection({ geometry: STOCK }, { geometry: A });
    expect(m.current.axleY).toBeCloseTo(401.4, 9);
    expect(m.planned.axleY).toBeCloseTo(401.4, 9);
    expect(m.current.groundY).toBe(0);
    expect(m.planned.groundY).toBeCloseTo(-43.1, 9);
    expect(m.planned.topY).toBeCloseTo(401.4 + 444.5, 9);
    expect(m.groundChangeMm).toBeCloseTo(compareSetups(STOCK, A).groundClearanceChangeMm, 9);
    // Moving onto the axle changes heights only: lateral positions stay the engine's.
    expect(m.planned.tire.innerX).toBeCloseTo(-141.67, 9);
    expect(outlineExtents(m.planned.shapes.tire[0]).minY).toBeCloseTo(-43.1, 9);
    expect(outlineExtents(m.planned.shapes.tire[1]).maxY).toBeCloseTo(845.9, 9);
    expect(nonFinite(m)).toEqual([]);
  });

  it("every dimension line is as long as the figure it is labelled with", () => {
    for (const [cur, pla] of [
      [STOCK, A],
      [A, B],
      [B, C],
      [C, A],
    ] as const) {
      const m = crossSection({ geometry: cur }, { geometry: pla, reference: "bead-seat" });
      for (const d of m.dimensions) expect(Math.abs(d.to - d.from), d.id).toBeCloseTo(Math.abs(d.valueMm), 9);
    }
  });

  it("A then B: reach, backspacing, offset, spacer and diameter dimensions carry the hand-worked figures", () => {
    const m = crossSection({ geometry: A }, { geometry: B, reference: "flange", flangeIn: 0.5 });
    const v = (id: string) => m.dimensions.find((d) => d.id === id)?.valueMm;
    expect(v("current-reach-inboard")).toBeCloseTo(141.67, 9);
    expect(v("current-reach-outboard")).toBeCloseTo(165.67, 9);
    expect(v("planned-reach-inboard")).toBeCloseTo(104.5, 9);
    expect(v("planned-reach-outboard")).toBeCloseTo(180.5, 9);
    expect(v("current-backspacing")).toBeCloseTo(115.0, 9);
    expect(v("planned-backspacing")).toBeCloseTo(114.3, 9);
    expect(v("planned-flange-allowance")).toBeCloseTo(12.7, 9);
    expect(v("current-offset")).toBe(-12);
    expect(v("planned-offset")).toBe(0);
    expect(v("planned-spacer")).toBe(38);
    expect(v("current-spacer")).toBeUndefined();
    expect(v("current-diameter")).toBe(889);
    expect(v("planned-diameter")).toBeCloseTo(833.9, 9);
    // B is shorter: (833.9 − 889)/2 = −27.55, its ground above A's.
    expect(v("ground-change")).toBeCloseTo(-27.55, 9);
    expect(m.planned.groundY).toBeCloseTo(27.55, 9);
  });

  it("steering axis, 8° entered: through the current contact centre at the ground, steeringAxisInboardMm inboard at the axle", () => {
    // 265/70R17 +25: d = 25 + 401.4 × tan 8° = 25 + 56.41 = 81.41 mm (clearance.ts; Milliken ch. 19, from memory).
    const m = crossSection({ geometry: STOCK }, { geometry: A }, { kingpinInclinationDeg: 8 });
    const a = m.steeringAxis!;
    expect(a.ground).toEqual({ x: -25, y: 0 });
    expect(a.atAxle.x).toBeCloseTo(-(25 + 401.4 * Math.tan((8 * Math.PI) / 180)), 9);
    expect(a.atAxle.x).toBeCloseTo(-81.41, 2);
    // A straight line: the top and bottom ends lie on it, leaning inboard going up.
    const lean = (a.atAxle.x - a.ground.x) / a.atAxle.y;
    expect(a.top.x).toBeCloseTo(a.ground.x + lean * a.top.y, 9);
    expect(a.bottom.x).toBeCloseTo(a.ground.x + lean * a.bottom.y, 9);
    expect(a.top.x).toBeLessThan(a.ground.x);
    expect(crossSection({ geometry: STOCK }, { geometry: A }).steeringAxis).toBeNull();
    // 0° entered is drawn (vertical), not left out.
    expect(crossSection({ geometry: STOCK }, { geometry: A }, { kingpinInclinationDeg: 0 }).steeringAxis?.top.x).toBe(-25);
  });

  it("vehicle limits and measured parts sit where the measurements put them", () => {
    const m = crossSection(
      { geometry: STOCK },
      { geometry: A },
      {
        innerLimitMm: 174.8,
        fenderLipMm: 160,
        fenderLineMm: 139.7,
        parts: [
          // Inner swing 157.5 + 30 = 187.5 inboard, at hub height.
          stockPart("Control arm", "inboard", "ride-height", 30, 45.8, "clear"),
          // Outer swing 107.5 + 20 = 127.5 outboard.
          stockPart("Flare", "outboard", "ride-height", 20, -38.2, "contact"),
          // Above the tread centre (x = −25): 401.4 (axle) + 401.4 (radius) + 40 = 842.8.
          stockPart("Liner", "upward", "full-stuff", 40, -3.1, "contact"),
          stockPart("Bumper", "fore-aft", "ride-height", 50, 6.9, "tight"),
          stockPart("Frame at lock", "inboard", "full-lock", 25, 10, "tight"),
        ],
      },
    );
    expect(m.limits).toEqual([
      { id: "inner-limit", x: -174.8 },
      { id: "fender-lip", x: 160 },
      { id: "fender-line", x: 139.7 },
    ]);
    expect(m.parts.map((p) => p.at)).toEqual([
      { x: -187.5, y: 401.4 },
      { x: 127.5, y: 401.4 },
      { x: -25, y: expect.closeTo(842.8, 9) },
      null,
      null,
    ]);
    expect(m.parts.map((p) => p.notDrawn)).toEqual([null, null, null, "fore-aft", "full-lock"]);
    expect(m.anchors.filter((a) => a.kind === "part").map((a) => a.id)).toEqual(["part-0", "part-1", "part-2"]);
    // The drawing holds every placed part and limit.
    expect(m.extents.minX).toBeLessThan(-187.5);
    expect(m.extents.maxY).toBeGreaterThan(842.8);
  });

  it("refuses a part without a known direction, naming the field", () => {
    const bad = { direction: "sideways", state: "ride-height", distanceMm: 30, measuredWith: STOCK } as unknown as Parameters<
      typeof partPosition
    >[0];
    expect(() => partPosition(bad, 400, "parts[2]")).toThrow(/parts\[2\]\.direction/);
    expect(() => partPosition({ direction: "inboard", state: "ride-height", distanceMm: -1, measuredWith: STOCK }, 400)).toThrow(
      FitmentInputError,
    );
  });
});
