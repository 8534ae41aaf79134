"use client";
import { useMemo } from "react";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { SetupLoadTrail } from "@/components/garage/SetupLoadTrail";
import { missingText, setupFigures } from "@/lib/garage/loadFigures";
import type { LoadProfile } from "@/lib/garage/loadProfile";
import type { Vehicle } from "@/lib/garage/types";
import type { Setup } from "@/lib/setup/model";

/** The vehicle page's pressure to set and angle changes for the planned setup typed in (profile: the vehicle's stored one). */
export function PlannedLoadTrail({
  vehicle,
  planned,
  profile,
  toggle = false,
}: {
  vehicle: Vehicle;
  planned: Setup;
  profile: LoadProfile | null;
  /** Show the unit switch here (a page has one: two radio groups of one name would fight). */
  toggle?: boolean;
}) {
  const [prefs, setPrefs] = useDisplayPrefs();
  const figures = useMemo(
    () => (profile ? setupFigures(profile, vehicle.currentSetup, planned, prefs.units) : null),
    [profile, vehicle.currentSetup, planned, prefs.units],
  );
  return (
    <div className="flex flex-col gap-2 border-t border-basalt-100 pt-3">
      {toggle && <DisplayToggle prefs={prefs} onChange={setPrefs} />}
      <SetupLoadTrail figures={figures} missing={missingText(profile)} prefs={prefs} />
    </div>
  );
}
