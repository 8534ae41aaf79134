/**
 * Test helper (the load plan's, the load chart's and its axis's tests): the load panel's labels in
 * inch units and the invented truck the tests load, on a P-metric placard size at 35 psi with a
 * 37 in flotation tire planned.
 * @example planLoad({ ...LOAD_BASE, rearAxleKg: 2800 }, LOAD_LABELS, { units: "imperial", lengths: "decimal" });
 */
import { psiToKpa } from "@/lib/fitment";
import type { LoadLabels, LoadPlanInput } from "./loadPlan";

export const LOAD_LABELS: LoadLabels = {
  placardTire: "Placard tire size",
  placardFront: "Placard pressure, front (psi)",
  placardRear: "Placard pressure, rear (psi)",
  frontAxle: "Front axle load (lb)",
  rearAxle: "Rear axle load (lb)",
  plannedTire: "Planned tire",
  plannedMaxLoad: "Planned tire's maximum load, sidewall (lb, optional)",
  plannedMaxPressure: "Planned tire's maximum pressure, sidewall (psi, optional)",
};

export const LOAD_BASE: LoadPlanInput = {
  placardTire: "P265/70R17 113S",
  plannedTire: "37x12.50R17LT 124Q LRD",
  vehicle: "light-truck",
  placardFrontKpa: psiToKpa(35),
  placardRearKpa: psiToKpa(35),
  frontAxleKg: 1400,
  rearAxleKg: 1200,
};
