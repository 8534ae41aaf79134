/**
 * "Copy as forum post": the key figures of a comparison as a Markdown table (which reads fine
 * as plain text too), with the link to the shared page. Every figure comes from the computed
 * result and the display helpers, in the reader's units.
 */
import type { ComparisonResult, SetupFigures } from "./compute";
import { type DisplayPrefs, formatEnteredSpeed, formatLen, formatNumber, formatPartThickness, formatSpeedIn, warningTitle } from "./format";
import { speedometerSentence } from "./speedometer";

/** Pipes would break a table cell; line breaks would end the row. */
const cell = (s: string) => s.replace(/\|/g, "/").replace(/\s*\n\s*/g, " ").trim();

function wheel(f: SetupFigures): string {
  // The wheel columns are in mm whatever the reader's units; the spacer as bought (25.4 stays 25.4).
  const spacer = f.spacerMm > 0 ? ` + ${formatPartThickness(f.spacerMm, { units: "metric", lengths: "decimal" })} spacer` : "";
  return `${formatNumber(f.wheelDiameterIn, 1).replace(/\.0$/, "")}x${formatNumber(f.wheelWidthIn, 1).replace(/\.0$/, "")} ${formatNumber(f.offsetMm, 0, { signed: true })} mm${spacer}`;
}

/**
 * @example
 * forumPost(computeComparison(DEFAULT_INPUT), DEFAULT_PREFS, { name: "Trail build", url: "https://hubface.example/s/abc" });
 * // "**Trail build**\n\n| | Current | Planned | Change |\n|---|---|---|---|\n| Tire | 265/70R17 113T | 37x12.50R17LT 124Q LRD | |\n…"
 */
export function forumPost(r: ComparisonResult, prefs: DisplayPrefs, opts: { name: string; url: string }): string {
  const len = (mm: number, signed = false) => formatLen(mm, prefs, { signed, decimals: prefs.units === "metric" ? 0 : 2 });
  const c = r.current;
  const p = r.planned;
  const cruise = r.gearing.cruise[0];
  const speed = r.speedometer.bySystem[prefs.units];
  const h = speed.headline;
  const rows: [string, string, string, string][] = [
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
      // Both percentages, each named: a bare "+17.1 %" reads as the speedometer's error.
      speedometerSentence(r.speedometer.ratio),
    ],
  ];
  if (cruise) rows.push([`Engine rpm at ${formatEnteredSpeed(cruise.mph, prefs)}`, formatNumber(cruise.currentRpm), formatNumber(cruise.plannedRpm), `${formatNumber(((cruise.plannedRpm - cruise.currentRpm) / cruise.currentRpm) * 100, 1, { signed: true })} %`]);
  rows.push(["Axle ratio", formatNumber(r.gearing.axleRatio, 2), `suggested ${formatNumber(r.gearing.suggestedRatio, 2)}`, `${formatNumber(r.gearing.ratioToRestore, 2)} restores`]);

  const lines = [
    `**${cell(opts.name)}**`,
    "",
    "| | Current | Planned | Change |",
    "|---|---|---|---|",
    ...rows.map((row) => `| ${row.map(cell).join(" | ")} |`),
    "",
  ];
  if (r.warnings.length > 0) {
    lines.push("Check before you buy:");
    for (const w of r.warnings) lines.push(`- ${cell(warningTitle(w, prefs))}`);
    lines.push("");
  }
  lines.push(`Drawing, charts and details: ${opts.url}`);
  lines.push("Nominal, unloaded figures; the tire and wheel makers' published figures win. Measure your own vehicle before you buy.");
  return lines.join("\n");
}
