/**
 * "Copy as forum post": the key figures of a comparison with the drawing and the link to the
 * shared page, in Markdown (a table, which reads fine as plain text too) or in BBCode, which
 * most off-road forums take. Every figure comes from the computed result and the display
 * helpers, in the reader's units.
 *
 * BBCode uses only the tags nearly every forum engine knows ([b] [i] [url] [img] [list] [*]
 * [code]); it has no table tag everyone supports, so the table is set in a [code] block with
 * the columns padded to line up. The person's own text (the comparison's name) is escaped so
 * that nothing in it becomes a link, an image, emphasis or markup.
 */
import type { ComparisonResult, SetupFigures } from "./compute";
import { type DisplayPrefs, formatEnteredSpeed, formatLen, formatNumber, formatPartThickness, formatSpeedIn, warningTitle } from "./format";
import { readingPhrase } from "./speedometer";

export type ForumFormat = "markdown" | "bbcode";
export const FORUM_FORMAT_LABEL: Record<ForumFormat, string> = { markdown: "Markdown", bbcode: "BBCode" };

/** Pipes would break a table cell; line breaks would end the row. */
const cell = (s: string) =>
  s
    .replace(/\|/g, "/")
    .replace(/\s*\n\s*/g, " ")
    .trim();

/**
 * Markdown: backslash-escape every character that could start emphasis, code, a link, an
 * image, HTML or an entity (CommonMark 0.31 §2.4: any ASCII punctuation may be escaped), plus
 * a dot before a letter and the ":" of "://" so forums that auto-link bare addresses (GFM,
 * linkify) do not. Decimal points ("12.50") stay as they are.
 */
