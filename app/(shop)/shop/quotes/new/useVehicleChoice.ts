import { useState } from "react";
import type { CounterVehicle } from "@/lib/shop/customers/schema";
import { vehicleRequest } from "./vehicleRequest";

/**
 * The new quote's vehicle as the counter chose it: the saved vehicle picked (if any), whether it
 * was changed on the screen, whether to save it, and the vehicle the fits were found for.
 * `step` is what VehicleStep reads and sets; `request()` is the vehicle part of the quote's request.
 *
 * @example
 * const choice = useVehicleChoice();
 * <VehicleStep customerId={id} {...choice.step} onCandidates={(v) => choice.setVehicle(v)} />
 */
export function useVehicleChoice() {
  const [savedVehicle, setSavedVehicle] = useState<string | null>(null);
  const [edited, setEdited] = useState(false);
  const [saveVehicle, setSaveVehicle] = useState(true);
  const [vehicle, setVehicle] = useState<CounterVehicle | null>(null);
  return {
    vehicle,
    setVehicle,
    /** Another customer was picked: none of their saved vehicles is chosen yet. */
    forgetSaved: () => setSavedVehicle(null),
    step: { savedVehicle, onSaved: setSavedVehicle, edited, onEdited: setEdited, saveVehicle, onSaveVehicle: setSaveVehicle },
    request: () => vehicleRequest({ savedVehicle, edited, vehicle, saveVehicle }),
  };
}
