import { readFile } from "node:fs/promises";
import { join } from "node:path";
import { codePointsOf } from "./cmap";

/** A font as the Open Graph renderer takes it. */
export interface OgFont {
  name: string;
  data: Buffer;
  weight: 400 | 600 | 700;
  style: "normal";
}

/** A font and the code points it draws. */
export interface CoveredFont {
  font: OgFont;
  codePoints: Set<number>;
}

/**
 * Fonts the image always carries, in the order the renderer falls back through them. They are
 * WOFF files copied from the @fontsource packages into app/fonts/og (the renderer reads
 * WOFF/TTF/OTF, not WOFF2), about 250 kB in all. Each subset has a family name of its own:
 * the renderer keeps one font per family and weight, so a second "Archivo" 700 would be
 * ignored. Scripts that need only the name's few characters are bold (the name is the only
 * text a person types, and it is drawn bold).
 */
const ALWAYS: readonly [file: string, name: string, weight: OgFont["weight"]][] = [
  ["inter-latin-400-normal.woff", "Inter", 400],
  ["inter-latin-600-normal.woff", "Inter", 600],
  ["archivo-latin-700-normal.woff", "Archivo", 700],
  ["archivo-latin-ext-700-normal.woff", "Archivo Latin Ext", 700],
  ["archivo-vietnamese-700-normal.woff", "Archivo Vietnamese", 700],
  ["inter-cyrillic-700-normal.woff", "Inter Cyrillic", 700],
  ["inter-cyrillic-ext-700-normal.woff", "Inter Cyrillic Ext", 700],
  ["inter-greek-700-normal.woff", "Inter Greek", 700],
  ["noto-sans-hebrew-hebrew-700-normal.woff", "Noto Sans Hebrew", 700],
  ["vazirmatn-arabic-700-normal.woff", "Vazirmatn", 700],
];

/**
 * Large families stay in their npm packages (dependencies) and are read one slice at a time,
 * only for the characters a name needs: Noto Sans SC and JP are about 100 slices of 20–80 kB
 * each (some 5 MB per weight), Noto Emoji one 560 kB file. The repository carries none of it.
 */
const PACKAGES = join(process.cwd(), "node_modules/@fontsource");
const EMOJI_FILE = join(PACKAGES, "noto-emoji/files/noto-emoji-emoji-700-normal.woff");
const CJK = {
  sc: { pkg: "noto-sans-sc", name: "Noto Sans SC" },
  jp: { pkg: "noto-sans-jp", name: "Noto Sans JP" },
} as const;
type CjkKey = keyof typeof CJK;

const KANA = /[\u3040-\u30ff\u31f0-\u31ff\uff66-\uff9f]/u;
const PICTOGRAPHIC = /\p{Extended_Pictographic}|\p{Regional_Indicator}/u;

/** Buffers are kept once loaded: the renderer caches each parsed font by its buffer. */
const files = new Map<string, Promise<CoveredFont | null>>();

function load(path: string, name: string, weight: OgFont["weight"]): Promise<CoveredFont | null> {
  let p = files.get(path);
  if (!p) {
    p = readFile(path)
      .then((data) => ({ font: { name, data, weight, style: "normal" as const }, codePoints: codePointsOf(data) }))
      .catch((error: unknown) => {
        // A missing package file (e.g. a deployment without node_modules) costs only coverage:
        // the characters it would have drawn get the readable replacement instead.
        console.error(`Open Graph font ${path} could not be read:`, (error as Error).message);
        files.delete(path);
        return null;
      });
    files.set(path, p);
  }
  return p;
}

let always: Promise<CoveredFont[]> | undefined;
function alwaysFonts(): Promise<CoveredFont[]> {
  const dir = join(process.cwd(), "app/fonts/og");
  return (always ??= Promise.all(ALWAYS.map(([file, name, weight]) => load(join(dir, file), name, weight))).then((list) =>
    list.filter((f) => f !== null),
  ));
}

type Ranges = [number, number][];
const sliceIndexes = new Map<CjkKey, Promise<{ slice: string; ranges: Ranges }[]>>();

/** The package's own list of which slice holds which code points (unicode.json). */
function slicesOf(key: CjkKey) {
  let p = sliceIndexes.get(key);
  if (!p) {
    p = readFile(join(PACKAGES, CJK[key].pkg, "unicode.json"), "utf8")
      .then((text) =>
        Object.entries(JSON.parse(text) as Record<string, string>)
          .filter(([slice]) => /^\[\d+\]$/.test(slice))
          .map(([slice, list]) => ({ slice: slice.slice(1, -1), ranges: parseRanges(list) })),
      )
      .catch((error: unknown) => {
        console.error(`Open Graph font index for ${CJK[key].pkg} could not be read:`, (error as Error).message);
        sliceIndexes.delete(key);
        return [];
      });
    sliceIndexes.set(key, p);
  }
  return p;
}

/** "U+4e00-4e0f,U+4e20" → [[0x4e00, 0x4e0f], [0x4e20, 0x4e20]] (CSS unicode-range syntax). */
export function parseRanges(list: string): Ranges {
  return list.split(",").map((part) => {
    const [a = "", b = a] = part.trim().replace(/^U\+/i, "").split("-");
    return [parseInt(a, 16), parseInt(b, 16)];
  });
}

const inRanges = (cp: number, ranges: Ranges) => ranges.some(([a, b]) => cp >= a && cp <= b);

/**
 * The fonts to draw `text` with: the ones always carried, plus the emoji font and the CJK
 * slices that hold characters nothing else has. Japanese text (it has kana) takes the JP
 * slices first so its kanji get Japanese forms; other Han text takes the SC slices first.
 *
 * @example
 * const fonts = await fontsFor("越野 トレイル 🚙"); // always + Noto Emoji + the JP slices holding 越, 野 and the kana
 */
export async function fontsFor(text: string): Promise<CoveredFont[]> {
  const base = await alwaysFonts();
  const missing = new Set<number>();
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    if (!base.some((f) => f.codePoints.has(cp))) missing.add(cp);
  }
  if (missing.size === 0) return base;

  const extra: CoveredFont[] = [];
  if ([...missing].some((cp) => PICTOGRAPHIC.test(String.fromCodePoint(cp)))) {
    const emoji = await load(EMOJI_FILE, "Noto Emoji", 700);
    if (emoji) {
      extra.push(emoji);
      for (const cp of [...missing]) if (emoji.codePoints.has(cp)) missing.delete(cp);
    }
  }
  const order: CjkKey[] = KANA.test(text) ? ["jp", "sc"] : ["sc", "jp"];
  for (const key of order) {
    if (missing.size === 0) break;
    const wanted = new Set<string>();
    for (const { slice, ranges } of await slicesOf(key)) {
      if ([...missing].some((cp) => inRanges(cp, ranges))) wanted.add(slice);
    }
    const loaded = await Promise.all(
      [...wanted].map((slice) =>
        load(join(PACKAGES, CJK[key].pkg, "files", `${CJK[key].pkg}-${slice}-700-normal.woff`), `${CJK[key].name} ${slice}`, 700),
      ),
    );
    for (const f of loaded) {
      if (!f) continue;
      extra.push(f);
      for (const cp of [...missing]) if (f.codePoints.has(cp)) missing.delete(cp);
    }
  }
  return [...base, ...extra];
}
