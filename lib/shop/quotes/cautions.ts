import { diameterChange } from "@/lib/comparisons/assess/assessChange";
import { tirePressureLimits } from "@/lib/shop/workOrders/pressureLimit";
import { pressureWords } from "@/lib/shop/workOrders/signedText";
import { pressureToSetText } from "@/lib/shop/customers/counterPlacard";
import { ANGLE_CAUTION } from "@/lib/shop/customers/counterBodyPoints";
import type { FitmentSummary } from "./fitment";

/**
 * The cold-pressure caution: with the door placard the counter took, the pressure to set per axle;
 * without it, no pressure to set, only the quoted tire's limits (the engine's) when the size says them.
 */
function pressureCaution(tire: string, pressure: FitmentSummary["pressure"]): string {
  // With the placard (and axle loads) the counter took, the pressure to set itself.
  if (pressure && !("missing" in pressure)) return pressureToSetText(pressure);
  const l = tirePressureLimits(tire);
  const bounds = l
    ? ` ${l.tire} allows at most ${pressureWords(l.maxKpa, "psi")}; road minimum ${pressureWords(l.minimumKpa, "psi")}.`
    : "";
  const missing = pressure ? ` ${pressure.missing}` : "";
  return `Cold pressure: set it for the vehicle's axle loads from the door placard and the tire maker's load table (a bigger or different tire carries the same load at another pressure), not from the sidewall figure.${bounds} Never inflate above the maximum on the sidewall or the wheel.${missing}`;
}

/**
 * The cautions every quote carries (printed on the PDF and shown on the quote pages). They point
 * to the makers and licensed practice; Hubface gives no torque figure of its own, and for pressure
 * only the quoted tire's limits.
 */
export function quoteCautions(fit: Pick<FitmentSummary, "planned" | "diameterChangeMm" | "pressure" | "angles">): string[] {
  const out = [
    "Bead seating: inflate only in a restraining cage with a clip-on chuck and remote gauge, standing clear of the assembly; never exceed the tire maker's maximum bead-seating pressure.",
    "Wheel fasteners: tighten in a crisscross order to the vehicle maker's torque figure and re-check the torque after the first 50 to 100 miles (80 to 160 km).",
    pressureCaution(fit.planned.tire, fit.pressure),
  ];
  if (fit.planned.beadlock) {
    out.push(
      "Beadlock rings: tighten the ring bolts in stages in a crisscross order to the wheel maker's figure and re-check them regularly; follow the maker's assembly instructions and local rules on beadlock use on public roads.",
    );
  }
  // From the stored figure, so quotes kept before their findings were stored get it too.
  if (diameterChange(fit.diameterChangeMm) !== null) {
    out.push(
      "Lift and steering changes must be done to the lift maker's instructions and local vehicle codes; check brake lines, steering stops and clearance at full lock and full compression.",
    );
  }
  if (fit.angles) out.push([ANGLE_CAUTION, ...fit.angles.messages].join(" "));
  out.push(
    "All figures are computed from nominal sizes; actual tire dimensions vary by maker and model. The makers' data and a licensed technician's judgement take precedence.",
  );
  return out;
}
