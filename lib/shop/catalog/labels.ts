/** The catalog's vocabulary as the counter reads it: service types and the units they are priced in. */
import type { ServiceType, ServiceUnit } from "@/lib/platform/db/types";

export const SERVICE_LABEL: Record<ServiceType, string> = {
  mount_balance: "Mount & balance",
  beadlock_assembly: "Beadlock assembly",
  valve_stem: "Valve stems",
  tpms: "TPMS",
  alignment: "Alignment",
  fender_trim: "Fender trimming",
  disposal: "Disposal",
  other: "Other",
};

export const UNIT_LABEL: Record<ServiceUnit, string> = { per_wheel: "per wheel", per_vehicle: "per vehicle", per_hour: "per hour" };
