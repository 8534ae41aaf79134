/**
 * Unit conversions at the edges of the engine. Everything inside is SI (mm, kPa, N·m).
 *
 * - Length: the inch is defined as exactly 25.4 mm (NIST SP 811, appendix B.8; international
 *   yard and pound, 1959). convert-units 2.3.4 derives the inch through a rounded metre/foot
 *   anchor (1 m = 3.28084 ft) and returns 25.3999992 mm, which would break exact inch-metric
 *   equivalences such as 4.5 in = 114.3 mm; lengths therefore use the exact definition.
 * - Pressure (psi ⇄ kPa ⇄ bar): through convert-units (its psi factor 6.89476 kPa agrees with
 *   NIST SP 811's 6.894757 kPa to 5e-7 relative).
 * - Torque (ft·lbf ⇄ N·m): convert-units 2.3 has no torque measure, so 1 ft·lbf is built from
 *   convert-units' foot (m) × pound (kg) × standard gravity g_n = 9.80665 m/s² (exact, NIST SP 811);
 *   agrees with NIST's 1.355818 N·m to 1e-6 relative.
 */
import convert from "convert-units";

/** Millimetres per inch, exact by definition (NIST SP 811 B.8). */
export const MM_PER_IN = 25.4;
/** Millimetres per mile (exact: 63 360 in × 25.4 mm). */
export const MM_PER_MILE = 1_609_344;
/** Kilometres per mile (exact). */
export const KM_PER_MILE = 1.609344;
/** Standard acceleration of gravity, m/s² (exact, NIST SP 811). */
export const STANDARD_GRAVITY = 9.80665;

/** Pressure units accepted by {@link convertPressure}. */
export type PressureUnit = "psi" | "kPa" | "bar";

const PSI_TO_KPA = convert(1).from("psi").to("kPa");
const FTLB_TO_NM = convert(1).from("ft").to("m") * convert(1).from("lb").to("kg") * STANDARD_GRAVITY;

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
 * Converts a pressure between psi, kPa and bar through convert-units.
 * @example convertPressure(50, "psi", "kPa"); // ≈ 344.7
 */
export function convertPressure(value: number, from: PressureUnit, to: PressureUnit): number {
  if (from === to) return value;
  return convert(value).from(from).to(to);
}

/**
 * psi to kPa.
 * @example psiToKpa(1); // ≈ 6.89476
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
