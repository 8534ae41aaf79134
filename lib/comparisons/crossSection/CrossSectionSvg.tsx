import type { CSSProperties } from "react";
import { CalloutMark } from "./CalloutMark";
import { DatumLines } from "./DatumLines";
import { DimensionMark } from "./DimensionMark";
import type { Drawing } from "./drawing";
import { LegendMark } from "./LegendMark";
import { LimitLine } from "./LimitLine";
import { PartMark } from "./PartMark";
import { SetupShape } from "./SetupShape";
import { SteeringAxisMark } from "./SteeringAxisMark";
import { INK, LIMIT, SIDE_STYLE } from "./style";
import { r2, sy } from "./svg";

/**
 * The drawing itself, as one <svg>: datum lines, both setups, the vehicle's limits and parts,
 * the steering axis, and (with `labels`) the dimension lines, callouts and legend. A plain
 * function of a built {@link Drawing}, with no hook and no browser API, so the same element is
 * rendered by React in the page and by `svgMarkup` (./markup.ts) for the quote PDF and the
 * share image: one drawing, whatever the medium.
 *
 * `labels: false` leaves out every word and dimension (the share image: its renderer draws no
 * SVG text, and the card beside it carries the figures).
 */
export function CrossSectionSvg({
  drawing,
  id,
  labels = true,
  fontFamily = "var(--font-body), system-ui, sans-serif",
  className,
  style,
  width,
  height,
  frame,
}: {
  drawing: Drawing;
  id: string;
  labels?: boolean;
  fontFamily?: string;
  className?: string;
  style?: CSSProperties;
  width?: number;
  height?: number;
  /** The part of the drawing shown, in the engine's frame (mm, y up); the whole laid-out drawing when left out. */
  frame?: { x: number; y: number; w: number; h: number };
}) {
  const { model, layout, description } = drawing;
  const { mmPerPx, fontMm } = layout;
  const v = frame ?? layout.viewBox;
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
  return (
    <svg
      xmlns="http://www.w3.org/2000/svg"
      viewBox={`${r2(v.x)} ${sy(v.y + v.h)} ${r2(v.w)} ${r2(v.h)}`}
      width={width}
      height={height}
      role="img"
      aria-labelledby={`${id}-title ${id}-desc`}
      className={className}
      style={style}
      data-testid="cross-section"
      fontFamily={fontFamily}
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
      {labels && layout.dimensions.map((d) => <DimensionMark key={d.id} d={d} style={sideOf(d.id)} mmPerPx={mmPerPx} fontMm={fontMm} />)}
      {labels &&
        layout.callouts.map((c) => (
          <CalloutMark key={c.id} c={c} fill={calloutFill(c.id)} mmPerPx={mmPerPx} fontMm={fontMm} bold={c.id.startsWith("tire-")} />
        ))}
      {labels &&
        layout.legend.map((item) => (
          <LegendMark
            key={item.id}
            item={item}
            style={item.id === "legend-current" ? SIDE_STYLE.current : SIDE_STYLE.planned}
            mmPerPx={mmPerPx}
            fontMm={fontMm}
          />
        ))}
    </svg>
  );
}
