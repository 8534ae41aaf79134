import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { fontsFor, parseRanges } from "./fonts";
import { REPLACEMENT, drawableText, fallbackOrder } from "./text";

const cp = (s: string) => s.codePointAt(0)!;

describe("CSS unicode-range lists", () => {
  it("parses CSS unicode-range lists", () => {
    expect(parseRanges("U+4e00-4e0f, U+4e20,u+ff01")).toEqual([
      [0x4e00, 0x4e0f],
      [0x4e20, 0x4e20],
      [0xff01, 0xff01],
    ]);
  });
});

describe("shipped Open Graph fonts", () => {
  it("are the @fontsource packages' own WOFF files, each with its licence", () => {
    const copies: [string, string][] = [
      ["archivo-latin-ext-700-normal.woff", "archivo"],
      ["archivo-vietnamese-700-normal.woff", "archivo"],
      ["inter-cyrillic-700-normal.woff", "inter"],
      ["inter-cyrillic-ext-700-normal.woff", "inter"],
      ["inter-greek-700-normal.woff", "inter"],
      ["noto-sans-hebrew-hebrew-700-normal.woff", "noto-sans-hebrew"],
      ["vazirmatn-arabic-700-normal.woff", "vazirmatn"],
    ];
    for (const [file, pkg] of copies) {
      expect(readFileSync(`app/fonts/og/${file}`).equals(readFileSync(`node_modules/@fontsource/${pkg}/files/${file}`)), file).toBe(true);
      expect(readFileSync(`app/fonts/og/LICENSE-${pkg}.txt`, "utf8")).toContain("SIL Open Font License, Version 1.1");
    }
    for (const pkg of ["noto-sans-sc", "noto-sans-jp", "noto-emoji"]) {
      expect(readFileSync(`app/fonts/og/LICENSE-${pkg}.txt`, "utf8")).toBe(readFileSync(`node_modules/@fontsource/${pkg}/LICENSE`, "utf8"));
    }
  });
});

describe("fonts for a name", () => {
  it("needs nothing beyond the fonts always carried for Latin, Polish, Cyrillic, Greek, Hebrew and Arabic", async () => {
    const always = await fontsFor("Trail build");
    for (const name of ["Łódź – Kraków", "Внедорожник", "Τζιπ", "שלום", "سيارة"]) {
      const fonts = await fontsFor(name);
      expect(fonts.map((f) => f.font.name)).toEqual(always.map((f) => f.font.name));
      expect(drawableText(name, fonts, "Archivo", 700).replaced).toBe(0);
    }
  });

  it("adds only the Noto Sans SC slices a Chinese name needs", async () => {
    const name = "越野车 轮胎升级 对比";
    const fonts = await fontsFor(name);
    const extra = fonts.filter((f) => f.font.name.startsWith("Noto Sans SC "));
    expect(extra.length).toBeGreaterThan(0);
    expect(extra.length).toBeLessThanOrEqual([...name.replace(/ /g, "")].length);
    expect(fonts.some((f) => f.font.name.startsWith("Noto Sans JP"))).toBe(false);
    expect(drawableText(name, fonts, "Archivo", 700)).toEqual({ text: name, replaced: 0, graphemes: 9 });
  });

  it("draws a Japanese name (it has kana) from the Noto Sans JP slices, kanji included", async () => {
    const name = "林道仕様 トレイル";
    const fonts = await fontsFor(name);
    const ordered = fallbackOrder(fonts, "Archivo", 700);
    for (const ch of "林道仕様トレイル") expect(ordered.find((f) => f.codePoints.has(cp(ch)))?.font.name, ch).toMatch(/^Noto Sans JP /);
    expect(drawableText(name, fonts, "Archivo", 700).replaced).toBe(0);
  });

  it("draws emoji from Noto Emoji, without the skin-tone swatch, and never as a network picture", async () => {
    const name = "Trail rig 🚙 build 👍🏽";
    const fonts = await fontsFor(name);
    expect(fonts.some((f) => f.font.name === "Noto Emoji")).toBe(true);
    expect(drawableText(name, fonts, "Archivo", 700)).toEqual({ text: "Trail rig 🚙 build 👍", replaced: 0, graphemes: 15 });
  });

  it("replaces what no shipped font draws with a readable mark, and drops invisible controls", async () => {
    // Korean: Noto Sans SC/JP declare a few Hangul code points in their slice lists but draw none of these.
    const korean = "오프로드 타이어";
    expect(drawableText(korean, await fontsFor(korean), "Archivo", 700)).toEqual({
      text: `${REPLACEMENT.repeat(4)} ${REPLACEMENT.repeat(3)}`,
      replaced: 7,
      graphemes: 7,
    });
    const tricky = "Rig\u0007 \u202eevil\u202c name\u200b";
    expect(drawableText(tricky, await fontsFor(tricky), "Archivo", 700).text).toBe("Rig evil name");
  });
});
