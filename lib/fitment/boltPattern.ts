/**
 * Bolt patterns: bolt count × pitch circle diameter (PCD).
 *
 * Inch PCDs convert exactly (1 in = 25.4 mm, NIST SP 811): 5x4.5 ≡ 5x114.3, 5x5.5 ≡ 5x139.7,
 * 6x5.5 ≡ 6x139.7, 8x6.5 ≡ 8x165.1. A PCD number below 30 without a unit is read as inches,
 * 30 or more as millimetres (no road vehicle PCD is under 30 mm or over 30 in).
 */
import { FitmentInputError } from "./errors";
import { MM_PER_IN } from "./units";

/** A parsed bolt pattern. */
export interface BoltPattern {
  boltCount: number;
  /** Same as `boltCount`. */
  count: number;
  pcdMm: number;
  pcdIn: number;
  /** Normalized text in the unit it was given, e.g. `5x4.5` or `5x114.3`. */
  text: string;
  /** Unit the PCD was given in. */
  unit: "in" | "mm";
}

const RE = /^(\d{1,2})\s*(?:x|×|on|-|\/)\s*(\d+(?:\.\d+)?)\s*(mm|in|inch|inches|")?$/i;
const EXAMPLE = "e.g. 5x4.5, 5x114.3, 6x139.7, 8x6.5 or 5 on 5.5";

/** Default tolerance of {@link boltPatternsEquivalent}, mm. */
export const BOLT_PATTERN_TOLERANCE_MM = 0.1;

/**
 * Parses a bolt pattern.
 *
 * @example
 * parseBoltPattern("5x4.5").pcdMm;   // 114.3
 * parseBoltPattern("5 on 5.5").pcdMm; // 139.7
 * parseBoltPattern("6x139.7").pcdIn;  // 5.5
 */
export function parseBoltPattern(text: string): BoltPattern {
  if (typeof text !== "string" || text.length > 30) {
    throw new FitmentInputError("boltPattern", `bolt pattern must be short text (${EXAMPLE})`, text);
  }
  const m = RE.exec(text.trim());
  if (!m) throw new FitmentInputError("boltPattern", `${JSON.stringify(text)} is not a bolt pattern (${EXAMPLE})`, text);
  const [, countRaw, pcdRaw, unitRaw] = m;
  const boltCount = Number(countRaw);
  const value = Number(pcdRaw);
  if (boltCount < 3 || boltCount > 10) {
    throw new FitmentInputError("boltPattern", `${JSON.stringify(text)}: bolt count ${boltCount} is outside 3–10 (${EXAMPLE})`, text);
  }
  const unit: "in" | "mm" = unitRaw === undefined ? (value < 30 ? "in" : "mm") : unitRaw.toLowerCase() === "mm" ? "mm" : "in";
  const pcdMm = unit === "in" ? value * MM_PER_IN : value;
  if (pcdMm < 80 || pcdMm > 350) {
    throw new FitmentInputError(
      "boltPattern",
      `${JSON.stringify(text)}: pitch circle ${value} ${unit} is outside 80–350 mm (${EXAMPLE})`,
      text,
    );
  }
  return { boltCount, count: boltCount, pcdMm, pcdIn: pcdMm / MM_PER_IN, unit, text: `${boltCount}x${value}` };
}

/**
 * Formats a bolt pattern in inches or millimetres.
 *
 * @example
 * formatBoltPattern(parseBoltPattern("5x4.5"), "mm"); // "5x114.3"
 */
export function formatBoltPattern(pattern: BoltPattern, unit: "in" | "mm"): string {
  const v = unit === "mm" ? pattern.pcdMm : pattern.pcdIn;
  return `${pattern.boltCount}x${Number(v.toFixed(unit === "mm" ? 1 : 3))}`;
}

/**
 * Returns `pattern` when parsed, else parses it.
 *
 * @example
 * toBoltPattern("8x6.5").pcdMm; // 165.1
 */
export function toBoltPattern(pattern: string | BoltPattern): BoltPattern {
  return typeof pattern === "string" ? parseBoltPattern(pattern) : pattern;
}

/**
 * True when two bolt patterns have the same bolt count and PCDs within `toleranceMm`
 * (default 0.1 mm).
 *
 * @example
 * boltPatternsEquivalent("5x4.5", "5x114.3"); // true
 * boltPatternsEquivalent("5x4.75", "5x120");  // false (120.65 mm vs 120 mm)
 */
export function boltPatternsEquivalent(
  a: string | BoltPattern,
  b: string | BoltPattern,
  toleranceMm: number = BOLT_PATTERN_TOLERANCE_MM,
): boolean {
  const pa = toBoltPattern(a);
  const pb = toBoltPattern(b);
  if (!(toleranceMm >= 0 && toleranceMm <= 5)) {
    throw new FitmentInputError("toleranceMm", `toleranceMm must be 0–5 mm, got ${String(toleranceMm)} (e.g. 0.1)`, toleranceMm);
  }
  return pa.boltCount === pb.boltCount && Math.abs(pa.pcdMm - pb.pcdMm) <= toleranceMm + 1e-9;
}
