import type { ReactElement } from "react";
import { ImageResponse } from "next/og";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import { computeComparison } from "@/lib/comparisons/compute";
import { DEFAULT_PREFS, formatLen, formatLenOther, formatNumber, formatSpeedIn } from "@/lib/comparisons/format";
import { readingPhrase } from "@/lib/comparisons/speedometer";
import { CrossSectionSvg } from "@/lib/comparisons/crossSection/CrossSectionSvg";
import { buildDrawing } from "@/lib/comparisons/crossSection/drawing";
import { svgMarkup } from "@/lib/comparisons/crossSection/markup";
import { type CoveredFont, fontsFor } from "./_og/fonts";
import { drawableText } from "./_og/text";
import { getSharedComparison } from "./data";

/**
 * The Open Graph image of a shared comparison: the share page's cross-section of both setups
 * at the hub face (to scale, lower half, without its words) and the headline numbers.
 *
 * Fonts: the image is drawn only with fonts shipped with the app (_og/fonts.ts): Latin,
 * Latin Extended, Vietnamese, Cyrillic, Greek, Hebrew and Arabic always; Noto Emoji and the
 * Noto Sans SC/JP slices a name needs, read from their packages. The name is made drawable
 * with exactly those fonts (_og/text.ts) because the renderer otherwise fetches missing
 * glyphs from the network: an emoji made the whole image fail, CJK drew as boxes, and the
 * request would send the unlisted comparison's name to a third party. If drawing still fails,
 * the image is drawn again with a plain title rather than answering with an empty body.
 */
export const alt = "Cross-section of the current and planned wheel and tire, with the headline changes";
export const size = { width: 1200, height: 630 };
export const contentType = "image/png";

const STEEL = "#245a88";
const EMBER = "#bd460f";
const INK = "#181b21";
const PAPER = "#fbf8f3";

/** Used when a name cannot be drawn (mostly characters no shipped font has). */
const PLAIN_TITLE = "Shared comparison";

/**
 * The workspace's drawing (CrossSectionSvg), below the axle only and without words: the image's
 * renderer draws SVG text with no font of ours, and the card beside it carries the figures. It is
 * handed over as an SVG image, which the renderer draws whole (paths, dashes, translucent fills).
 */
function Drawing({ r, width, height }: { r: ComparisonResult; width: number; height: number }) {
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
  return <img alt="" width={width} height={height} src={`data:image/svg+xml;base64,${Buffer.from(svg).toString("base64")}`} />;
}

function Stat({ label, value, sub }: { label: string; value: string; sub: string }) {
  return (
    <div style={{ display: "flex", flexDirection: "column", width: 250, marginBottom: 18 }}>
      <div style={{ fontSize: 20, fontWeight: 600, color: "#56616f", textTransform: "uppercase", letterSpacing: 1 }}>{label}</div>
      <div style={{ fontFamily: "Archivo", fontSize: 46, fontWeight: 700, color: INK }}>{value}</div>
      <div style={{ fontSize: 20, color: "#434c58" }}>{sub}</div>
    </div>
  );
}

