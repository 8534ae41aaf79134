import type { ComparisonResult, SetupFigures } from "@/lib/comparisons/compute";
import { type DisplayPrefs, formatLen } from "@/lib/comparisons/format";
import { inToMm } from "@/lib/fitment";

/**
 * Cross-section of both tires and wheels, overlaid to scale (1 unit = 1 mm), seen from the front
 * of the vehicle: the lower half of each wheel, from the axle line down to the ground, with the
 * hub mounting face as the vertical reference (inboard to the left). Current in steel with solid
 * lines, planned in ember with dashed lines. All distances come from the computed result; the
 * tire profile curve and the flange height are schematic. With a kingpin inclination entered,
 * the steering axis is drawn through the current tire's contact centre (its true position on the
 * vehicle is not known here, so only its change matters).
 */
const STEEL = "#245a88";
const EMBER = "#bd460f";
const FLANGE_HEIGHT_MM = 17.5; // schematic
const DASH = "9 6";

interface Shape {
  f: SetupFigures;
  colour: string;
  dash?: string;
  fill: string;
}

function tirePath(f: SetupFigures): string {
  const R = f.overallDiameterMm / 2;
  const rim = inToMm(f.wheelDiameterIn) / 2;
  const h = R - rim;
  const xc = -f.effectiveOffsetMm;
  const xi = -f.innerSwingMm;
  const xo = f.outerSwingMm;
  const bi = -f.beadSeatInboardMm;
  const bo = f.beadSeatOutboardMm;
  const tw = f.sectionWidthMm * 0.82;
  const ti = xc - tw / 2;
  const to = xc + tw / 2;
  const mid = rim + 0.45 * h;
  const p = (x: number, y: number) => `${x.toFixed(1)} ${y.toFixed(1)}`;
  return [
    `M ${p(bi, rim)}`,
    `C ${p(xi, rim + 0.08 * h)} ${p(xi, rim + 0.25 * h)} ${p(xi, mid)}`,
    `C ${p(xi, rim + 0.85 * h)} ${p(ti - (xo - xi - tw) * 0.15, R)} ${p(ti, R)}`,
    `L ${p(to, R)}`,
    `C ${p(to + (xo - xi - tw) * 0.15, R)} ${p(xo, rim + 0.85 * h)} ${p(xo, mid)}`,
    `C ${p(xo, rim + 0.25 * h)} ${p(xo, rim + 0.08 * h)} ${p(bo, rim)}`,
    "Z",
  ].join(" ");
}

function Wheel({ s }: { s: Shape }) {
  const f = s.f;
  const rim = inToMm(f.wheelDiameterIn) / 2;
  const bi = -f.beadSeatInboardMm;
  const bo = f.beadSeatOutboardMm;
  const flange = inToMm(f.flangeAllowanceIn);
  const face = f.spacerMm; // the wheel's own mounting face sits on the spacer
  const hub = rim * 0.32;
  return (
    <g stroke={s.colour} strokeDasharray={s.dash} fill="none" strokeWidth={2.5}>
      <path d={tirePath(f)} fill={s.fill} />
      {/* rim barrel between the bead seats, flanges beyond them */}
      <path d={`M ${bi - flange} ${rim + FLANGE_HEIGHT_MM} Q ${bi - flange} ${rim} ${bi} ${rim} L ${bo} ${rim} Q ${bo + flange} ${rim} ${bo + flange} ${rim + FLANGE_HEIGHT_MM}`} strokeWidth={3} />
      {/* wheel disc from the hub to the barrel */}
      <path d={`M ${face} ${hub} L ${face} ${rim * 0.75} L ${-f.effectiveOffsetMm} ${rim}`} strokeWidth={3} />
      {f.spacerMm > 0 && <rect x={0} y={8} width={f.spacerMm} height={hub - 8} fill={s.fill} strokeWidth={1.5} />}
    </g>
  );
}

function Dimension({ x1, x2, y, label, colour, dash, fontSize }: { x1: number; x2: number; y: number; label: string; colour: string; dash?: string; fontSize: number }) {
  const mid = (x1 + x2) / 2;
  return (
    <g stroke={colour} fill={colour}>
      <line x1={x1} x2={x2} y1={y} y2={y} strokeWidth={1.5} strokeDasharray={dash} />
      <line x1={x1} x2={x1} y1={y - 7} y2={y + 7} strokeWidth={1.5} />
      <line x1={x2} x2={x2} y1={y - 7} y2={y + 7} strokeWidth={1.5} />
      <text x={mid} y={y - 6} textAnchor="middle" fontSize={fontSize} stroke="none" className="tabular-nums">
        {label}
      </text>
    </g>
  );
}

