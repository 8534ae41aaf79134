/** What the garage API returns (camelCase, ISO dates); shared by server and client. */
import type { ClearanceDirection, SuspensionState } from "@/lib/fitment";
import type { FrontSuspension } from "@/lib/platform/db/types";
import type { Setup } from "@/lib/setup/model";

export interface Vehicle {
  id: string;
  name: string;
  year: number | null;
  make: string | null;
  model: string | null;
  trim: string | null;
  frontSuspension: FrontSuspension;
  boltPattern: string;
  hubBoreMm: number | null;
  stockSetup: Setup;
  currentSetup: Setup;
  liftHeightMm: number | null;
  kingpinInclinationDeg: number | null;
  axleRatio: number | null;
  transmissionRatio: number | null;
  /** The margin predictions are classed against, mm. */
  clearanceMarginMm: number;
  notes: string;
  createdAt: string;
  updatedAt: string;
}

export interface VehicleClearance {
  id: string;
  label: string;
  direction: ClearanceDirection;
  distanceMm: number;
  distanceText: string;
  suspensionState: SuspensionState;
  measuredSetup: Setup;
  createdAt: string;
}

export interface VehiclePhoto {
  id: string;
  clearanceId: string | null;
  contentType: string;
  width: number;
  height: number;
  bytes: number;
  name: string;
  url: string;
  thumbUrl: string;
  createdAt: string;
}

export interface VehicleDetail {
  vehicle: Vehicle;
  clearances: VehicleClearance[];
  photos: VehiclePhoto[];
}

/** A vehicle as the workspace's garage panel needs it: the figures and the measured points. */
export interface WorkspaceVehicle {
  id: string;
  name: string;
  currentSetup: Setup;
  kingpinInclinationDeg: number | null;
  axleRatio: number | null;
  transmissionRatio: number | null;
  clearanceMarginMm: number;
  clearances: Pick<VehicleClearance, "id" | "label" | "direction" | "distanceMm" | "suspensionState" | "measuredSetup">[];
}
