import { type FigureColumn, FigureTable } from "@/components/ui/FigureTable";
import { formatNumber } from "@/lib/comparisons/format";
import { type EquivalentSize, type TireSize, formatNominalInchSize, mmToIn } from "@/lib/fitment";

/** A signed difference in mm with its percentage, e.g. "−4.0 mm (−0.4 %)". */
const delta = (mm: number, pct: number) => `${formatNumber(mm, 1, { signed: true })} mm (${formatNumber(pct, 1, { signed: true })} %)`;

const COLUMNS: FigureColumn<EquivalentSize>[] = [
  {
    id: "size",
    header: "Size",
    cell: (e) => (
      <>
        {e.text}
        {e.size.system === "metric" && (
          <span className="block text-xs font-normal text-basalt-600">≈ {formatNominalInchSize(e.size, { rim: false })}</span>
        )}
      </>
    ),
  },
  {
    id: "rim",
    header: "Rim",
    cell: (e) => (
      <>
        {e.size.rimDiameterIn} in
        {!e.sameRim && <span className="block text-xs text-tight-800">other wheels</span>}
      </>
    ),
  },
  {
    id: "diameter",
    header: "Diameter",
    align: "end",
    cell: (e) => `${formatNumber(e.size.overallDiameterMm, 1)} mm · ${formatNumber(mmToIn(e.size.overallDiameterMm), 2)} in`,
  },
  { id: "diameter-delta", header: "Δ diameter", align: "end", cell: (e) => delta(e.diameterDeltaMm, e.diameterDeltaPct) },
  { id: "width-delta", header: "Δ width", align: "end", cell: (e) => delta(e.widthDeltaMm, e.widthDeltaPct) },
  { id: "distance", header: "Distance", align: "end", cell: (e) => formatNumber(e.distance, 1) },
];

/**
 * The ranked equivalents of one size: every metric size with its nominal inch size, each row with
 * its rim diameter and its diameter and width differences in mm and %.
 */
export function EquivalentsTable({ size, list, target }: { size: TireSize; list: readonly EquivalentSize[]; target: string }) {
  return (
    <FigureTable
      columns={COLUMNS}
      rows={list}
      rowKey={(e) => e.text}
      caption={`Nearest ${target} sizes to ${size.text}`}
      empty="No standard size of the other system for this rim diameter; clear “same rim diameter only”."
      className="min-w-[36rem] tabular-nums"
      testId="equivalents"
    />
  );
}
