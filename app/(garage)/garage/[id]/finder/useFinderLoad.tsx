"use client";
import { useMemo } from "react";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { PRESSURE_CAUTION } from "@/lib/comparisons/pressureText";
import { missingText } from "@/lib/garage/loadFigures";
import type { Vehicle } from "@/lib/garage/types";
import { useLoadProfile } from "../useLoadProfile";
import { loadColumns } from "./loadColumns";

/** The finder's pressure and angle columns for this vehicle, in the reader's units, and the note under the table (with the unit switch). */
export function useFinderLoad(vehicle: Vehicle) {
  const [prefs, setPrefs] = useDisplayPrefs();
  const profile = useLoadProfile(vehicle.id).data?.profile ?? null;
  const columns = useMemo(() => loadColumns(profile, vehicle, prefs), [profile, vehicle, prefs]);
  const missing = missingText(profile);
  const note = (
    <div className="flex flex-col gap-1 text-sm" data-testid="finder-load-note">
      {columns.length > 0 && <DisplayToggle prefs={prefs} onChange={setPrefs} />}
      {columns.some((c) => c.id === "pressure") && <p className="rounded-lg bg-tight-100 px-3 py-2 text-tight-800">{PRESSURE_CAUTION}</p>}
      {columns.some((c) => c.id === "loadIndex") && (
        <p className="text-basalt-700">
          The finder&apos;s sizes come from a list and name no load index, so no pressure can be computed for them.{" "}
          <strong>Load index needed</strong> is the least load index a tire of that size must show on its sidewall to carry this
          vehicle&apos;s load at its maximum pressure. Open a fit on the vehicle page and type its full size from the sidewall (e.g.
          35x12.50R17LT 121Q LRE) to see the pressure to set.
        </p>
      )}
      {[missing.load, missing.angles].filter(Boolean).map((m) => (
        <p key={m} className="text-basalt-600">
          {m}
        </p>
      ))}
    </div>
  );
  return { columns, note };
}