export const escapeMarkdown = (s: string) =>
  cell(s)
    .replace(/[\\`*_~[\]<>&#!]/g, "\\$&")
    .replace(/\.(?=[A-Za-z])/g, "\\.")
    .replace(/:(?=\/\/)/g, "\\:");

/**
 * BBCode has no escape character: brackets become their full-width forms ［ ］, which no
 * engine reads as a tag, and the ":" of "://" and the dot of "www." their full-width forms so
 * engines that auto-link addresses leave them alone. The text still reads the same.
 */
export const escapeBbcode = (s: string) =>
  s
    .replace(/\s*\n\s*/g, " ")
    .trim()
    .replace(/\[/g, "\uff3b")
    .replace(/\]/g, "\uff3d")
    .replace(/:(?=\/\/)/g, "\uff1a")
    .replace(/\b(www)\./gi, "$1\uff0e");

const DRAWING_ALT = "Drawing: current and planned wheel and tire at the hub";
const CAVEAT = "Nominal, unloaded figures; the tire and wheel makers' published figures win. Measure your own vehicle before you buy.";

function wheel(f: SetupFigures): string {
  // The wheel columns are in mm whatever the reader's units; the spacer as bought (25.4 stays 25.4).
  const spacer = f.spacerMm > 0 ? ` + ${formatPartThickness(f.spacerMm, { units: "metric", lengths: "decimal" })} spacer` : "";
  return `${formatNumber(f.wheelDiameterIn, 1).replace(/\.0$/, "")}x${formatNumber(f.wheelWidthIn, 1).replace(/\.0$/, "")} ${formatNumber(f.offsetMm, 0, { signed: true })} mm${spacer}`;
}

type Row = [label: string, current: string, planned: string, change: string];

function figureRows(r: ComparisonResult, prefs: DisplayPrefs): Row[] {
  const len = (mm: number, signed = false) => formatLen(mm, prefs, { signed, decimals: prefs.units === "metric" ? 0 : 2 });
  const c = r.current;
  const p = r.planned;
  const cruise = r.gearing.cruise[0];
  const speed = r.speedometer.bySystem[prefs.units];
  const h = speed.headline;
  const rows: Row[] = [
    ["Tire", c.tireText, p.tireText, ""],
    ["Wheel (dia x width, offset)", wheel(c), wheel(p), ""],
    ["Overall diameter", len(c.overallDiameterMm), len(p.overallDiameterMm), len(r.changes.diameterMm, true)],
    ["Section width", len(c.sectionWidthMm), len(p.sectionWidthMm), len(p.sectionWidthMm - c.sectionWidthMm, true)],
    ["Ground clearance (axle)", "", "", len(r.changes.groundClearanceMm, true)],
    ["Inner clearance", `${len(c.innerSwingMm)} inboard`, `${len(p.innerSwingMm)} inboard`, len(r.changes.innerClearanceMm, true)],
    ["Poke (outer reach)", `${len(c.outerSwingMm)} outboard`, `${len(p.outerSwingMm)} outboard`, len(r.changes.outerPokeMm, true)],
    ["Scrub radius", "", "", len(r.changes.scrubRadiusMm, true)],
    ["Track width", "", "", len(r.changes.trackWidthMm, true)],
    [
      `True speed at ${formatSpeedIn(h.indicated, speed.unit, 0)} shown`,
      formatSpeedIn(h.indicated, speed.unit, 0),
      formatSpeedIn(h.actual, speed.unit),
      // Named, not a bare "+17.1 %" (which reads as the speedometer's error); the actual speed
      // beside it states the other figure. Short enough for a [code] table column.
      `speedometer ${readingPhrase(r.speedometer.ratio)}`,
    ],
  ];
  if (cruise)
    rows.push([
      `Engine rpm at ${formatEnteredSpeed(cruise.mph, prefs)}`,
      formatNumber(cruise.currentRpm),
      formatNumber(cruise.plannedRpm),
      `${formatNumber(((cruise.plannedRpm - cruise.currentRpm) / cruise.currentRpm) * 100, 1, { signed: true })} %`,
    ]);
  rows.push([
    "Axle ratio",
    formatNumber(r.gearing.axleRatio, 2),
    `suggested ${formatNumber(r.gearing.suggestedRatio, 2)}`,
    `${formatNumber(r.gearing.ratioToRestore, 2)} restores`,
  ]);
  return rows;
}

function markdown(r: ComparisonResult, prefs: DisplayPrefs, rows: Row[], opts: ForumPostOptions): string {
  const lines = [`**${escapeMarkdown(opts.name)}**`, ""];
  if (opts.imageUrl) lines.push(`[![${DRAWING_ALT}](${opts.imageUrl})](${opts.url})`, "");
  lines.push(
    "| | Current | Planned | Change |",
    "|---|---|---|---|",
    ...rows.map((row) => `| ${row.map(escapeMarkdown).join(" | ")} |`),
    "",
  );
  if (r.warnings.length > 0) {
    lines.push("Check before you buy:");
    for (const w of r.warnings) lines.push(`- ${escapeMarkdown(warningTitle(w, prefs))}`);
    lines.push("");
  }
  lines.push(`Drawing, charts and details: ${opts.url}`, CAVEAT);
  return lines.join("\n");
}

/** Columns padded to line up in a monospaced [code] block (two spaces between columns). */
function alignedTable(rows: Row[]): string[] {
  const all: Row[] = [["", "Current", "Planned", "Change"], ...rows.map((row) => row.map(escapeBbcode) as Row)];
  const widths = [0, 1, 2].map((i) => Math.max(...all.map((row) => [...row[i]!].length)));
  return all.map((row) =>
    row
      .map((v, i) => (i < 3 ? v + " ".repeat(widths[i]! - [...v].length + 2) : v))
      .join("")
      .trimEnd(),
  );
}

function bbcode(r: ComparisonResult, prefs: DisplayPrefs, rows: Row[], opts: ForumPostOptions): string {
  const lines = [`[b]${escapeBbcode(opts.name)}[/b]`, ""];
  if (opts.imageUrl) lines.push(`[url=${opts.url}][img]${opts.imageUrl}[/img][/url]`, "");
  lines.push("[code]", ...alignedTable(rows), "[/code]", "");
  if (r.warnings.length > 0) {
    lines.push("Check before you buy:", "[list]");
    for (const w of r.warnings) lines.push(`[*]${escapeBbcode(warningTitle(w, prefs))}`);
    lines.push("[/list]", "");
  }
  lines.push(`Drawing, charts and details: [url=${opts.url}]${opts.url}[/url]`, `[i]${CAVEAT}[/i]`);
  return lines.join("\n");
}

export interface ForumPostOptions {
  name: string;
  /** The shared page, absolute. */
  url: string;
  /** The drawing as an image (the share page's Open Graph image), absolute. */
  imageUrl?: string;
  format?: ForumFormat;
}

/**
 * @example
 * forumPost(computeComparison(DEFAULT_INPUT), DEFAULT_PREFS, { name: "Trail build", url: "https://hubface.example/s/abc", imageUrl: "https://hubface.example/s/abc/opengraph-image" });
 * // "**Trail build**\n\n[![Drawing: …](https://hubface.example/s/abc/opengraph-image)](https://hubface.example/s/abc)\n\n| | Current | Planned | Change |\n…"
 * forumPost(result, prefs, { ...opts, format: "bbcode" });
 * // "[b]Trail build[/b]\n\n[url=…][img]…[/img][/url]\n\n[code]\n                             Current         Planned  …"
 */
export function forumPost(r: ComparisonResult, prefs: DisplayPrefs, opts: ForumPostOptions): string {
  const rows = figureRows(r, prefs);
  return opts.format === "bbcode" ? bbcode(r, prefs, rows, opts) : markdown(r, prefs, rows, opts);
}
