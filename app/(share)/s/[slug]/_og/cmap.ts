import { inflateSync } from "node:zlib";

/**
 * The code points a font really draws, read from its `cmap` table. The Open Graph renderer
 * asks the network for a font (or an emoji picture) for every character none of its fonts
 * has, and that request fails or leaks the text; knowing the exact coverage lets the image
 * draw only what the shipped fonts hold. The unicode ranges a font package declares are not
 * enough: they are ranges, and a font may lack some code points inside them.
 *
 * Reads WOFF 1 (zlib-compressed tables) and plain TrueType/OpenType; cmap subtables of
 * format 4 (BMP) and 12 (full range) from the Unicode platform (0) or Windows (3, 1/10).
 * Sources: OpenType specification, "cmap — Character to Glyph Index Mapping Table";
 * W3C WOFF File Format 1.0, §4–5 (header and table directory).
 *
 * @example
 * codePointsOf(readFileSync("app/fonts/og/archivo-latin-700-normal.woff")).has(0x41); // true ("A")
 */
export function codePointsOf(font: Buffer): Set<number> {
  const cmap = tableOf(font, "cmap");
  if (!cmap) throw new Error("font has no cmap table");
  const out = new Set<number>();
  const count = cmap.readUInt16BE(2);
  let best: { offset: number; format: number } | null = null;
  for (let i = 0; i < count; i++) {
    const rec = 4 + i * 8;
    const platform = cmap.readUInt16BE(rec);
    const encoding = cmap.readUInt16BE(rec + 2);
    const offset = cmap.readUInt32BE(rec + 4);
    const unicode = platform === 0 || (platform === 3 && (encoding === 1 || encoding === 10));
    if (!unicode) continue;
    const format = cmap.readUInt16BE(offset);
    // Format 12 covers every plane, so it wins over format 4 (BMP only) when a font has both.
    if (format === 12 && best?.format !== 12) best = { offset, format };
    else if (format === 4 && !best) best = { offset, format };
  }
  if (!best) return out;
  if (best.format === 12) readFormat12(cmap, best.offset, out);
  else readFormat4(cmap, best.offset, out);
  return out;
}

function tableOf(font: Buffer, tag: string): Buffer | null {
  const woff = font.toString("latin1", 0, 4) === "wOFF";
  const numTables = font.readUInt16BE(woff ? 12 : 4);
  for (let i = 0; i < numTables; i++) {
    const at = woff ? 44 + i * 20 : 12 + i * 16;
    if (font.toString("latin1", at, at + 4) !== tag) continue;
    if (!woff) return font.subarray(font.readUInt32BE(at + 8), font.readUInt32BE(at + 8) + font.readUInt32BE(at + 12));
    const offset = font.readUInt32BE(at + 4);
    const compLength = font.readUInt32BE(at + 8);
    const origLength = font.readUInt32BE(at + 12);
    const data = font.subarray(offset, offset + compLength);
    return compLength < origLength ? inflateSync(data) : data;
  }
  return null;
}

function readFormat4(t: Buffer, at: number, out: Set<number>) {
  const segCount = t.readUInt16BE(at + 6) / 2;
  const ends = at + 14;
  const starts = ends + segCount * 2 + 2;
  const deltas = starts + segCount * 2;
  const rangeOffsets = deltas + segCount * 2;
  for (let s = 0; s < segCount; s++) {
    const end = t.readUInt16BE(ends + s * 2);
    const start = t.readUInt16BE(starts + s * 2);
    const delta = t.readUInt16BE(deltas + s * 2);
    const ro = t.readUInt16BE(rangeOffsets + s * 2);
    for (let c = start; c <= end && c !== 0xffff; c++) {
      let glyph: number;
      if (ro === 0) glyph = (c + delta) & 0xffff;
      else {
        const g = t.readUInt16BE(rangeOffsets + s * 2 + ro + (c - start) * 2);
        glyph = g === 0 ? 0 : (g + delta) & 0xffff;
      }
      if (glyph !== 0) out.add(c);
    }
  }
}

function readFormat12(t: Buffer, at: number, out: Set<number>) {
  const groups = t.readUInt32BE(at + 12);
  for (let g = 0; g < groups; g++) {
    const rec = at + 16 + g * 12;
    const start = t.readUInt32BE(rec);
    const end = t.readUInt32BE(rec + 4);
    const firstGlyph = t.readUInt32BE(rec + 8);
    for (let c = start; c <= end; c++) if (firstGlyph + (c - start) !== 0) out.add(c);
  }
}
