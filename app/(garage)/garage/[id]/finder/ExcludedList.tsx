"use client";
import Link from "next/link";
import { Card } from "@/components/ui/Card";
import type { FitmentExclusion } from "@/lib/fitment";
import { bothUnits } from "@/lib/garage/format";
import { exclusionText } from "@/lib/garage/finderText";
import { setupQuery } from "@/lib/setup/url";
import type { Vehicle } from "@/lib/garage/types";
import { candidateSetup } from "./candidate";

/**
 * The tire sizes the measured points (or the poke limit) remove entirely, each by its nearest miss
 * and the limit that decided it — so a size missing from the results is never a mystery.
 */
export function ExcludedList({ rows, total, vehicle }: { rows: FitmentExclusion[]; total: number; vehicle: Vehicle }) {
  return (
    <Card className="overflow-x-auto" data-testid="finder-excluded">
      <h2 className="text-lg font-semibold">Sizes excluded by the limits</h2>
      <p className="mt-1 text-sm text-basalt-600">
        Each size with no wheel that keeps the margin at every measured point, shown on the wheel that came closest.
        {total > rows.length ? ` The ${rows.length} nearest the goals of ${total}.` : ""}
      </p>
      <table className="mt-3 w-full min-w-[640px] text-left text-sm">
        <caption className="sr-only">Excluded tire sizes, nearest the goals first, with the limit that decided each</caption>
        <thead className="text-xs uppercase tracking-wide text-basalt-500">
          <tr>
            <th className="py-2 pr-2">Tire size</th>
            <th className="pr-2">Diameter</th>
            <th className="pr-2">Closest wheel</th>
            <th className="pr-2">Why</th>
            <th>Check</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {rows.map((x) => (
            <tr key={`${x.tire.text}|${x.wheel.widthIn}|${x.wheel.offsetMm}`} data-testid="excluded-size">
              <td className="py-1.5 pr-2 font-medium">{x.tire.text}</td>
              <td className="pr-2">{bothUnits(x.overallDiameterMm)}</td>
              <td className="pr-2">
                {x.wheel.diameterIn}x{x.wheel.widthIn} {x.wheel.offsetMm > 0 ? "+" : ""}
                {x.wheel.offsetMm} mm
              </td>
              <td className="pr-2">{exclusionText(x)}</td>
              <td>
                <Link
                  className="text-ember-700 underline"
                  href={`/garage/${vehicle.id}?${setupQuery("p", candidateSetup(x))}`}
                  aria-label={`Predict ${x.tire.text} on ${x.wheel.diameterIn}x${x.wheel.widthIn} ${x.wheel.offsetMm} mm on the vehicle page`}
                >
                  Predict
                </Link>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </Card>
  );
}
