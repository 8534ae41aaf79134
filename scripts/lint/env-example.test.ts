import { readFileSync, readdirSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const ROOT = path.resolve(import.meta.dirname, "../..");
const SOURCES = ["app", "lib", "scripts", "components", "db", "proxy.ts", "next.config.mjs", "instrumentation.ts", "knexfile.ts"];

function files(p: string): string[] {
  const abs = path.join(ROOT, p);
  if (!statSync(abs, { throwIfNoEntry: false })) return [];
  if (statSync(abs).isFile()) return [abs];
  return readdirSync(abs, { recursive: true, encoding: "utf8" })
    .filter((f) => /\.(ts|tsx|mts|mjs|js|sh)$/.test(f) && !/\.test\.tsx?$/.test(f))
    .map((f) => path.join(abs, f));
}

describe(".env.example", () => {
  it("names every environment variable the app, its scripts and its config read", () => {
    const read = new Set<string>();
    for (const f of SOURCES.flatMap(files)) {
      const text = readFileSync(f, "utf8");
      for (const m of text.matchAll(/\benv\.([A-Z][A-Z0-9_]+)|process\.env\[["']([A-Z][A-Z0-9_]+)["']\]/g)) read.add((m[1] ?? m[2])!);
    }
    expect(read.size).toBeGreaterThan(20);
    const example = readFileSync(path.join(ROOT, ".env.example"), "utf8");
    const missing = [...read].filter((name) => !new RegExp(`\\b${name}\\b`).test(example)).sort();
    expect(missing).toEqual([]);
  });
});
