/**
 * The cross-section drawing's geometry for a comparison: the current and the planned setup
 * (wheelSection.ts) overlaid on one axle, with the dimension lines, the points labels point at,
 * and what of the vehicle is known. Pure numbers; the picture (SVG, PDF, image) is drawn
 * elsewhere, and the labels are placed by crossSectionLayout.ts.
 *
 * ## Frame
 * x from the hub mounting face, outboard positive; y up. The setups share the axle, because a
 * tire swap moves neither the axle nor anything bolted to the body relative to the axle
 * (clearance.ts, the model): the current setup's ground is y = 0, the planned one's
 * y = R_current − R_planned (below it for a taller tire), so the gap between the grounds is the
 * ground-clearance change ΔD/2 (compare.ts `compareSetups`).
 *
 * ## Figures (engine functions)
 * - every figure of each setup as wheelSection.ts documents it;
 * - ground-clearance change: compare.ts `compareSetups` `groundClearanceChangeMm`;
 * - steering axis: clearance.ts `steeringAxisInboardMm` (zero scrub: through the current tire's
 *   contact centre at the ground, leaning inboard by the kingpin inclination);
 * - measured parts: clearance.ts `clearanceEnvelope` of the setup each was measured with, placed
 *   at hub height beside the tire or above the tread (the garage records no height).
 */
import { type SetupComparison, compareSetups } from "./compare";
import {
  CLEARANCE_DIRECTIONS,
  CLEARANCE_DISTANCE_LIMITS_MM,
  SUSPENSION_STATES,
  type ClearanceDirection,
  type ClearanceStatus,
  type SuspensionState,
  clearanceEnvelope,
  steeringAxisInboardMm,
} from "./clearanceGeometry";
import type { DimensionLine } from "./crossSectionLayout";
import { FitmentInputError, requireNumber } from "./errors";
import type { SetupGeometry, SetupInput } from "./geometry";
import type { BackspacingReference } from "./offset";
import { type BackspacingChoice, type Pt, type WheelSection, movedSection, wheelSection } from "./wheelSection";

const zero = (v: number) => (v === 0 ? 0 : v);

export type Side = "current" | "planned";

/** What a dimension line measures. */
export type DimensionKind =
  "reach-inboard" | "reach-outboard" | "backspacing" | "flange-allowance" | "offset" | "spacer" | "diameter" | "ground-change";

/**
 * A dimension line: along x (a lateral distance, drawn in a row above or below the drawing) or
 * along y (a height, drawn in a column right of it). `from`/`to` are the measured ends on that
 * axis; `ends` are the features the extension lines start from; `valueMm` is the engine's figure
 * (signed for the offset and the ground change), equal to |to − from| (tested).
 */
export interface Dimension extends DimensionLine {
  kind: DimensionKind;
  setup: Side | null;
  valueMm: number;
  /** For backspacing: where it is measured to. */
  reference?: BackspacingReference;
  /** Which engine function gives the figure. */
  source: string;
}

/** A feature a text label points at (leader line to a row above the drawing). */
export interface Anchor {
  id: string;
  kind: "tire" | "hub-face" | "axle" | "inner-limit" | "fender-lip" | "fender-line" | "part" | "steering-axis";
  setup: Side | null;
  at: Pt;
}

/** A measured part of a vehicle, as the garage keeps it, with its prediction for the planned setup. */
export interface PartInput {
  label: string;
  direction: ClearanceDirection;
  state: SuspensionState;
  distanceMm: number;
  measuredWith: SetupInput | SetupGeometry;
  predictedMm: number;
  status: ClearanceStatus;
}

/** A part placed in the drawing, or left out (with why) where this section cannot show it. */
export interface PlacedPart extends PartInput {
  id: string;
  at: Pt | null;
  /** Why the part is not drawn, when `at` is null. */
  notDrawn: "fore-aft" | "full-lock" | null;
}

/** What of the vehicle to draw (all optional). */
export interface VehicleOverlay {
  /** Kingpin inclination, degrees, when entered (0–30); null or left out: no steering axis. */
  kingpinInclinationDeg?: number | null;
  /** The fender line the user entered, mm outboard of the hub face. */
  fenderLineMm?: number | null;
  /** Nearest inboard part (clearance.ts `clearanceLimits`, margin 0), mm inboard of the hub face. */
  innerLimitMm?: number | null;
  /** Nearest outboard part, the fender lip, mm outboard of the hub face. */
  fenderLipMm?: number | null;
  parts?: readonly PartInput[];
}

