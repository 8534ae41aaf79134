/**
 * Catalog search by either spelling of a bolt pattern: 6x139.7 finds wheels stored as 6x5.5 and
 * back. The catalog keeps each pattern as it was imported (the engine's text, in the unit given),
 * so the shop's distinct stored patterns are compared with the query by the engine.
 */
import { FitmentInputError, boltPatternsEquivalent, parseBoltPattern } from "@/lib/fitment";

/**
 * The engine's reading of a search text as a bolt pattern, or null when it is not one (a SKU, a
 * tire size such as 37x12.50: 37 bolts is outside 3–10).
 *
 * @example
 * boltPatternQuery("6 × 139.7")?.pcdMm; // 139.7
 * boltPatternQuery("37x12.50");         // null
 */
export function boltPatternQuery(q: string) {
  try {
    return parseBoltPattern(q.trim());
  } catch (e) {
    if (e instanceof FitmentInputError) return null;
    throw e;
  }
}

/**
 * Which of the stored patterns are the same pattern as the query (same bolt count, pitch circles
 * within the engine's 0.1 mm). Stored texts the engine cannot read are left out.
 *
 * @example
 * equivalentBoltPatterns("6x139.7", ["6x5.5", "6x135", "5x139.7"]); // ["6x5.5"]
 */
export function equivalentBoltPatterns(q: string, stored: readonly string[]): string[] {
  const wanted = boltPatternQuery(q);
  if (!wanted) return [];
  return stored.filter((s) => {
    const p = boltPatternQuery(s);
    return p !== null && boltPatternsEquivalent(wanted, p);
  });
}
