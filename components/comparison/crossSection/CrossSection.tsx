import { useMemo } from "react";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { CrossSectionSvg } from "@/lib/comparisons/crossSection/CrossSectionSvg";
import { type DrawnLimits, DESIGN_WIDTH_PX, buildDrawing } from "@/lib/comparisons/crossSection/drawing";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { CrossSectionTable } from "./CrossSectionTable";

export type { DrawnLimits } from "@/lib/comparisons/crossSection/drawing";

/**
 * Both setups in section at the hub, to scale, as an engineer would draw them: each wheel's
 * barrel, flanges, bead seats, disc and mounting pad (and spacer), each tire's section from the
 * ground to its top, the axle, the hub face and both grounds, the dimension lines (reach either
 * side of the hub face, backspacing from its reference with the flange allowance, offset,
 * spacer, diameters and the ground-clearance change) and, with a garage vehicle picked, its
 * limits and measured parts with their predicted status; the steering axis when a kingpin
 * inclination is entered. Geometry: lib/fitment/crossSection.ts; labels placed so none overlap
 * at a phone's width: lib/fitment/crossSectionLayout.ts; the <svg> itself: lib/comparisons/crossSection/
 * CrossSectionSvg.tsx, which the share image and the quote PDF render as well.
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
  const drawing = useMemo(() => buildDrawing(r, prefs, limits), [r, prefs, limits]);
  const { model, named } = drawing;
  const notDrawn = model.parts.filter((p) => !p.at).length;
  const unnamed = model.parts.filter((p) => p.at && !named.has(p.id)).length;
  return (
    <figure className={className}>
      <CrossSectionSvg
        drawing={drawing}
        id={id}
        className="mx-auto block h-auto w-full"
        style={{ maxWidth: `${Math.round(DESIGN_WIDTH_PX * 1.4)}px` }}
      />
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
