/**
 * Test helper (counterPlacard, counterBodyPoints, the quote cautions' and integration tests): the invented counter truck's door placard,
 * 265/70R17 113T at 35 psi front and rear, weighed on a scale (3150 lb front, 2650 lb rear), and its body points.
 * @example quotePressure(COUNTER_PLACARD, current, { ...planned, tire: "285/70R17 117T" });
 */
import { lbToKg, psiToKpa } from "@/lib/fitment";
import type { CounterBodyPoints } from "./counterBodyPoints";
import type { CounterPlacard } from "./counterPlacard";

export const COUNTER_PLACARD: CounterPlacard = {
  units: "imperial",
  vehicleKind: "light-truck",
  placardTire: "265/70R17 113T",
  placardFrontKpa: psiToKpa(35),
  placardRearKpa: psiToKpa(35),
  frontGawrKg: null,
  rearGawrKg: null,
  frontAxleKg: lbToKg(3150),
  rearAxleKg: lbToKg(2650),
};

/** Its body points, measured in mm with its 265/70R17 tires (802.8 mm). */
export const COUNTER_BODY_POINTS: CounterBodyPoints = {
  units: "metric",
  frontCornerHeightMm: 750,
  frontCornerAheadMm: 900,
  rearCornerHeightMm: 800,
  rearCornerBehindMm: 1100,
  midHeightMm: 420,
  wheelbaseMm: 3570,
};
