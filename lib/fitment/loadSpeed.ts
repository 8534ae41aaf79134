/**
 * Load index and speed symbol tables of the service description (ISO 4000-1, also
 * reproduced in UN R30 Annex 4 and the ETRTO Standards Manual).
 */
import { FitmentInputError } from "./errors";

/**
 * Load capacity in kg per load index, index 0–170 (ISO 4000-1 load index table).
 * `LOAD_INDEX_KG[i]` is the load for index `i`.
 */
export const LOAD_INDEX_KG: readonly number[] = Object.freeze([
  // 0–9
  45, 46.2, 47.5, 48.7, 50, 51.5, 53, 54.5, 56, 58,
  // 10–19
  60, 61.5, 63, 65, 67, 69, 71, 73, 75, 77.5,
  // 20–29
  80, 82.5, 85, 87.5, 90, 92.5, 95, 97.5, 100, 103,
  // 30–39
  106, 109, 112, 115, 118, 121, 125, 128, 132, 136,
  // 40–49
  140, 145, 150, 155, 160, 165, 170, 175, 180, 185,
  // 50–59
  190, 195, 200, 206, 212, 218, 224, 230, 236, 243,
  // 60–69
  250, 257, 265, 272, 280, 290, 300, 307, 315, 325,
  // 70–79
  335, 345, 355, 365, 375, 387, 400, 412, 425, 437,
  // 80–89
  450, 462, 475, 487, 500, 515, 530, 545, 560, 580,
  // 90–99
  600, 615, 630, 650, 670, 690, 710, 730, 750, 775,
  // 100–109
  800, 825, 850, 875, 900, 925, 950, 975, 1000, 1030,
  // 110–119
  1060, 1090, 1120, 1150, 1180, 1215, 1250, 1285, 1320, 1360,
  // 120–129
  1400, 1450, 1500, 1550, 1600, 1650, 1700, 1750, 1800, 1850,
  // 130–139
  1900, 1950, 2000, 2060, 2120, 2180, 2240, 2300, 2360, 2430,
  // 140–149
  2500, 2575, 2650, 2725, 2800, 2900, 3000, 3075, 3150, 3250,
  // 150–159
  3350, 3450, 3550, 3650, 3750, 3875, 4000, 4125, 4250, 4375,
  // 160–170
  4500, 4625, 4750, 4875, 5000, 5150, 5300, 5450, 5600, 5800, 6000,
]);

/** Highest load index in {@link LOAD_INDEX_KG}. */
export const MAX_LOAD_INDEX = LOAD_INDEX_KG.length - 1;

/**
 * Speed symbols and their reference speed in km/h (ISO 4000-1 / UN R30 speed category table).
 * `ZR` in the size (e.g. 255/35ZR18) marks a tire for speeds above 240 km/h; the speed symbol
 * in the service description (V, W, Y) then gives the limit, and a symbol in brackets, e.g.
 * `(Y)`, means above 300 km/h — that is a marking, not an entry of this table.
 */
export const SPEED_SYMBOL_KMH: Readonly<Record<string, number>> = Object.freeze({
  A1: 5,
  A2: 10,
  A3: 15,
  A4: 20,
  A5: 25,
  A6: 30,
  A7: 35,
  A8: 40,
  B: 50,
  C: 60,
  D: 65,
  E: 70,
  F: 80,
  G: 90,
  J: 100,
  K: 110,
  L: 120,
  M: 130,
  N: 140,
  P: 150,
  Q: 160,
  R: 170,
  S: 180,
  T: 190,
  U: 200,
  H: 210,
  V: 240,
  W: 270,
  Y: 300,
});

/**
 * Load capacity (kg) for a load index, per the ISO 4000-1 table.
 *
 * @example
 * loadIndexKg(121); // 1450
 * loadIndexKg(100); // 800
 */
export function loadIndexKg(index: number): number {
  if (typeof index !== "number" || !Number.isInteger(index) || index < 0 || index > MAX_LOAD_INDEX) {
    throw new FitmentInputError(
      "loadIndex",
      `load index must be a whole number from 0 to ${MAX_LOAD_INDEX}, got ${String(index)} (e.g. 121 = 1450 kg)`,
      index,
    );
  }
  return LOAD_INDEX_KG[index] as number;
}

/**
 * Speed (km/h) for a speed symbol, per the ISO 4000-1 table. Case-insensitive.
 *
 * @example
 * speedSymbolKmh("Q"); // 160
 * speedSymbolKmh("a8"); // 40
 */
export function speedSymbolKmh(symbol: string): number {
  const key = typeof symbol === "string" ? symbol.trim().toUpperCase() : "";
  const kmh = Object.prototype.hasOwnProperty.call(SPEED_SYMBOL_KMH, key) ? SPEED_SYMBOL_KMH[key] : undefined;
  if (kmh === undefined) {
    throw new FitmentInputError(
      "speedSymbol",
      `speed symbol ${JSON.stringify(symbol)} is not in the table A1–A8, B–H, J–N, P–W, Y (e.g. "Q" = 160 km/h)`,
      symbol,
    );
  }
  return kmh;
}

/**
 * True when `symbol` is a speed symbol of the table.
 *
 * @example
 * isSpeedSymbol("V"); // true
 * isSpeedSymbol("I"); // false
 */
export function isSpeedSymbol(symbol: string): boolean {
  return Object.prototype.hasOwnProperty.call(SPEED_SYMBOL_KMH, symbol.toUpperCase());
}
