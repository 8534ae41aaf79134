"use client";
import { useMemo } from "react";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { Card } from "@/components/ui/Card";
import type { Vehicle } from "@/lib/garage/types";
import { setupGeometry } from "@/lib/fitment";
import { toEngineSetup } from "@/lib/setup/model";
import { BodyPointsDrawing } from "@/components/garage/BodyPointsDrawing";
import { LoadProfileForm } from "./LoadProfileForm";
import { useLoadProfile } from "./useLoadProfile";

/** Placard, scale weights and body points of a garage vehicle, with the drawing of where to measure. */
export function LoadProfileCard({ vehicle }: { vehicle: Vehicle }) {
  const [prefs, setPrefs] = useDisplayPrefs();
  const q = useLoadProfile(vehicle.id);
  const current = useMemo(
    () => ({ text: vehicle.currentSetup.tire, diameterMm: setupGeometry(toEngineSetup(vehicle.currentSetup)).overallDiameterMm }),
    [vehicle.currentSetup],
  );
  return (
    <Card>
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 className="text-lg font-semibold">Placard, axle weights and body points</h2>
          <p className="mt-1 max-w-prose text-sm text-basalt-600">
            With these, a planned setup shows the cold pressure to set and how the approach, departure and breakover angles change. The
            vehicle&apos;s placard and the tire maker&apos;s load tables take precedence over any figure here; never inflate above the
            pressure on the sidewall or the wheel.
          </p>
        </div>
        <DisplayToggle prefs={prefs} onChange={setPrefs} />
      </div>
      <div className="mt-4 grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,1.4fr)_minmax(0,1fr)]">
        {q.isPending ? (
          <p className="text-sm text-basalt-600">Loading…</p>
        ) : q.isError ? (
          <p className="text-sm text-contact-700">The stored figures could not be read: {(q.error as Error).message}</p>
        ) : (
          <LoadProfileForm vehicleId={vehicle.id} profile={q.data.profile} current={current} prefs={prefs} />
        )}
        <BodyPointsDrawing />
      </div>
    </Card>
  );
}