/** Both setups overlaid on one axle, with what to dimension and to label. */
export interface CrossSectionModel {
  current: WheelSection;
  planned: WheelSection;
  /** Planned minus current ground clearance (ΔD/2, compare.ts); positive = the vehicle sits higher. */
  groundChangeMm: number;
  axleY: number;
  dimensions: Dimension[];
  anchors: Anchor[];
  /** Vertical limit lines (x), from the lowest ground to the top of the drawing. */
  limits: { id: "inner-limit" | "fender-lip" | "fender-line"; x: number }[];
  parts: PlacedPart[];
  /** The steering axis from the ground to the top, through the current contact centre; its x at the axle height is the engine's. */
  steeringAxis: { deg: number; ground: Pt; atAxle: Pt; bottom: Pt; top: Pt } | null;
  /** Everything drawn (not the labels), mm. */
  extents: { minX: number; maxX: number; minY: number; maxY: number };
}

/** Room kept around the drawing, mm (layout choice). */
const MARGIN_MM = 25;
/** Accepted limit and fender-line positions, mm either side of the hub face. */
const LATERAL_LIMIT_MM = 1000;

/**
 * Where a measured part sits in the section (the axle frame of {@link crossSection}), from the
 * setup it was measured with: inboard and outboard parts at hub height (the garage records no
 * height), upward parts above the measured tread's centre. Fore/aft and full-lock parts lie
 * outside this plane (ahead of or behind the tire, or beside a turned tire) and are not placed.
 *
 * @example
 * partPosition({ direction: "inboard", state: "ride-height", distanceMm: 30, measuredWith: { tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } } }, 401.4);
 * // { at: { x: -187.5, y: 401.4 }, notDrawn: null }  (inner swing 157.5 + 30)
 */
export function partPosition(
  p: Pick<PartInput, "direction" | "state" | "distanceMm" | "measuredWith">,
  axleY: number,
  field = "part",
): { at: Pt | null; notDrawn: PlacedPart["notDrawn"] } {
  if (p === null || typeof p !== "object")
    throw new FitmentInputError(
      field,
      `${field} must be an object like { direction: "inboard", state: "ride-height", distanceMm: 30, measuredWith: {…} }`,
      p,
    );
  if (!CLEARANCE_DIRECTIONS.includes(p.direction))
    throw new FitmentInputError(
      `${field}.direction`,
      `${field}.direction must be one of ${CLEARANCE_DIRECTIONS.join(", ")} (e.g. "inboard")`,
      p.direction,
    );
  if (!SUSPENSION_STATES.includes(p.state))
    throw new FitmentInputError(
      `${field}.state`,
      `${field}.state must be one of ${SUSPENSION_STATES.join(", ")} (e.g. "ride-height")`,
      p.state,
    );
  const gap = requireNumber(
    `${field}.distanceMm`,
    p.distanceMm,
    CLEARANCE_DISTANCE_LIMITS_MM.min,
    CLEARANCE_DISTANCE_LIMITS_MM.max,
    "30",
    "mm",
  );
  const axle = requireNumber("axleY", axleY, 0, 2000, "401.4", "mm");
  if (p.state === "full-lock") return { at: null, notDrawn: "full-lock" };
  if (p.direction === "fore-aft") return { at: null, notDrawn: "fore-aft" };
  const e = clearanceEnvelope(p.measuredWith);
  if (p.direction === "inboard") return { at: { x: -(e.innerSwingMm + gap), y: axle }, notDrawn: null };
  if (p.direction === "outboard") return { at: { x: e.outerSwingMm + gap, y: axle }, notDrawn: null };
  // The tread's centre: half-way between the reaches (= the rim centreline).
  return { at: { x: zero((e.outerSwingMm - e.innerSwingMm) / 2), y: axle + e.radiusMm + gap }, notDrawn: null };
}

/** A height drawn in the column right of the drawing, its extension lines level from x to the line. */
function heightLine(x: number, from: number, to: number): Pick<Dimension, "axis" | "band" | "from" | "to" | "ends"> {
  return {
    axis: "y",
    band: "right",
    from,
    to,
    ends: [
      { x, y: from },
      { x, y: to },
    ],
  };
}

/**
 * Both setups on one axle with every dimension line, label anchor and vehicle part.
 * `comparison` may be passed when already computed (compareSetups of the same two geometries).
 *
 * @example
 * const m = crossSection(
 *   { geometry: setupGeometry({ tire: "265/70R17", wheel: { diameterIn: 17, widthIn: 8, offsetMm: 25 } }) },
 *   { geometry: setupGeometry({ tire: "35x12.50R17LT", wheel: { diameterIn: 17, widthIn: 9, offsetMm: -12 } }) },
 * );
 * m.planned.groundY; // -43.1  (401.4 − 444.5: the taller tire's ground is below the current one)
 * m.groundChangeMm;  // 43.1
 */
