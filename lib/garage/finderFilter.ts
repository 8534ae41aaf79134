import type { FitmentCandidate } from "@/lib/fitment";

/**
 * True when the finder's filter text names the fit's tire size (any part, any case) or its wheel
 * as rim diameter x width ("17x9"). Empty text keeps every fit.
 *
 * @example
 * matchesFinderFilter(fit, "35x");  // a 35x12.50R17LT tire
 * matchesFinderFilter(fit, "17x9"); // a 17x9 wheel
 */
export function matchesFinderFilter(fit: Pick<FitmentCandidate, "tire" | "wheel">, text: string): boolean {
  const wanted = text.trim().toLowerCase();
  if (!wanted) return true;
  return fit.tire.text.toLowerCase().includes(wanted) || `${fit.wheel.diameterIn}x${fit.wheel.widthIn}`.includes(wanted);
}
