import { describe, expect, it } from "vitest";
import { FitmentInputError } from "./errors";
import { LOAD_INDEX_KG, loadIndexKg, speedSymbolKmh, isSpeedSymbol } from "./loadSpeed";

// ISO 4000-1 load index table (also UN R30 Annex 4 / ETRTO Standards Manual), kg, rows of ten
// starting at the index in the first column.
const PUBLISHED_LOAD_INDEX: Record<number, number[]> = {
  0: [45, 46.2, 47.5, 48.7, 50, 51.5, 53, 54.5, 56, 58],
  10: [60, 61.5, 63, 65, 67, 69, 71, 73, 75, 77.5],
  20: [80, 82.5, 85, 87.5, 90, 92.5, 95, 97.5, 100, 103],
  30: [106, 109, 112, 115, 118, 121, 125, 128, 132, 136],
  40: [140, 145, 150, 155, 160, 165, 170, 175, 180, 185],
  50: [190, 195, 200, 206, 212, 218, 224, 230, 236, 243],
  60: [250, 257, 265, 272, 280, 290, 300, 307, 315, 325],
  70: [335, 345, 355, 365, 375, 387, 400, 412, 425, 437],
  80: [450, 462, 475, 487, 500, 515, 530, 545, 560, 580],
  90: [600, 615, 630, 650, 670, 690, 710, 730, 750, 775],
  100: [800, 825, 850, 875, 900, 925, 950, 975, 1000, 1030],
  110: [1060, 1090, 1120, 1150, 1180, 1215, 1250, 1285, 1320, 1360],
  120: [1400, 1450, 1500, 1550, 1600, 1650, 1700, 1750, 1800, 1850],
  130: [1900, 1950, 2000, 2060, 2120, 2180, 2240, 2300, 2360, 2430],
  140: [2500, 2575, 2650, 2725, 2800, 2900, 3000, 3075, 3150, 3250],
  150: [3350],
};

describe("load index (ISO 4000-1 table)", () => {
  for (const [start, row] of Object.entries(PUBLISHED_LOAD_INDEX)) {
    row.forEach((kg, i) => {
      const index = Number(start) + i;
      it(`LI ${index} = ${kg} kg (ISO 4000-1)`, () => {
        expect(loadIndexKg(index)).toBe(kg);
      });
    });
  }

  it("the table is strictly increasing (ISO 4000-1 is a rising series)", () => {
    for (let i = 1; i < LOAD_INDEX_KG.length; i++) expect(LOAD_INDEX_KG[i]).toBeGreaterThan(LOAD_INDEX_KG[i - 1] as number);
  });

  it("rejects indexes outside the table and non-integers with a FitmentInputError naming the field", () => {
    for (const bad of [-1, 1.5, 9999, Number.NaN]) {
      expect(() => loadIndexKg(bad)).toThrow(FitmentInputError);
    }
    expect(() => loadIndexKg(-1)).toThrow(/load index.*e\.g\. 121/);
  });
});

// ISO 4000-1 / UN R30 speed category symbols, km/h.
const PUBLISHED_SPEED: [string, number][] = [
  ["A1", 5],
  ["A2", 10],
  ["A3", 15],
  ["A4", 20],
  ["A5", 25],
  ["A6", 30],
  ["A7", 35],
  ["A8", 40],
  ["B", 50],
  ["C", 60],
  ["D", 65],
  ["E", 70],
  ["F", 80],
  ["G", 90],
  ["J", 100],
  ["K", 110],
  ["L", 120],
  ["M", 130],
  ["N", 140],
  ["P", 150],
  ["Q", 160],
  ["R", 170],
  ["S", 180],
  ["T", 190],
  ["U", 200],
  ["H", 210],
  ["V", 240],
  ["W", 270],
  ["Y", 300],
];

describe("speed symbols (ISO 4000-1 / UN R30)", () => {
  for (const [symbol, kmh] of PUBLISHED_SPEED) {
    it(`${symbol} = ${kmh} km/h (ISO 4000-1)`, () => {
      expect(speedSymbolKmh(symbol)).toBe(kmh);
    });
  }
  it("is case-insensitive", () => {
    expect(speedSymbolKmh("q")).toBe(160);
  });
  it("ZR is a construction marking (above 240 km/h), not a speed symbol (UN R30)", () => {
    expect(isSpeedSymbol("Z")).toBe(false);
    expect(() => speedSymbolKmh("ZR")).toThrow(FitmentInputError);
  });
  it("rejects letters not in the table (I, O, X)", () => {
    for (const s of ["I", "O", "X", "", "A9"]) expect(() => speedSymbolKmh(s)).toThrow(/speed symbol/);
  });
});