export function crossSection(
  current: { geometry: SetupGeometry } & BackspacingChoice,
  planned: { geometry: SetupGeometry } & BackspacingChoice,
  vehicle: VehicleOverlay = {},
  comparison?: SetupComparison,
): CrossSectionModel {
  const c = comparison ?? compareSetups(current.geometry, planned.geometry);
  const cur = wheelSection(current.geometry, current);
  const pla = movedSection(wheelSection(planned.geometry, planned), cur.axleY - planned.geometry.overallRadiusMm);
  const axleY = cur.axleY;
  const dims: Dimension[] = [];
  for (const [side, s] of [
    ["current", cur],
    ["planned", pla],
  ] as const) {
    const hubTop: Pt = { x: 0, y: axleY + s.pad.outerRadiusMm };
    dims.push(
      {
        id: `${side}-reach-inboard`,
        kind: "reach-inboard",
        setup: side,
        axis: "x",
        band: "above",
        from: s.tire.innerX,
        to: 0,
        ends: [{ x: s.tire.innerX, y: s.tire.widestUpperY }, hubTop],
        valueMm: -s.tire.innerX,
        source: "geometry.ts setupGeometry: innerSwingMm",
      },
      {
        id: `${side}-reach-outboard`,
        kind: "reach-outboard",
        setup: side,
        axis: "x",
        band: "above",
        from: 0,
        to: s.tire.outerX,
        ends: [hubTop, { x: s.tire.outerX, y: s.tire.widestUpperY }],
        valueMm: s.tire.outerX,
        source: "geometry.ts setupGeometry: outerSwingMm",
      },
    );
    const flangeTip = s.beadSeat.lowerY - s.flange.heightMm;
    const padLow: Pt = { x: s.mountingFaceX, y: axleY - s.pad.outerRadiusMm };
    dims.push({
      id: `${side}-backspacing`,
      kind: "backspacing",
      setup: side,
      axis: "x",
      band: "below",
      from: s.backspacing.fromX,
      to: s.backspacing.toX,
      ends: [{ x: s.backspacing.fromX, y: s.backspacing.reference === "flange" ? flangeTip : s.beadSeat.lowerY }, padLow],
      valueMm: s.backspacing.valueMm,
      reference: s.backspacing.reference,
      source: "offset.ts backspacingFromOffset",
    });
    if (s.backspacing.reference === "flange" && s.flange.allowanceMm > 0) {
      dims.push({
        id: `${side}-flange-allowance`,
        kind: "flange-allowance",
        setup: side,
        axis: "x",
        band: "below",
        from: s.flange.inboardX,
        to: s.beadSeat.inboardX,
        ends: [
          { x: s.flange.inboardX, y: flangeTip },
          { x: s.beadSeat.inboardX, y: s.beadSeat.lowerY },
        ],
        valueMm: s.flange.allowanceMm,
        source: "offset.ts: backspacing to the flange = to the bead seat + allowance",
      });
    }
    dims.push({
      id: `${side}-offset`,
      kind: "offset",
      setup: side,
      axis: "x",
      band: "below",
      from: s.centrelineX,
      to: s.mountingFaceX,
      ends: [{ x: s.centrelineX, y: s.groundY }, padLow],
      valueMm: s.offsetMm,
      source: "geometry.ts setupGeometry: wheel.offsetMm (centreline to mounting face)",
    });
    if (s.spacer) {
      dims.push({
        id: `${side}-spacer`,
        kind: "spacer",
        setup: side,
        axis: "x",
        band: "below",
        from: 0,
        to: s.spacer.x1,
        ends: [
          { x: 0, y: axleY - s.spacer.outerRadiusMm },
          { x: s.spacer.x1, y: axleY - s.spacer.outerRadiusMm },
        ],
        valueMm: s.spacerMm,
        source: "geometry.ts setupGeometry: spacerMm",
      });
    }
    const treadEnd = s.centrelineX + s.tire.treadHalfWidthMm;
    dims.push({
      id: `${side}-diameter`,
      kind: "diameter",
      setup: side,
      ...heightLine(treadEnd, s.groundY, s.topY),
      valueMm: s.overallDiameterMm,
      source: "geometry.ts setupGeometry: overallDiameterMm (ISO 4000-1 D = d + 2H)",
    });
  }
  const groundChange = c.groundClearanceChangeMm;
  if (groundChange !== 0) {
    const xr = Math.max(cur.tire.outerX, pla.tire.outerX);
    dims.push({
      id: "ground-change",
      kind: "ground-change",
      setup: null,
      ...heightLine(xr, pla.groundY, cur.groundY),
      valueMm: groundChange,
      source: "compare.ts compareSetups: groundClearanceChangeMm (ΔD/2)",
    });
  }

  if (vehicle.parts !== undefined && (!Array.isArray(vehicle.parts) || vehicle.parts.length > 500)) {
    throw new FitmentInputError("parts", "parts must be a list of at most 500 measured parts", vehicle.parts);
  }
  const parts: PlacedPart[] = (vehicle.parts ?? []).map((p, i) => ({ ...p, id: `part-${i}`, ...partPosition(p, axleY, `parts[${i}]`) }));
  const limits: CrossSectionModel["limits"] = [];
  const lateral = (field: string, v: number) => requireNumber(field, v, -LATERAL_LIMIT_MM, LATERAL_LIMIT_MM, "140", "mm");
  if (vehicle.innerLimitMm != null) limits.push({ id: "inner-limit", x: -lateral("innerLimitMm", vehicle.innerLimitMm) });
  if (vehicle.fenderLipMm != null) limits.push({ id: "fender-lip", x: lateral("fenderLipMm", vehicle.fenderLipMm) });
  if (vehicle.fenderLineMm != null) limits.push({ id: "fender-line", x: lateral("fenderLineMm", vehicle.fenderLineMm) });

  const xs = [
    cur.tire.innerX,
    pla.tire.innerX,
    cur.flange.inboardX,
    pla.flange.inboardX,
    cur.tire.outerX,
    pla.tire.outerX,
    cur.flange.outboardX,
    pla.flange.outboardX,
    ...limits.map((l) => l.x),
  ];
  const ys = [cur.groundY, pla.groundY, cur.topY, pla.topY];
  for (const p of parts) {
    if (p.at) {
      xs.push(p.at.x);
      ys.push(p.at.y);
    }
  }
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys) + MARGIN_MM;
  let steeringAxis: CrossSectionModel["steeringAxis"] = null;
  const kpi = vehicle.kingpinInclinationDeg;
  if (kpi != null) {
    const d = steeringAxisInboardMm(current.geometry, { kingpinInclinationDeg: kpi });
    // Through the contact centre at the current ground (zero scrub), d inboard at the axle: x(y) = x0 + lean·y.
    const x0 = cur.centrelineX;
    const lean = (-d - x0) / axleY;
    steeringAxis = {
      deg: kpi,
      ground: { x: x0, y: 0 },
      atAxle: { x: zero(-d), y: axleY },
      bottom: { x: x0 + lean * minY, y: minY },
      top: { x: x0 + lean * maxY, y: maxY },
    };
    xs.push(steeringAxis.bottom.x, steeringAxis.top.x);
  }
  const extents = { minX: Math.min(...xs) - MARGIN_MM, maxX: Math.max(...xs) + MARGIN_MM, minY, maxY };

  const anchors: Anchor[] = [
    { id: "tire-current", kind: "tire", setup: "current", at: { x: cur.centrelineX - cur.tire.treadHalfWidthMm / 2, y: cur.topY } },
    { id: "tire-planned", kind: "tire", setup: "planned", at: { x: pla.centrelineX + pla.tire.treadHalfWidthMm / 2, y: pla.topY } },
    { id: "hub-face", kind: "hub-face", setup: null, at: { x: 0, y: axleY + Math.max(cur.pad.outerRadiusMm, pla.pad.outerRadiusMm) + 15 } },
    { id: "axle", kind: "axle", setup: null, at: { x: extents.minX + 4, y: axleY } },
    ...limits.map((l): Anchor => ({ id: l.id, kind: l.id, setup: null, at: { x: l.x, y: maxY } })),
    ...parts.flatMap((p): Anchor[] => (p.at ? [{ id: p.id, kind: "part", setup: null, at: p.at }] : [])),
    ...(steeringAxis ? [{ id: "steering-axis", kind: "steering-axis", setup: null, at: steeringAxis.top } satisfies Anchor] : []),
  ];
  return {
    current: cur,
    planned: pla,
    groundChangeMm: groundChange,
    axleY,
    dimensions: dims,
    anchors,
    limits,
    parts,
    steeringAxis,
    extents,
  };
}
