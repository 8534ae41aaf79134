import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { codePointsOf } from "./cmap";

const cp = (s: string) => s.codePointAt(0)!;

describe("cmap reader", () => {
  it("reads what a font draws, not the range its package declares", () => {
    // The Latin subset of Archivo declares U+0000-00FF but draws no C0 controls; Ł (U+0141) is in Latin Extended.
    const latin = codePointsOf(readFileSync("app/fonts/og/archivo-latin-700-normal.woff"));
    expect(latin.has(cp("A"))).toBe(true);
    expect(latin.has(cp("é"))).toBe(true);
    expect(latin.has(0x07)).toBe(false);
    expect(latin.has(cp("Ł"))).toBe(false);
    expect(codePointsOf(readFileSync("app/fonts/og/archivo-latin-ext-700-normal.woff")).has(cp("Ł"))).toBe(true);
    // Format 12 (beyond the BMP): the emoji font holds U+1F699 (recreational vehicle).
    expect(codePointsOf(readFileSync("node_modules/@fontsource/noto-emoji/files/noto-emoji-emoji-700-normal.woff")).has(0x1f699)).toBe(
      true,
    );
  });
});
