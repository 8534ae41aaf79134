import "server-only";
import { FitmentInputError } from "@/lib/fitment";
import { type SetupFigures, setupFigures } from "@/lib/garage/loadFigures";
import { loadQueries } from "@/lib/garage/loadQueries";
import type { Setup } from "@/lib/setup/model";

/**
 * The pressure to set and the angle changes for a shared comparison whose vehicle keeps a load
 * profile: computed here, so only these figures reach the public page (never the placard or the
 * body points themselves). Null when there is no such vehicle or nothing to show. Body points are
 * measured with the vehicle's current tires, so that setup is the base of the angles.
 */
export async function sharedLoadTrail(slug: string, planned: Setup): Promise<SetupFigures | null> {
  const found = await loadQueries.sharedVehicleLoad(slug);
  if (!found) return null;
  try {
    const f = setupFigures(found.profile, found.currentSetup, planned, "imperial");
    return f.load || f.angles.length > 0 ? f : null;
  } catch (e) {
    // A stored current setup the engine no longer reads: the page shows the rest without these figures.
    if (e instanceof FitmentInputError) return null;
    throw e;
  }
}
