import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

// Next sends a page's status with its shell: a notFound() raised below a loading.tsx (a Suspense
// boundary) comes after the shell went out with 200. The item pages therefore check their record in
// a layout with no loading boundary between the root and it; their own loading state sits below.
const GUARDED = [
  "app/(garage)/garage/[id]",
  "app/(shop)/shop/quotes/[id]",
  "app/(shop)/shop/work-orders/[id]",
  "app/(shop)/shop/catalog/[id]",
];

/** The folders from app/ down to a segment's parent, e.g. app, app/(shop), app/(shop)/shop, app/(shop)/shop/quotes. */
const foldersAbove = (segment: string) =>
  segment
    .split("/")
    .slice(0, -1)
    .map((_, i, parts) => parts.slice(0, i + 1).join("/"));

describe("the item pages' guards run before anything streams", () => {
  it.each(GUARDED)("%s: a guard layout, no loading boundary above it, a loading state below it", (segment) => {
    for (const dir of foldersAbove(segment)) {
      expect(existsSync(join(process.cwd(), dir, "loading.tsx")), `${dir}/loading.tsx`).toBe(false);
      for (const file of ["layout.tsx", "template.tsx"]) {
        const path = join(process.cwd(), dir, file);
        if (existsSync(path)) expect(readFileSync(path, "utf8"), `${dir}/${file}`).not.toMatch(/<Suspense\b/);
      }
    }
    expect(readFileSync(join(process.cwd(), segment, "layout.tsx"), "utf8")).toMatch(/guardLayout\(/);
    expect(existsSync(join(process.cwd(), segment, "loading.tsx"))).toBe(true);
  });
});
