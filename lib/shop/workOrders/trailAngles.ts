import { ANGLE_CAUTION, angleRows } from "@/lib/shop/customers/counterBodyPoints";
import type { FitmentSummary } from "@/lib/shop/quotes/fitment";

/** The quote's trail angles as the work order shows them (api.ts `WorkOrder.trailAngles`). */
export interface WorkOrderTrailAngles {
  /** e.g. { label: "Approach angle", change: "45.7° → 48.6°" }: now, then with the quoted tires. */
  rows: { label: string; change: string }[];
  /** Angles the quote could not work out, in words (a body point the quoted tire would reach). */
  notes: string[];
  caution: string;
}

/**
 * The trail angles a quote kept with its fitment summary (the counter measured the body points),
 * for the technician's sheet; null when the quote has none. The rows are the quote's own
 * (`angleRows`), so the sheet, the quote page and its PDF say the same.
 *
 * @example
 * trailAnglesOf({ angles: { angles: [{ kind: "approach", currentDeg: 45.7, plannedDeg: 48.6 }], messages: [] } })?.rows;
 * // [{ label: "Approach angle", change: "45.7° → 48.6°" }]
 */
export function trailAnglesOf(fitment: unknown): WorkOrderTrailAngles | null {
  const a = (fitment as Pick<FitmentSummary, "angles"> | null)?.angles;
  if (!a || (a.angles.length === 0 && a.messages.length === 0)) return null;
  return { rows: angleRows(a).map(([label, change]) => ({ label, change })), notes: a.messages, caution: ANGLE_CAUTION };
}
