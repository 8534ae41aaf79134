/** A finder combination as a setup the vehicle page and the workspace open (offset given, no spacer). */
import type { FitmentCandidate } from "@/lib/fitment";
import type { Setup } from "@/lib/setup/model";

export function candidateSetup(m: Pick<FitmentCandidate, "tire" | "wheel">): Setup {
  return {
    tire: m.tire.text,
    wheelDiameterIn: m.wheel.diameterIn,
    wheelWidthIn: m.wheel.widthIn,
    position: { mode: "offset", offsetMm: m.wheel.offsetMm },
    spacerMm: 0,
  };
}
