/**
 * Words for the finder's exclusions: which limit decided, and what it needs. The figures come
 * from the engine's result (lib/fitment/finder.ts); this only says them.
 */
import type { ExclusionReason, FitmentExclusion } from "@/lib/fitment";
import { bothUnits } from "@/lib/garage/format";
import { SUSPENSION_STATE_LABEL } from "@/lib/garage/labels";

/** "Bumper corner" → "bumper corner"; an abbreviation ("UCA …") keeps its capitals. */
function lowerFirst(label: string): string {
  return label.length > 1 && label[1] === label[1]!.toLowerCase() ? label[0]!.toLowerCase() + label.slice(1) : label;
}

/** The deciding limit in a few words, e.g. "touches bumper corner (measured at full lock) — needs 10.2 mm (13/32 in) more". */
export function reasonText(r: ExclusionReason, len: (mm: number) => string = bothUnits): string {
  switch (r.kind) {
    case "clearance": {
      const what = r.label ? lowerFirst(r.label) : `the ${r.direction === "fore-aft" ? "fore/aft" : r.direction} point`;
      const verb = r.status === "contact" ? "touches" : "comes closer than the margin to";
      return `${verb} ${what} (measured at ${SUSPENSION_STATE_LABEL[r.state].toLowerCase()}) — needs ${len(r.shortfallMm)} more`;
    }
    case "outer-swing":
      return `reaches ${len(r.valueMm)} outboard of the hub face, ${len(r.shortfallMm)} more poke than allowed`;
    case "inner-swing":
      return `reaches ${len(r.valueMm)} inboard of the hub face, ${len(r.shortfallMm)} past the inner limit`;
  }
}

/**
 * The whole line for an excluded combination.
 *
 * @example
 * exclusionText(x); // "Excluded: touches frame rail, full left lock (measured at full lock) — needs 36 mm (1-7/16 in) more; 4 other limits fail too."
 */
export function exclusionText(x: Pick<FitmentExclusion, "reason" | "limitsFailed">, len: (mm: number) => string = bothUnits): string {
  const others = x.limitsFailed - 1;
  const tail = others <= 0 ? "." : `; ${others} other limit${others === 1 ? " fails" : "s fail"} too.`;
  return `Excluded: ${reasonText(x.reason, len)}${tail}`;
}
