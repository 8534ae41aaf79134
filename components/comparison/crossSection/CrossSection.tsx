import { useMemo } from "react";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { CalloutMark } from "./CalloutMark";
import { CrossSectionTable } from "./CrossSectionTable";
import { DatumLines } from "./DatumLines";
import { DimensionMark } from "./DimensionMark";
import { type DrawnLimits, DESIGN_WIDTH_PX, buildDrawing } from "./drawing";
import { LegendMark } from "./LegendMark";
import { LimitLine } from "./LimitLine";
import { PartMark } from "./PartMark";
import { SetupShape } from "./SetupShape";
import { SteeringAxisMark } from "./SteeringAxisMark";
import { INK, LIMIT, SIDE_STYLE } from "./style";
import { r2, sy } from "./svg";

export type { DrawnLimits } from "./drawing";

/**
 * Both setups in section at the hub, to scale, as an engineer would draw them: each wheel's
 * barrel, flanges, bead seats, disc and mounting pad (and spacer), each tire's section from the
 * ground to its top, the axle, the hub face and both grounds, the dimension lines (reach either
 * side of the hub face, backspacing from its reference with the flange allowance, offset,
 * spacer, diameters and the ground-clearance change) and, with a garage vehicle picked, its
 * limits and measured parts with their predicted status; the steering axis when a kingpin
 * inclination is entered. Geometry: lib/fitment/crossSection.ts; labels placed so none overlap
 * at a phone's width: lib/fitment/crossSectionLayout.ts. No hooks beyond a memo and no browser
 * API: it renders on the server as well (share page, share image, quote PDF).
 */
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
  const { model, named, layout, description } = useMemo(() => buildDrawing(r, prefs, limits), [r, prefs, limits]);
  const { viewBox: v, mmPerPx, fontMm } = layout;
  const sideOf = (dimId: string) =>
    dimId.startsWith("current-") ? SIDE_STYLE.current : dimId.startsWith("planned-") ? SIDE_STYLE.planned : null;
  const calloutFill = (cid: string) =>
    cid === "tire-current"
      ? SIDE_STYLE.current.stroke
      : cid === "tire-planned"
        ? SIDE_STYLE.planned.stroke
        : cid.startsWith("part-") || cid === "inner-limit" || cid === "fender-lip" || cid === "fender-line"
          ? LIMIT
          : INK;
  const notDrawn = model.parts.filter((p) => !p.at).length;
  const unnamed = model.parts.filter((p) => p.at && !named.has(p.id)).length;
  return (
    <figure className={className}>
      <svg
        viewBox={`${r2(v.x)} ${sy(v.y + v.h)} ${r2(v.w)} ${r2(v.h)}`}
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        className="mx-auto block h-auto w-full"
        style={{ maxWidth: `${Math.round(DESIGN_WIDTH_PX * 1.4)}px` }}
        data-testid="cross-section"
        fontFamily="var(--font-body), system-ui, sans-serif"
      >
        <title id={`${id}-title`}>Cross-section of both setups at the hub, to scale</title>
        <desc id={`${id}-desc`}>{description}</desc>
        <DatumLines model={model} mmPerPx={mmPerPx} />
        <SetupShape side="current" s={model.current} style={SIDE_STYLE.current} mmPerPx={mmPerPx} />
        <SetupShape side="planned" s={model.planned} style={SIDE_STYLE.planned} mmPerPx={mmPerPx} />
        {model.limits.map((l) => (
          <LimitLine key={l.id} limit={l} model={model} mmPerPx={mmPerPx} />
        ))}
        {model.steeringAxis && <SteeringAxisMark axis={model.steeringAxis} mmPerPx={mmPerPx} />}
        {model.parts.map((p) => (
          <PartMark key={p.id} p={p} mmPerPx={mmPerPx} />
        ))}
        {layout.dimensions.map((d) => (
          <DimensionMark key={d.id} d={d} style={sideOf(d.id)} mmPerPx={mmPerPx} fontMm={fontMm} />
        ))}
        {layout.callouts.map((c) => (
          <CalloutMark key={c.id} c={c} fill={calloutFill(c.id)} mmPerPx={mmPerPx} fontMm={fontMm} bold={c.id.startsWith("tire-")} />
        ))}
        {layout.legend.map((item) => (
          <LegendMark
            key={item.id}
            item={item}
            style={item.id === "legend-current" ? SIDE_STYLE.current : SIDE_STYLE.planned}
            mmPerPx={mmPerPx}
            fontMm={fontMm}
          />
        ))}
      </svg>
      <figcaption className="mt-1 text-xs text-basalt-600">
        To scale, seen from the front, inboard to the left. Current: solid lines, upright figures; planned: dashed lines, italic figures.
        Flange, bead seat, well, pad and sidewall shapes are schematic; every position and dimension is computed from the two setups&apos;
        figures.
        {model.steeringAxis ? " The steering axis is drawn through the current tire's contact centre (zero scrub assumed)." : ""}
        {model.parts.length > 0
          ? " Measured parts are drawn at hub height (the garage keeps no height): a cross marks predicted contact, a triangle closer than the margin, a circle clear."
          : ""}
        {unnamed > 0
          ? ` The ${named.size} points nearest to contact are named; the other ${unnamed} are marked only (all are in the table of predictions).`
          : ""}
        {notDrawn > 0
          ? ` ${notDrawn === 1 ? "One point lies" : `${notDrawn} points lie`} outside this section (fore/aft or at full lock): see the table of predictions.`
          : ""}
      </figcaption>
      <CrossSectionTable id={id} r={r} model={model} prefs={prefs} />
    </figure>
  );
}
