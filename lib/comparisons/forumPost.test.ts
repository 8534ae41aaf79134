import { describe, expect, it } from "vitest";
import { computeComparison } from "./compute";
import { DEFAULT_PREFS } from "./format";
import { forumPost } from "./forumPost";
import { DEFAULT_INPUT } from "./schema";

const r = computeComparison(DEFAULT_INPUT);
const text = forumPost(r, DEFAULT_PREFS, { name: "Trail | build", url: "https://hubface.example/s/AbC" });
const rows = text.split("\n").filter((l) => l.startsWith("| ") && !l.startsWith("| |"));
const row = (label: string) =>
  rows
    .find((l) => l.startsWith(`| ${label}`))
    ?.split(" | ")
    .map((s) => s.replace(/^\| |\s*\|$/g, ""));

describe("forum post", () => {
  it("is a Markdown table with four cells on every row and the link", () => {
    expect(text.split("\n")[0]).toBe("**Trail / build**"); // a pipe would break the table
    expect(text).toContain("| | Current | Planned | Change |\n|---|---|---|---|");
    for (const l of rows) expect(l.split(" | ")).toHaveLength(4);
    expect(text).toContain("https://hubface.example/s/AbC");
  });

  it("carries the computed figures in inches", () => {
    // ISO 4000-1: 265/70R17 = 802.8 mm = 31.61 in; flotation 37 in; change 137 mm = 5.39 in.
    expect(row("Overall diameter")).toEqual(["Overall diameter", "31.61 in", "37 in", "+5.39 in"]);
    expect(row("Tire")?.[1]).toBe("265/70R17 113T");
    // Speedometer: 60 × 939.8 / 802.8 = 70.24 mph true at 60 shown (ratio of diameters, unloaded).
    // Both percentages from r = 939.8 / 802.8, each named: (r − 1) = 17.1 % above, (1 − 1/r) = 14.6 % low.
    // The table names the speedometer's figure; the actual speed beside it carries the other.
    expect(row("True speed at 60 mph shown")).toEqual(["True speed at 60 mph shown", "60 mph", "70.2 mph", "speedometer reads 14.6 % low"]);
    expect(row("Wheel (dia x width, offset)")?.slice(1, 3)).toEqual(["17x8 +25 mm", "17x9 −12 mm"]);
  });

  it("uses millimetres when the reader chose metric", () => {
    const m = forumPost(r, { units: "metric", lengths: "decimal" }, { name: "x", url: "u" });
    expect(m).toContain("| Overall diameter | 803 mm | 940 mm | +137 mm |");
    // Round km/h: 100 km/h shown is 100 × 939.8 / 802.8 = 117.07 km/h true.
    expect(m).toContain("| True speed at 100 km/h shown | 100 km/h | 117.1 km/h | speedometer reads 14.6 % low |");
    expect(m).toContain("| Engine rpm at 96.6 km/h (60 mph) |");
    expect(m).toContain("- Speedometer reads 14.6 % low: at an indicated 100 km/h you are actually going 117.1 km/h");
    expect(m).not.toMatch(/96\.6 km\/h shown|\+17\.1 %/);
  });

  it("gives a spacer its exact thickness: a 1 in spacer is 25.4 mm, not 25 mm (1 in = 25.4 mm exactly, NIST SP 811)", () => {
    const x = computeComparison({ ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, spacerMm: 25.4 } });
    expect(forumPost(x, DEFAULT_PREFS, { name: "x", url: "u" })).toContain("| 17x8 +25 mm | 17x9 −12 mm + 25.4 mm spacer |");
  });

  it("lists the warnings the numbers call for", () => {
    expect(r.warnings.length).toBeGreaterThan(0);
    expect(text).toContain("Check before you buy:");
    expect(text).toContain(
      "- Speedometer reads 14.6 % low: at an indicated 60 mph you are actually going 70.2 mph (actual speed is 17.1 % above the speedometer)",
    );
  });
});

const SHARE = "https://hubface.example/s/AbC";
const IMAGE = "https://hubface.example/s/AbC/opengraph-image";
const EVIL =
  "[url=https://evil.example]click[/url] [click](https://evil.example) ![x](https://evil.example/i.png) <a href=x>y</a> https://evil.example www.evil.example";

