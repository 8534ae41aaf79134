import type { ReactElement } from "react";
import { ImageResponse } from "next/og";
import { computeComparison } from "@/lib/comparisons/compute";
import { type CoveredFont, fontsFor } from "./_og/fonts";
import { OgCard } from "./_og/OgCard";
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

/** Used when a name cannot be drawn (mostly characters no shipped font has). */
const PLAIN_TITLE = "Shared comparison";

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
    body = await png(<OgCard r={r} title={title} />, fonts);
  } catch (error) {
    console.error(`share ${slug.slice(0, 4)}…: Open Graph image failed with its name, drawn with the plain title:`, error);
    body = await png(<OgCard r={r} title={PLAIN_TITLE} />, fonts);
  }
  return new Response(new Uint8Array(body), {
    headers: { "Content-Type": contentType, "Cache-Control": "public, max-age=60, s-maxage=60" },
  });
}
