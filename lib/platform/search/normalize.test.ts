import { describe, expect, it } from "vitest";
import { FOLDED_LETTERS, containsPattern, escapeLike, foldDiacritics, searchKey } from "./normalize";

describe("search key", () => {
  it("reads the multiplication sign and X between digits as x, with or without spaces", () => {
    for (const typed of ["37×12.50", "37x12.50", "37X12.50", "37 x 12.50", "37 × 12.50", "37\u00a0×\u00a012.50", "37x12.5"]) {
      expect(searchKey(typed), typed).toBe("37x12.5");
    }
    // Stored sizes are written by the engine with two decimals (35x12.50R17LT).
    expect(searchKey("37x12.50R17LT 121Q")).toBe("37x12.5r17lt 121q");
    expect(searchKey("1 x 2 x 3")).toBe("1x2x3");
    // An x that is not between digits is a letter.
    expect(searchKey("Box 4 x large")).toBe("box 4 x large");
  });

  it("drops trailing zeros of decimals only", () => {
    expect(searchKey("12.50 17.0 0.500 1.05 100 2.0.0")).toBe("12.5 17 0.5 1.05 100 2.0");
    expect(searchKey("LT285/70R17")).toBe("lt285/70r17");
    expect(searchKey("6x139.70")).toBe("6x139.7");
  });

  it("folds accents and letters Unicode does not decompose (common practice, no source: the usual Latin transliterations)", () => {
    // Decomposed by Unicode NFD (UAX #15) into base letter + combining mark:
    expect(foldDiacritics("Émile Zoë Núñez Åsa Çelik Dvořák")).toBe("emile zoe nunez asa celik dvorak");
    // Not decomposed: the explicit table.
    expect(foldDiacritics("Łukasz Øyvind Straße ÆRØ Đorđe Þór Œuvre")).toBe("lukasz oyvind strasse aero dorde thor oeuvre");
    expect(searchKey("ŁUKASZ")).toBe(searchKey("lukasz"));
    for (const [letter, plain] of Object.entries(FOLDED_LETTERS)) expect(foldDiacritics(letter), letter).toBe(plain);
  });

  it("collapses spaces, including no-break spaces", () => {
    expect(searchKey("  Mount \t and\u00a0 balance ")).toBe("mount and balance");
  });

  it("escapes LIKE wildcards so they match themselves", () => {
    expect(escapeLike("50%_off\\")).toBe("50\\%\\_off\\\\");
    expect(containsPattern("a_b")).toBe("%a\\_b%");
  });
});
