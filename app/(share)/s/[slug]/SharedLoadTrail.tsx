import { SetupLoadTrail } from "@/components/garage/SetupLoadTrail";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import type { SetupFigures } from "@/lib/garage/loadFigures";

/** The shared comparison's pressure to set and angle changes, from its vehicle's placard and body points. */
export function SharedLoadTrail({ figures, prefs }: { figures: SetupFigures; prefs: DisplayPrefs }) {
  return (
    <section className="rounded-card bg-white p-4 shadow-card ring-1 ring-basalt-100" data-testid="shared-load-trail">
      <p className="mb-2 text-sm text-basalt-600">From the owner&apos;s door placard, axle weights and body points for this vehicle.</p>
      <SetupLoadTrail figures={figures} missing={{ load: null, angles: null }} prefs={prefs} />
    </section>
  );
}
