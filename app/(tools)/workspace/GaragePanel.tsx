"use client";
import Link from "next/link";
import { useEffect, useMemo } from "react";
import type { DrawnLimits } from "@/components/comparison/CrossSection";
import { drawnParts } from "@/components/comparison/crossSection/garageParts";
import { PredictionTable } from "@/components/garage/PredictionTable";
import { Button } from "@/components/ui/Button";
import { SelectOptions } from "@/components/ui/SelectOptions";
import { type DisplayPrefs, formatLen } from "@/lib/comparisons/format";
import type { Setup } from "@/lib/setup/model";
import { setupQuery } from "@/lib/setup/url";
import { measuredLimits, predictPoints, steeringAxisOf } from "@/lib/garage/predict";
import type { WorkspaceVehicle } from "@/lib/garage/types";

/**
 * The signed-in member's garage inside the workspace: pick a vehicle and every measured point
 * is predicted for the planned setup here (each against the setup it was measured with), and
 * its inner limit, fender lip and measured points (with their predicted status) are drawn on
 * the cross-section.
 */
export default function GaragePanel({
  vehicles,
  vehicleId,
  planned,
  prefs,
  onPick,
  onLimits,
  onUseVehicle,
}: {
  vehicles: WorkspaceVehicle[];
  vehicleId: string | null;
  planned: Setup;
  prefs: DisplayPrefs;
  onPick: (id: string | null) => void;
  onLimits: (limits: DrawnLimits | null) => void;
  onUseVehicle: (v: WorkspaceVehicle) => void;
}) {
  const vehicle = vehicles.find((v) => v.id === vehicleId) ?? null;
  const view = useMemo(() => {
    if (!vehicle) return null;
    // The vehicle places the steering axis (its kingpin inclination), as on the vehicle page.
    const predictions = predictPoints(vehicle.clearances, planned, vehicle.clearanceMarginMm, vehicle);
    const limits = measuredLimits(vehicle.clearances);
    return { predictions, limits, axis: steeringAxisOf(vehicle), parts: drawnParts(vehicle.clearances, predictions) };
  }, [vehicle, planned]);

  const innerMm = view?.limits.maxInnerSwingMm ?? null;
  const outerMm = view?.limits.maxOuterSwingMm ?? null;
  const parts = view?.parts;
  useEffect(() => {
    onLimits(vehicle ? { innerMm, outerMm, parts } : null);
  }, [vehicle, innerMm, outerMm, parts, onLimits]);

  const len = (mm: number) => formatLen(mm, prefs, { decimals: prefs.units === "metric" ? 0 : 2 });
  const contacts = view?.predictions.filter((p) => p.status === "contact").length ?? 0;
  const tight = view?.predictions.filter((p) => p.status === "tight").length ?? 0;

  return (
    <section
      aria-labelledby="garage-title"
      className="rounded-card bg-white p-4 shadow-card ring-1 ring-basalt-100 sm:p-5"
      data-testid="garage-panel"
    >
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="garage-title" className="text-lg font-semibold">
            On a vehicle from your garage
          </h2>
          <p className="text-sm text-basalt-600">Its measured points, predicted for the planned setup above.</p>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="ws-vehicle" className="text-sm font-medium text-basalt-800">
            Vehicle
          </label>
          <select
            id="ws-vehicle"
            className="min-h-10 min-w-[14rem] rounded-lg border border-basalt-300 bg-white px-3"
            value={vehicleId ?? ""}
            onChange={(e) => onPick(e.target.value || null)}
          >
            <SelectOptions options={[{ value: "", label: "None picked" }, ...vehicles.map((v) => ({ value: v.id, label: v.name }))]} />
          </select>
        </div>
      </div>
      {vehicle && view && (
        <div className="mt-4 flex flex-col gap-3">
          <div className="flex flex-wrap items-center gap-2">
            <Button variant="secondary" onClick={() => onUseVehicle(vehicle)}>
              Use its current setup and figures
            </Button>
            <Link
              href={`/garage/${vehicle.id}?${setupQuery("p", planned)}`}
              className="text-sm font-semibold text-ember-700 underline-offset-2 hover:underline"
            >
              Open the vehicle page
            </Link>
            <Link
              href={`/garage/${vehicle.id}/checklist?${setupQuery("p", planned)}`}
              className="text-sm font-semibold text-ember-700 underline-offset-2 hover:underline"
            >
              Install checklist for this plan
            </Link>
          </div>
          {vehicle.clearances.length === 0 ? (
            <p className="text-sm text-basalt-700">
              No measured points yet: add them on the vehicle page to see what this setup would touch.
            </p>
          ) : (
            <>
              <p
                role="status"
                data-testid="garage-summary"
                className={`rounded-lg px-3 py-2 text-sm ${contacts ? "bg-contact-100 text-contact-800" : tight ? "bg-tight-100 text-tight-800" : "bg-clear-100 text-clear-800"}`}
              >
                {contacts
                  ? `${contacts} of ${vehicle.clearances.length} points predicted to touch.`
                  : tight
                    ? `${tight} of ${vehicle.clearances.length} points closer than the margin.`
                    : `All ${vehicle.clearances.length} points keep the margin.`}{" "}
                Margin {len(vehicle.clearanceMarginMm)} (this vehicle&apos;s).
              </p>
              <PredictionTable
                points={vehicle.clearances}
                predictions={view.predictions}
                len={len}
                signed={(mm: number) => formatLen(mm, prefs, { signed: true, decimals: prefs.units === "metric" ? 0 : 2 })}
                caption={`Predicted clearance at each measured point of ${vehicle.name}`}
                testId="workspace-predictions"
                axisInboardMm={view.axis}
              />
              {(innerMm !== null || outerMm !== null) && (
                // How the points are predicted is the table's own note (PredictionNote), the same as on the vehicle page.
                <p className="text-xs text-basalt-600">
                  {innerMm !== null && <>Inner limit (nearest inboard part) {len(innerMm)} from the hub face. </>}
                  {outerMm !== null && <>Fender lip (nearest outboard part) {len(outerMm)} from the hub face. </>}
                  Both are drawn in “Side by side at the hub” below.
                </p>
              )}
            </>
          )}
        </div>
      )}
    </section>
  );
}
