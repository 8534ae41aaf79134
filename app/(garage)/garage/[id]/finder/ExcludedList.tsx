"use client";
import Link from "next/link";
import { Card } from "@/components/ui/Card";
import { Table, type TableColumn } from "@/components/ui/Table";
import type { FitmentExclusion } from "@/lib/fitment";
import { bothUnits } from "@/lib/garage/format";
import { exclusionText } from "@/lib/garage/finderText";
import { setupQuery } from "@/lib/setup/url";
import type { Vehicle } from "@/lib/garage/types";
import { candidateSetup } from "./candidate";

/** In the finder's order (nearest the goals first), which is the point of the list: no header sorts. */
function excludedColumns(vehicle: Vehicle): TableColumn<FitmentExclusion>[] {
  return [
    { id: "tire", header: "Tire size", cell: (x) => <span className="font-medium">{x.tire.text}</span> },
    { id: "diameter", header: "Diameter", cell: (x) => bothUnits(x.overallDiameterMm) },
    {
      id: "wheel",
      header: "Closest wheel",
      cell: (x) => `${x.wheel.diameterIn}x${x.wheel.widthIn} ${x.wheel.offsetMm > 0 ? "+" : ""}${x.wheel.offsetMm} mm`,
    },
    { id: "why", header: "Why", cell: (x) => exclusionText(x) },
    {
      id: "check",
      header: "Check",
      cell: (x) => (
        <Link
          className="text-ember-700 underline"
          href={`/garage/${vehicle.id}?${setupQuery("p", candidateSetup(x))}`}
          aria-label={`Predict ${x.tire.text} on ${x.wheel.diameterIn}x${x.wheel.widthIn} ${x.wheel.offsetMm} mm on the vehicle page`}
        >
          Predict
        </Link>
      ),
    },
  ];
}

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
      <Table
        caption="Excluded tire sizes, nearest the goals first, with the limit that decided each"
        className="mt-3 min-w-[640px]"
        columns={excludedColumns(vehicle)}
        rows={rows}
        rowKey={(x) => `${x.tire.text}|${x.wheel.widthIn}|${x.wheel.offsetMm}`}
        rowTestId="excluded-size"
      />
    </Card>
  );
}
