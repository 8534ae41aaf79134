/**
 * Test helper (lib/garage's tests and the garage-load integration test): the invented demo truck's
 * load profile, on its placard size, 35 psi cold, weighed on a scale, body points measured.
 * @example checkLoadProfile({ ...DEMO_PROFILE, frontAxleKg: 2200 }, DEMO_CURRENT);
 */
import { lbToKg, psiToKpa } from "@/lib/fitment";
import { type LoadProfile, emptyProfile } from "./loadProfile";

// 265/70R17: 2 × 265 × 0.70 + 17 × 25.4 = 802.8 mm across (ISO 4000-1 designation arithmetic).
export const DEMO_CURRENT = { text: "265/70R17 113T", diameterMm: 802.8 };
export const DEMO_PROFILE: LoadProfile = {
  ...emptyProfile("imperial"),
  placardTire: "265/70R17 113T",
  placardFrontKpa: psiToKpa(35),
  placardRearKpa: psiToKpa(35),
  frontGawrKg: lbToKg(3700),
  rearGawrKg: lbToKg(3900),
  frontAxleKg: lbToKg(3150),
  rearAxleKg: lbToKg(2650),
  frontCornerHeightMm: 635,
  frontCornerAheadMm: 840,
  rearCornerHeightMm: 686,
  rearCornerBehindMm: 1120,
  midHeightMm: 267,
  wheelbaseMm: 2896,
};