describe("forum post in Markdown, with the drawing", () => {
  const md = forumPost(r, DEFAULT_PREFS, { name: "Trail build", url: SHARE, imageUrl: IMAGE, format: "markdown" });

  it("shows the drawing as an image that links to the shared page", () => {
    expect(md).toContain(`[![Drawing: current and planned wheel and tire at the hub](${IMAGE})](${SHARE})`);
  });

  it("escapes a name so that no link, image, emphasis or HTML in it takes effect", () => {
    const text = forumPost(r, DEFAULT_PREFS, { name: `${EVIL} **bold** _it_ \`code\``, url: SHARE, imageUrl: IMAGE, format: "markdown" });
    // Every link and image target left in the post is ours (an escaped bracket is not a link).
    const targets = [...text.matchAll(/(?<!\\)\]\(([^)]*)\)/g)].map((m) => m[1]);
    expect(new Set(targets)).toEqual(new Set([IMAGE, SHARE]));
    expect(text).not.toMatch(/(?<!\\)<a /);
    // A bare address is not auto-linked (CommonMark §2.4: a backslash-escaped ":" breaks the scheme).
    expect(text).not.toContain("https://evil.example");
    expect(text).not.toContain("www.evil");
    expect(text.split("\n")[0]).toBe(
      "**\\[url=https\\://evil\\.example\\]click\\[/url\\] \\[click\\](https\\://evil\\.example) \\!\\[x\\](https\\://evil\\.example/i\\.png) \\<a href=x\\>y\\</a\\> https\\://evil\\.example www\\.evil\\.example \\*\\*bold\\*\\* \\_it\\_ \\`code\\`**",
    );
  });
});

describe("forum post in BBCode", () => {
  const bb = forumPost(r, DEFAULT_PREFS, { name: "Trail | build", url: SHARE, imageUrl: IMAGE, format: "bbcode" });
  const tags = (text: string) =>
    [...text.matchAll(/\[(\/?)([a-z*]+)(?:=([^\]]*))?\]/gi)].map((m) => ({ close: m[1] === "/", name: m[2]!.toLowerCase(), arg: m[3] }));

  it("uses only the widely supported tags, each one closed", () => {
    const used = tags(bb);
    for (const t of used) expect(["b", "i", "url", "img", "list", "*", "quote", "code"]).toContain(t.name);
    for (const name of ["b", "i", "url", "img", "list", "code"]) {
      expect(used.filter((t) => t.name === name && !t.close).length, name).toBe(used.filter((t) => t.name === name && t.close).length);
    }
    expect(bb.split("\n")[0]).toBe("[b]Trail | build[/b]");
  });

  it("shows the drawing linked to the shared page and names the link", () => {
    expect(bb).toContain(`[url=${SHARE}][img]${IMAGE}[/img][/url]`);
    expect(bb).toContain(`[url=${SHARE}]${SHARE}[/url]`);
  });

  it("sets the figures as an aligned table inside [code] with the same figures as the Markdown table", () => {
    const block = bb.slice(bb.indexOf("[code]\n") + 7, bb.indexOf("\n[/code]")).split("\n");
    const header = block[0]!;
    expect(header).toMatch(/^ +Current +Planned +Change$/);
    const cols = ["Current", "Planned", "Change"].map((h) => header.indexOf(h));
    // Overall diameter: ISO 4000-1, 265/70R17 = 802.8 mm = 31.61 in; flotation 37 in; change +5.39 in (as in Markdown).
    const line = block.find((l) => l.startsWith("Overall diameter"))!;
    expect([line.slice(cols[0], cols[1]).trim(), line.slice(cols[1], cols[2]).trim(), line.slice(cols[2]).trim()]).toEqual([
      "31.61 in",
      "37 in",
      "+5.39 in",
    ]);
    // The last column is free text ("speedometer reads 14.6 % low"): a line may run past the header by that much.
    for (const l of block.slice(1)) expect(l.length).toBeLessThanOrEqual(header.length + 25);
    expect(bb).toMatch(/\[list\]\n(\[\*\].*\n)*\[\*\]Speedometer reads 14\.6 % low.*\n(\[\*\].*\n)*\[\/list\]/);
  });

  it("keeps tags in a name from taking effect", () => {
    const text = forumPost(r, DEFAULT_PREFS, { name: EVIL, url: SHARE, imageUrl: IMAGE, format: "bbcode" });
    for (const t of tags(text)) {
      expect(["b", "i", "url", "img", "list", "*", "code"]).toContain(t.name);
      if (t.arg !== undefined) expect(t.arg).toBe(SHARE);
    }
    expect(text).not.toContain("https://evil.example");
    expect(text).not.toContain("[/url] [click]");
  });
});
