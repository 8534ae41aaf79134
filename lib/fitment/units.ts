/**
 * Unit conversions at the edges of the engine. Everything inside is SI (mm, kPa, N·m, kg).
 *
 * The factors are the definitions of the international yard and pound (1959) and standard
 * gravity, as NIST SP 811 (2008) appendix B.8 gives them: 1 in = 25.4 mm, 1 lb = 0.45359237 kg
 * and g_n = 9.80665 m/s², all exact; the psi (lbf/in²) and the ft·lbf follow from them. The
 * engine does not go through convert-units: its 2.3.4 anchors are rounded (1 m = 3.28084 ft gives
 * 25.3999992 mm per inch, which would break exact equivalences such as 4.5 in = 114.3 mm), and it
 * bundles every measure it knows (≈ 16 kB gzip) into each page that uses the engine. The
 * converter page converts pressures through convert-units (lib/fitment/pressure.ts), and the
 * tests hold these factors against both NIST and convert-units.
 */

/** Millimetres per inch, exact by definition (NIST SP 811 B.8). */
export const MM_PER_IN = 25.4;
/** Millimetres per mile (exact: 63 360 in × 25.4 mm). */
export const MM_PER_MILE = 1_609_344;
/** Kilometres per mile (exact). */
export const KM_PER_MILE = 1.609344;
/** Standard acceleration of gravity, m/s² (exact, NIST SP 811). */
export const STANDARD_GRAVITY = 9.80665;

/** Kilograms per pound (exact, NIST SP 811 B.8). */
export const KG_PER_LB = 0.45359237;

/** kPa per psi: one pound-force on a square inch (≈ 6.894757). */
const PSI_TO_KPA = (KG_PER_LB * STANDARD_GRAVITY) / (MM_PER_IN / 1000) ** 2 / 1000;
/** N·m per ft·lbf: one pound-force on a foot of 0.3048 m (≈ 1.355818). */
const FTLB_TO_NM = 0.3048 * KG_PER_LB * STANDARD_GRAVITY;

/**
 * Inches to millimetres (exact).
 * @example inToMm(4.5); // 114.3
 */
export function inToMm(inches: number): number {
  return inches * MM_PER_IN;
}

/**
 * Millimetres to inches (exact).
 * @example mmToIn(114.3); // 4.5
 */
export function mmToIn(mm: number): number {
  return mm / MM_PER_IN;
}

/**
 * psi to kPa.
 * @example psiToKpa(1); // ≈ 6.894757
 */
export function psiToKpa(psi: number): number {
  return psi * PSI_TO_KPA;
}

/**
 * kPa to psi.
 * @example kpaToPsi(344.738); // ≈ 50
 */
export function kpaToPsi(kpa: number): number {
  return kpa / PSI_TO_KPA;
}

/**
 * Foot-pounds (ft·lbf) to newton-metres.
 * @example ftLbToNm(100); // ≈ 135.58
 */
export function ftLbToNm(ftLb: number): number {
  return ftLb * FTLB_TO_NM;
}

/**
 * Newton-metres to foot-pounds (ft·lbf).
 * @example nmToFtLb(135.58); // ≈ 100
 */
export function nmToFtLb(nm: number): number {
  return nm / FTLB_TO_NM;
}

/**
 * Kilograms to pounds (exact definition).
 * @example kgToLb(0.45359237); // 1
 */
export function kgToLb(kg: number): number {
  return kg / KG_PER_LB;
}

/**
 * Pounds to kilograms (exact definition).
 * @example lbToKg(1000); // 453.59237
 */
export function lbToKg(lb: number): number {
  return lb * KG_PER_LB;
}