function Card({ r, title }: { r: ComparisonResult; title: string }) {
  const p = DEFAULT_PREFS;
  const len = (mm: number) => formatLen(mm, p, { signed: true, decimals: 2 });
  const speed = r.speedometer.bySystem[p.units];
  const h = speed.headline;
  return (
    <div
      style={{
        width: "100%",
        height: "100%",
        display: "flex",
        flexDirection: "column",
        background: PAPER,
        padding: "40px 56px",
        fontFamily: "Inter",
        color: INK,
      }}
    >
      <div style={{ display: "flex", justifyContent: "space-between", alignItems: "baseline" }}>
        <div style={{ fontFamily: "Archivo", fontSize: 30, fontWeight: 700, color: EMBER }}>Hubface</div>
        <div style={{ fontSize: 22, color: "#56616f" }}>shared comparison</div>
      </div>
      {/* A fixed line height: CJK and Arabic fonts have taller metrics and would push the figures down. */}
      <div
        style={{
          fontFamily: "Archivo",
          fontSize: 50,
          fontWeight: 700,
          lineHeight: 1.25,
          marginTop: 6,
          lineClamp: 1,
          overflow: "hidden",
          whiteSpace: "nowrap",
          textOverflow: "ellipsis",
        }}
      >
        {title}
      </div>
      <div style={{ display: "flex", fontSize: 26, marginTop: 4 }}>
        <span style={{ color: STEEL, fontWeight: 600 }}>{r.current.tireText}</span>
        <span style={{ margin: "0 14px", color: "#56616f" }}>to</span>
        <span style={{ color: EMBER, fontWeight: 600 }}>{r.planned.tireText}</span>
      </div>
      <div style={{ display: "flex", flex: 1, marginTop: 24 }}>
        <div style={{ display: "flex", flexDirection: "column", width: 560, height: 400, background: "#ffffff", borderRadius: 16 }}>
          <Drawing r={r} width={560} height={356} />
          <div style={{ display: "flex", fontSize: 18, color: "#434c58", padding: "0 20px", justifyContent: "space-between" }}>
            <span style={{ color: STEEL }}>solid: current</span>
            <span>to scale, from the hub face</span>
            <span style={{ color: EMBER }}>dashed: planned</span>
          </div>
        </div>
        <div style={{ display: "flex", flexWrap: "wrap", marginLeft: 44, width: 520, alignContent: "flex-start" }}>
          <Stat label="Diameter" value={len(r.changes.diameterMm)} sub={formatLenOther(r.changes.diameterMm, p, { signed: true })} />
          <Stat label="Poke" value={len(r.changes.outerPokeMm)} sub={formatLenOther(r.changes.outerPokeMm, p, { signed: true })} />
          <Stat label="Ground clearance" value={len(r.changes.groundClearanceMm)} sub="under the axle" />
          <Stat
            label={`At ${formatSpeedIn(h.indicated, speed.unit, 0)} shown`}
            value={formatSpeedIn(h.actual, speed.unit)}
            sub={`speedometer ${readingPhrase(r.speedometer.ratio)}`}
          />
          <Stat
            label="Suggested ratio"
            value={formatNumber(r.gearing.suggestedRatio, 2)}
            sub={`from ${formatNumber(r.gearing.axleRatio, 2)}`}
          />
          <Stat
            label="Scrub radius"
            value={len(r.changes.scrubRadiusMm)}
            sub={r.kingpinInclinationDeg === null ? "wheel shift only" : `${formatNumber(r.kingpinInclinationDeg, 1)}° KPI`}
          />
        </div>
      </div>
    </div>
  );
}

async function png(element: ReactElement, fonts: CoveredFont[]): Promise<Buffer> {
  const res = new ImageResponse(element, { ...size, fonts: fonts.map((f) => f.font) });
  return Buffer.from(await res.arrayBuffer());
}

export default async function OpengraphImage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const share = await getSharedComparison(slug);
  if (!share) return new Response("Not found", { status: 404, headers: { "Cache-Control": "no-store" } });
  const r = computeComparison(share.input);
  const fonts = await fontsFor(share.name);
  const name = drawableText(share.name, fonts, "Archivo", 700);
  // Mostly question marks says less than a plain title; the page itself shows the real name.
  const title = name.text && name.replaced * 2 <= name.graphemes ? name.text : PLAIN_TITLE;
  let body: Buffer;
  try {
    body = await png(<Card r={r} title={title} />, fonts);
  } catch (error) {
    console.error(`share ${slug.slice(0, 4)}…: Open Graph image failed with its name, drawn with the plain title:`, error);
    body = await png(<Card r={r} title={PLAIN_TITLE} />, fonts);
  }
  return new Response(new Uint8Array(body), {
    headers: { "Content-Type": contentType, "Cache-Control": "public, max-age=60, s-maxage=60" },
  });
}