/** Measured parts of a vehicle, mm from the hub face: the nearest inboard part and the fender lip. */
export interface DrawnLimits {
  innerMm: number | null;
  outerMm: number | null;
}

export function CrossSection({
  result: r,
  prefs,
  className,
  id = "xsec",
  limits,
}: {
  result: ComparisonResult;
  prefs: DisplayPrefs;
  className?: string;
  id?: string;
  limits?: DrawnLimits | null;
}) {
  const cur: Shape = { f: r.current, colour: STEEL, fill: "rgb(47 114 168 / 0.14)" };
  const pla: Shape = { f: r.planned, colour: EMBER, dash: DASH, fill: "rgb(226 91 22 / 0.10)" };
  const Rc = r.current.overallDiameterMm / 2;
  const Rp = r.planned.overallDiameterMm / 2;
  const innerLimit = limits?.innerMm ?? null;
  const outerLimit = limits?.outerMm ?? null;
  const maxIn = Math.max(r.current.innerSwingMm, r.planned.innerSwingMm, r.current.beadSeatInboardMm + 40, r.planned.beadSeatInboardMm + 40, (innerLimit ?? 0) + 20);
  const maxOut = Math.max(r.current.outerSwingMm, r.planned.outerSwingMm, r.current.beadSeatOutboardMm + 40, r.planned.beadSeatOutboardMm + 40, r.fenderLineMm ?? 0, (outerLimit ?? 0) + 20);
  const width = maxIn + maxOut + 120;
  const fontSize = Math.max(15, width / 30);
  const top = -(fontSize * 2 + 8) * 2 - fontSize * 1.5;
  const bottom = Math.max(Rc, Rp) + fontSize * 2.6;
  const x0 = -maxIn - 60;
  const len = (mm: number) => formatLen(mm, prefs, { decimals: prefs.units === "metric" ? 0 : 1 });
  const rowC = top + fontSize * 2.6;
  const rowP = rowC + fontSize * 2.2;
  const kpi = r.kingpinInclinationDeg;
  const groundGap = Rp - Rc;

  // Steering axis through the current contact centre, inclined with its top inboard.
  let axis: { x1: number; y1: number; x2: number; y2: number } | null = null;
  if (kpi !== null && kpi > 0) {
    const t = Math.tan((kpi * Math.PI) / 180);
    const xg = -r.current.effectiveOffsetMm;
    const yTop = top + fontSize * 0.5;
    // Rounded: server and browser may differ in the last bit of tan (hydration must match).
    const r1 = (v: number) => Math.round(v * 10) / 10;
    axis = { x1: r1(xg - (Rc - yTop) * t), y1: r1(yTop), x2: r1(xg + (bottom - Rc) * t), y2: r1(bottom) };
  }
  const summary = `Current ${r.current.tireText} reaches ${len(r.current.innerSwingMm)} inboard and ${len(r.current.outerSwingMm)} outboard of the hub face; planned ${r.planned.tireText} reaches ${len(r.planned.innerSwingMm)} inboard and ${len(r.planned.outerSwingMm)} outboard, and stands ${len(Math.abs(groundGap))} ${groundGap >= 0 ? "lower" : "higher"} at the ground.`;

  return (
    <figure className={className}>
      <svg
        viewBox={`${x0.toFixed(1)} ${top.toFixed(1)} ${width.toFixed(1)} ${(bottom - top).toFixed(1)}`}
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        className="h-auto w-full"
        data-testid="cross-section"
        fontFamily="var(--font-body), system-ui, sans-serif"
      >
        <title id={`${id}-title`}>Cross-section of both setups, to scale, from the hub mounting face</title>
        <desc id={`${id}-desc`}>{summary}</desc>
        {/* legend */}
        <g fontSize={fontSize}>
          <line x1={x0 + 10} x2={x0 + 60} y1={top + fontSize} y2={top + fontSize} stroke={STEEL} strokeWidth={3} />
          <text x={x0 + 68} y={top + fontSize * 1.35} fill={STEEL}>Current</text>
          <line x1={x0 + 10 + width / 2} x2={x0 + 60 + width / 2} y1={top + fontSize} y2={top + fontSize} stroke={EMBER} strokeWidth={3} strokeDasharray={DASH} />
          <text x={x0 + 68 + width / 2} y={top + fontSize * 1.35} fill={EMBER}>Planned</text>
        </g>
        {/* swing distances */}
        <Dimension x1={-r.current.innerSwingMm} x2={0} y={rowC} label={`in ${len(r.current.innerSwingMm)}`} colour={STEEL} fontSize={fontSize} />
        <Dimension x1={0} x2={r.current.outerSwingMm} y={rowC} label={`out ${len(r.current.outerSwingMm)}`} colour={STEEL} fontSize={fontSize} />
        <Dimension x1={-r.planned.innerSwingMm} x2={0} y={rowP} label={`in ${len(r.planned.innerSwingMm)}`} colour={EMBER} dash={DASH} fontSize={fontSize} />
        <Dimension x1={0} x2={r.planned.outerSwingMm} y={rowP} label={`out ${len(r.planned.outerSwingMm)}`} colour={EMBER} dash={DASH} fontSize={fontSize} />
        {/* axle line and hub face */}
        <line x1={x0} x2={x0 + width} y1={0} y2={0} stroke="#a3acb8" strokeWidth={1} strokeDasharray="2 6" />
        <text x={x0 + 8} y={-6} fontSize={fontSize * 0.8} fill="#56616f">axle</text>
        <Wheel s={cur} />
        <Wheel s={pla} />
        <line x1={0} x2={0} y1={rowP + 10} y2={bottom - fontSize * 1.4} stroke="#181b21" strokeWidth={2} />
        <text x={6} y={bottom - fontSize * 1.6} fontSize={fontSize * 0.85} fill="#181b21">hub face</text>
        {/* ground lines */}
        <line x1={x0} x2={x0 + width} y1={Rc} y2={Rc} stroke={STEEL} strokeWidth={2} />
        <line x1={x0} x2={x0 + width} y1={Rp} y2={Rp} stroke={EMBER} strokeWidth={2} strokeDasharray={DASH} />
        <text x={x0 + 8} y={Math.max(Rc, Rp) + fontSize * 1.3} fontSize={fontSize * 0.85} fill="#353c46">
          ground {groundGap >= 0 ? "+" : "−"}
          {len(Math.abs(groundGap))} under the axle
        </text>
        {r.fenderLineMm !== null && (
          <g>
            <line x1={r.fenderLineMm} x2={r.fenderLineMm} y1={0} y2={Math.max(Rc, Rp)} stroke="#7d1710" strokeWidth={1.5} strokeDasharray="3 4" />
            <text x={r.fenderLineMm - 4} y={fontSize * 1.2} textAnchor="end" fontSize={fontSize * 0.8} fill="#7d1710">fender</text>
          </g>
        )}
        {innerLimit !== null && (
          <g data-testid="inner-limit">
            <line x1={-innerLimit} x2={-innerLimit} y1={0} y2={Math.max(Rc, Rp)} stroke="#7d1710" strokeWidth={2} strokeDasharray="6 3" />
            <text x={-innerLimit + 4} y={fontSize * 2.4} fontSize={fontSize * 0.8} fill="#7d1710">inner limit</text>
          </g>
        )}
        {outerLimit !== null && (
          <g data-testid="fender-lip">
            <line x1={outerLimit} x2={outerLimit} y1={0} y2={Math.max(Rc, Rp)} stroke="#7d1710" strokeWidth={2} strokeDasharray="6 3" />
            <text x={outerLimit - 4} y={fontSize * 2.4} textAnchor="end" fontSize={fontSize * 0.8} fill="#7d1710">fender lip</text>
          </g>
        )}
        {axis && (
          <g>
            <line {...axis} stroke="#353c46" strokeWidth={1.5} strokeDasharray="14 4 3 4" />
            <text x={axis.x2 + 6} y={bottom - fontSize * 0.3} fontSize={fontSize * 0.8} fill="#353c46">steering axis {kpi}°</text>
          </g>
        )}
      </svg>
      <figcaption className="mt-1 text-xs text-basalt-500">
        To scale from the hub face (inboard left). Solid steel: current · dashed ember: planned. Tire profile and flange height are schematic
        {kpi ? "; the steering axis is drawn through the current contact centre" : ""}
        {limits ? "; dark red dashes: the vehicle's measured inner limit and fender lip" : ""}.
      </figcaption>
    </figure>
  );
}
