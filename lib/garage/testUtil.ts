/**
 * Test helper (used by lib/garage's tests only): a current and a planned setup, a vehicle on the
 * current one, and a measured point.
 * @example point("rail", "inboard", 40); // 40 mm of room inboard at ride height
 */
import type { Setup } from "@/lib/setup/model";
import type { Vehicle, VehicleClearance } from "./types";

export const CUR: Setup = {
  tire: "265/70R17",
  wheelDiameterIn: 17,
  wheelWidthIn: 8,
  position: { mode: "offset", offsetMm: 25 },
  spacerMm: 0,
};
export const PLAN: Setup = {
  tire: "35x12.50R17LT",
  wheelDiameterIn: 17,
  wheelWidthIn: 9,
  position: { mode: "offset", offsetMm: -12 },
  spacerMm: 0,
};

export const VEHICLE: Vehicle = {
  id: "v1",
  name: "Test rig",
  year: 2010,
  make: null,
  model: null,
  trim: null,
  frontSuspension: "solid-axle",
  boltPattern: "6x5.5",
  hubBoreMm: 108,
  stockSetup: CUR,
  currentSetup: CUR,
  liftHeightMm: null,
  kingpinInclinationDeg: null,
  axleRatio: 3.73,
  transmissionRatio: 1,
  clearanceMarginMm: 12.7,
  notes: "",
  createdAt: "",
  updatedAt: "",
};
export const point = (id: string, direction: VehicleClearance["direction"], distanceMm: number): VehicleClearance => ({
  id,
  label: id,
  direction,
  distanceMm,
  distanceText: `${distanceMm} mm`,
  suspensionState: "ride-height",
  measuredSetup: CUR,
  createdAt: "",
});
