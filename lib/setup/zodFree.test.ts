import { existsSync, readFileSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { describe, expect, it } from "vitest";

/**
 * The workspace validates as you type in the browser and ships without zod (its first-load
 * budget, README "Performance"): the modules it reads a setup with must not import zod, not even
 * through another module. Type-only imports are left out, as the bundler leaves them out.
 */
const ROOT = resolve(__dirname, "../..");

function resolveImport(from: string, spec: string): string | null {
  const base = spec.startsWith("@/") ? join(ROOT, spec.slice(2)) : spec.startsWith(".") ? resolve(dirname(from), spec) : null;
  if (base === null) return null;
  for (const f of [`${base}.ts`, `${base}.tsx`, join(base, "index.ts")]) if (existsSync(f)) return f;
  return null;
}

/** Every package a module reaches through value imports (static `import … from` and `export … from`). */
function packagesReached(entry: string): Map<string, string> {
  const seen = new Set<string>();
  const packages = new Map<string, string>();
  const walk = (file: string) => {
    if (seen.has(file)) return;
    seen.add(file);
    const src = readFileSync(file, "utf8");
    for (const m of src.matchAll(/^\s*(?:import|export)\s+(type\s+)?[^;]*?\sfrom\s+"([^"]+)"/gm)) {
      if (m[1]) continue;
      const spec = m[2]!;
      const target = resolveImport(file, spec);
      if (target) walk(target);
      else packages.set(spec, file);
    }
  };
  walk(entry);
  return packages;
}

describe("the setup model ships without zod", () => {
  it.each([
    "lib/setup/check.ts",
    "lib/setup/url.ts",
    "lib/setup/urlRead.ts",
    "lib/comparisons/draft.ts",
    "lib/comparisons/readDraft.ts",
    "lib/comparisons/url.ts",
    "lib/comparisons/urlRead.ts",
    "lib/comparisons/model.ts",
    "lib/comparisons/checkInput.ts",
  ])("%s reaches no zod", (entry) => {
    const reached = packagesReached(join(ROOT, entry));
    expect([...reached.keys()].filter((p) => p === "zod" || p.startsWith("zod/"))).toEqual([]);
  });

  it("the zod adapter does reach zod (the check above would see it)", () => {
    expect(packagesReached(join(ROOT, "lib/setup/schema.ts")).has("zod")).toBe(true);
  });
});
