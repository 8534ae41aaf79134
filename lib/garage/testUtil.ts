/**
 * Test helper (used by lib/garage's tests and the garage components' tests): a current and a
 * planned setup, a vehicle builder with the invented vehicles the tests use, and a measured point.
 * @example point("rail", "inboard", 40); // 40 mm of room inboard at ride height
 * @example vehicleWith({ frontSuspension: "independent" }); // the test rig on an independent front
 */
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import type { Setup } from "@/lib/setup/model";
import type { Vehicle, VehicleClearance, VehicleDetail } from "./types";

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

/** Every field of a vehicle filled in, so a test spells out only what it is about. */
export const vehicleWith = (fields: Partial<Vehicle>): Vehicle => ({
  id: "v1",
  name: "Test rig",
  year: null,
  make: null,
  model: null,
  trim: null,
  frontSuspension: "solid-axle",
  boltPattern: "6x5.5",
  hubBoreMm: null,
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
  ...fields,
});

export const VEHICLE: Vehicle = vehicleWith({ year: 2010, hubBoreMm: 108 });

/** The component tests' invented truck, on the workspace's default current setup. */
export const HAULER: Vehicle = vehicleWith({
  name: "Quarry hauler",
  boltPattern: "6x139.7",
  stockSetup: DEFAULT_INPUT.current,
  currentSetup: DEFAULT_INPUT.current,
  createdAt: "2026-01-01T00:00:00.000Z",
  updatedAt: "2026-01-01T00:00:00.000Z",
});

/** A vehicle page's data: the vehicle, its measured points, no photos. */
export const detailOf = (vehicle: Vehicle, clearances: VehicleClearance[] = []): VehicleDetail => ({ vehicle, clearances, photos: [] });

export const point = (
  id: string,
  direction: VehicleClearance["direction"],
  distanceMm: number,
  fields: Partial<VehicleClearance> = {},
): VehicleClearance => ({
  id,
  label: id,
  direction,
  distanceMm,
  distanceText: `${distanceMm} mm`,
  suspensionState: "ride-height",
  measuredSetup: CUR,
  createdAt: "",
  ...fields,
});
