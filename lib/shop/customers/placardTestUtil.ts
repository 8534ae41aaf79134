/**
 * Test helper (counterPlacard, the quote cautions' tests): the invented counter truck's door placard,
 * 265/70R17 113T at 35 psi front and rear, weighed on a scale (3150 lb front, 2650 lb rear).
 * @example quotePressure(COUNTER_PLACARD, current, { ...planned, tire: "285/70R17 117T" });
 */
import { lbToKg, psiToKpa } from "@/lib/fitment";
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
