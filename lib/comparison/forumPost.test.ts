import { describe, expect, it } from "vitest";
import { computeComparison } from "./compute";
import { DEFAULT_PREFS } from "./format";
import { forumPost } from "./forumPost";
import { DEFAULT_INPUT } from "./schema";

const r = computeComparison(DEFAULT_INPUT);
const text = forumPost(r, DEFAULT_PREFS, { name: "Trail | build", url: "https://hubface.example/s/AbC" });
const rows = text.split("\n").filter((l) => l.startsWith("| ") && !l.startsWith("| |"));
const row = (label: string) => rows.find((l) => l.startsWith(`| ${label}`))?.split(" | ").map((s) => s.replace(/^\| |\s*\|$/g, ""));

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
    expect(row("True speed at 60 mph shown")).toEqual(["True speed at 60 mph shown", "60 mph", "70.2 mph", "Actual speed is 17.1 % above the speedometer; the speedometer reads 14.6 % low."]);
    expect(row("Wheel (dia x width, offset)")?.slice(1, 3)).toEqual(["17x8 +25 mm", "17x9 −12 mm"]);
  });

  it("uses millimetres when the reader chose metric", () => {
    const m = forumPost(r, { units: "metric", lengths: "decimal" }, { name: "x", url: "u" });
    expect(m).toContain("| Overall diameter | 803 mm | 940 mm | +137 mm |");
    // Round km/h: 100 km/h shown is 100 × 939.8 / 802.8 = 117.07 km/h true.
    expect(m).toContain("| True speed at 100 km/h shown | 100 km/h | 117.1 km/h | Actual speed is 17.1 % above the speedometer; the speedometer reads 14.6 % low. |");
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
    expect(text).toContain("- Speedometer reads 14.6 % low: at an indicated 60 mph you are actually going 70.2 mph (actual speed is 17.1 % above the speedometer)");
  });
});
