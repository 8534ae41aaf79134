import type { CoveredFont } from "./fonts";

/** What the image draws in place of a character none of its fonts has. */
export const REPLACEMENT = "?";

const INVISIBLE = /^[\p{M}\p{Cf}\p{Cc}\u{fe00}-\u{fe0f}\u{e0100}-\u{e01ef}]+$/u;
/** Skin tones: the monochrome emoji font draws them as separate swatches beside the emoji. */
const SKIN_TONE = /[\u{1f3fb}-\u{1f3ff}]/gu;
/** Controls and format characters (bidi overrides, zero-width spaces) draw nothing; the emoji joiner stays. */
const CONTROLS = /(?!\u200d)[\p{Cc}\p{Cf}]/gu;
const ARABIC = /[\u0600-\u06ff\u0750-\u077f\u08a0-\u08ff\ufb50-\ufdff\ufe70-\ufeff]/u;

/**
 * The fonts in the order the renderer tries them for text set in `family` at `weight`: the
 * family's own font first, then one font of every other family in the order they were given
 * (the renderer keeps one font per family, the weight nearest the one asked for).
 */
export function fallbackOrder(fonts: CoveredFont[], family: string, weight: number): CoveredFont[] {
  const families: string[] = [];
  for (const f of fonts) if (!families.includes(f.font.name)) families.push(f.font.name);
  const pick = (name: string) => {
    const list = fonts.filter((f) => f.font.name === name);
    const exact = list.find((f) => f.font.weight === weight);
    if (exact) return exact;
    const heavier = list.filter((f) => f.font.weight > weight).sort((a, b) => a.font.weight - b.font.weight);
    const lighter = list.filter((f) => f.font.weight < weight).sort((a, b) => b.font.weight - a.font.weight);
    // CSS font matching: above 500 look heavier first, otherwise lighter first.
    return (weight >= 500 ? [...heavier, ...lighter] : [...lighter, ...heavier])[0];
  };
  return [family, ...families.filter((n) => n !== family)]
    .filter((n) => families.includes(n))
    .map(pick)
    .filter((f): f is CoveredFont => f !== undefined);
}

/**
 * Whether the renderer draws this grapheme from the given fonts: it takes the first font that
 * has the grapheme's first code point, and that one font must have all of them.
 */
function drawable(grapheme: string, ordered: CoveredFont[]): boolean {
  const cps = [...grapheme].map((c) => c.codePointAt(0)!);
  const font = ordered.find((f) => f.codePoints.has(cps[0] ?? -1));
  return !!font && cps.every((cp) => font.codePoints.has(cp));
}

/**
 * Satori lays every run out left to right. Within an Arabic word it shapes the letters and
 * puts them right to left itself, but consecutive Arabic words stay in typing order; this
 * reverses the words of each Arabic run so the run reads right to left. (Hebrew comes out in
 * reading order already.) Mixed runs with digits inside are left as typed.
 */
export function orderArabicRuns(text: string): string {
  const tokens = text.split(/(\s+)/);
  const arabic = (k: number) => k < tokens.length && ARABIC.test(tokens[k] ?? "");
  const out: string[] = [];
  for (let i = 0; i < tokens.length;) {
    if (!arabic(i)) {
      out.push(tokens[i++] ?? "");
      continue;
    }
    // A run: Arabic word (space Arabic word)*
    let j = i;
    while (arabic(j + 2)) j += 2;
    out.push(...tokens.slice(i, j + 1).reverse());
    i = j + 1;
  }
  return out.join("");
}

/**
 * A person's text made safe to draw with exactly these fonts: each character is drawn, or
 * shortened to its base character (an emoji whose skin tone or joined sequence no font has),
 * or dropped when invisible, or shown as "?" (skin tones are dropped: the monochrome emoji
 * font would draw them as swatches) — so the renderer never goes to the network for
 * a font or an emoji picture, which would fail the whole image (emoji) or draw boxes.
 *
 * @example
 * drawableText("Łódź 🚙", fonts, "Archivo", 700); // { text: "Łódź 🚙", replaced: 0, graphemes: 6 }
 */
export function drawableText(
  text: string,
  fonts: CoveredFont[],
  family: string,
  weight: number,
): { text: string; replaced: number; graphemes: number } {
  const ordered = fallbackOrder(fonts, family, weight);
  let replaced = 0;
  let graphemes = 0;
  let out = "";
  for (const { segment } of new Intl.Segmenter(undefined, { granularity: "grapheme" }).segment(
    text.normalize("NFC").replace(SKIN_TONE, "").replace(CONTROLS, ""),
  )) {
    if (/^\s+$/u.test(segment)) {
      out += " ";
      continue;
    }
    graphemes++;
    if (drawable(segment, ordered)) out += segment;
    else if (INVISIBLE.test(segment)) graphemes--;
    else {
      const base = String.fromCodePoint(segment.codePointAt(0)!);
      if (drawable(base, ordered)) out += base;
      else {
        out += REPLACEMENT;
        replaced++;
      }
    }
  }
  return { text: orderArabicRuns(out.replace(/ {2,}/g, " ").trim()), replaced, graphemes };
}
