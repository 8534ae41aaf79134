/**
 * The garage's links into the comparison workspace: a vehicle's current setup against a
 * candidate, with the vehicle's figures and the vehicle itself, so the workspace shows that
 * vehicle's predicted clearances. Setups travel in lib/setup's codec (lib/setup/url.ts).
 */
import { DEFAULT_VEHICLE } from "@/lib/comparisons/model";
import { workspaceUrl } from "@/lib/comparisons/url";
import type { Setup } from "@/lib/setup/model";

/**
 * The workspace link comparing a vehicle's current setup with a candidate, with the vehicle's
 * figures (KPI, axle ratio, top-gear ratio) when set and the vehicle itself when its id is given.
 *
 * @example
 * vehicleWorkspaceUrl(current, planned, { id: "…", kingpinInclinationDeg: 8, axleRatio: 4.1, transmissionRatio: null });
 * // "/workspace?ct=265/70R17&cd=17&cw=8&co=25&pt=…&kpi=8&axle=4.1&v=…"
 */
export function vehicleWorkspaceUrl(
  current: Setup,
  planned: Setup,
  vehicle: { id?: string; kingpinInclinationDeg: number | null; axleRatio: number | null; transmissionRatio: number | null },
): string {
  return workspaceUrl({
    input: {
      current,
      planned,
      vehicle: {
        ...DEFAULT_VEHICLE,
        kingpinInclinationDeg: vehicle.kingpinInclinationDeg,
        axleRatio: vehicle.axleRatio ?? DEFAULT_VEHICLE.axleRatio,
        transmissionRatio: vehicle.transmissionRatio ?? DEFAULT_VEHICLE.transmissionRatio,
      },
    },
    vehicleId: vehicle.id,
  });
}
