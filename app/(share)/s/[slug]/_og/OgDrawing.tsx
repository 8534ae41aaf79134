import type { ComparisonResult } from "@/lib/comparisons/compute";
import { DEFAULT_PREFS } from "@/lib/comparisons/format";
import { CrossSectionSvg } from "@/lib/comparisons/crossSection/CrossSectionSvg";
import { buildDrawing } from "@/lib/comparisons/crossSection/drawing";
import { svgMarkup } from "@/lib/comparisons/crossSection/markup";

/**
 * The workspace's drawing (CrossSectionSvg), below the axle only and without words: the image's
 * renderer draws SVG text with no font of ours, and the card beside it carries the figures. It is
 * handed over as an SVG image, which the renderer draws whole (paths, dashes, translucent fills).
 */
export function OgDrawing({ r, width, height }: { r: ComparisonResult; width: number; height: number }) {
  const drawing = buildDrawing(r, DEFAULT_PREFS);
  const { model } = drawing;
  const e = model.extents;
  // From below the lower ground to a little above the axle: the lower half of both setups,
  // widened or heightened to the panel's proportions (the renderer stretches an image to its box).
  const bottom = e.minY - 10;
  const h0 = model.axleY + 40 - bottom;
  const w0 = e.maxX - e.minX;
  const aspect = width / height;
  const w = Math.max(w0, h0 * aspect);
  const h = w / aspect;
  const frame = { x: e.minX - (w - w0) / 2, y: bottom, w, h };
  const svg = svgMarkup(<CrossSectionSvg drawing={drawing} id="og" labels={false} width={width} height={height} frame={frame} />);
  // Drawn by the Open Graph renderer (next/og), which takes a plain <img>; next/image has no place there (the rule skips opengraph-image files only).
  // eslint-disable-next-line @next/next/no-img-element
  return <img alt="" width={width} height={height} src={`data:image/svg+xml;base64,${Buffer.from(svg).toString("base64")}`} />;
}
