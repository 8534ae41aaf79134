import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const ROOT = path.resolve(import.meta.dirname, "../..");

/** Every opening JSX tag of the app's components (text from `<` to the `>` that closes the tag, braces respected). */
function openingTags(text: string): string[] {
  const out: string[] = [];
  for (const m of text.matchAll(/<(div|Card|section)\b/g)) {
    let depth = 0;
    let i = m.index + 1;
    for (; i < text.length; i++) {
      const c = text[i];
      if (c === "{") depth++;
      else if (c === "}") depth--;
      else if (c === ">" && depth === 0) break;
    }
    out.push(text.slice(m.index, i + 1));
  }
  return out;
}

describe("scroll regions", () => {
  it("are positioned, so a screen-reader-only header (absolute) cannot escape them and widen the page on a phone", () => {
    // The catalog was 959 px wide at 390 px: its last column's sr-only header took the page, not the
    // scroller, as its containing block. A sideways scroll region (role="region" + overflow-x-auto)
    // must be `relative` (or otherwise positioned).
    const offenders: string[] = [];
    let regions = 0;
    for (const dir of ["app", "components"]) {
      for (const f of readdirSync(path.join(ROOT, dir), { recursive: true, encoding: "utf8" })) {
        if (!f.endsWith(".tsx") || f.endsWith(".test.tsx")) continue;
        const text = readFileSync(path.join(ROOT, dir, f), "utf8");
        for (const tag of openingTags(text)) {
          if (!tag.includes("overflow-x-auto") || !tag.includes('role="region"')) continue;
          regions++;
          if (!/\b(relative|absolute|fixed|sticky)\b/.test(tag)) offenders.push(`${dir}/${f}: ${tag.replace(/\s+/g, " ").slice(0, 100)}`);
        }
      }
    }
    expect(regions).toBeGreaterThan(5);
    expect(offenders).toEqual([]);
  });
});
