import type { CounterVehicle } from "@/lib/shop/customers/schema";

/**
 * The vehicle part of a new quote's request: a saved vehicle as stored (its id), a saved vehicle
 * changed on the screen (its id and the changed vehicle; ticked, the changes are written over it),
 * or a typed vehicle (saved to the customer when ticked).
 *
 * @example
 * vehicleRequest({ savedVehicle: "v1", edited: true, vehicle, saveVehicle: true }); // { vehicleId: "v1", vehicle, saveVehicle: true }
 */
export function vehicleRequest(s: { savedVehicle: string | null; edited: boolean; vehicle: CounterVehicle | null; saveVehicle: boolean }) {
  if (s.savedVehicle && !s.edited) return { vehicleId: s.savedVehicle };
  return { ...(s.savedVehicle ? { vehicleId: s.savedVehicle } : {}), vehicle: s.vehicle, saveVehicle: s.saveVehicle };
}
