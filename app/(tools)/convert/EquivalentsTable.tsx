import { formatNumber } from "@/lib/comparisons/format";
import { type EquivalentSize, type TireSize, formatNominalInchSize, mmToIn } from "@/lib/fitment";

/** A signed difference in mm with its percentage, e.g. "−4.0 mm (−0.4 %)". */
const delta = (mm: number, pct: number) => `${formatNumber(mm, 1, { signed: true })} mm (${formatNumber(pct, 1, { signed: true })} %)`;

/**
 * The ranked equivalents of one size: every metric size with its nominal inch size, each row with
 * its rim diameter and its diameter and width differences in mm and %.
 */
export function EquivalentsTable({ size, list, target }: { size: TireSize; list: readonly EquivalentSize[]; target: string }) {
  return (
    <table className="w-full min-w-[36rem] text-sm tabular-nums" data-testid="equivalents">
      <caption className="mb-1 text-left text-sm font-medium text-basalt-700">
        Nearest {target} sizes to {size.text}
      </caption>
      <thead>
        <tr className="border-b border-basalt-200 text-left">
          <th scope="col" className="py-1.5 pr-3">
            Size
          </th>
          <th scope="col" className="py-1.5 pr-3">
            Rim
          </th>
          <th scope="col" className="py-1.5 pr-3 text-right">
            Diameter
          </th>
          <th scope="col" className="py-1.5 pr-3 text-right">
            Δ diameter
          </th>
          <th scope="col" className="py-1.5 pr-3 text-right">
            Δ width
          </th>
          <th scope="col" className="py-1.5 text-right">
            Distance
          </th>
        </tr>
      </thead>
      <tbody>
        {list.map((e) => (
          <tr key={e.text} className="border-b border-basalt-100 align-top">
            <th scope="row" className="py-1.5 pr-3 text-left font-semibold">
              {e.text}
              {e.size.system === "metric" && (
                <span className="block text-xs font-normal text-basalt-600">≈ {formatNominalInchSize(e.size, { rim: false })}</span>
              )}
            </th>
            <td className="py-1.5 pr-3">
              {e.size.rimDiameterIn} in
              {!e.sameRim && <span className="block text-xs text-tight-800">other wheels</span>}
            </td>
            <td className="py-1.5 pr-3 text-right">
              {formatNumber(e.size.overallDiameterMm, 1)} mm · {formatNumber(mmToIn(e.size.overallDiameterMm), 2)} in
            </td>
            <td className="py-1.5 pr-3 text-right">{delta(e.diameterDeltaMm, e.diameterDeltaPct)}</td>
            <td className="py-1.5 pr-3 text-right">{delta(e.widthDeltaMm, e.widthDeltaPct)}</td>
            <td className="py-1.5 text-right">{formatNumber(e.distance, 1)}</td>
          </tr>
        ))}
        {list.length === 0 && (
          <tr>
            <td colSpan={6} className="py-3 text-basalt-500">
              No standard size of the other system for this rim diameter; clear “same rim diameter only”.
            </td>
          </tr>
        )}
      </tbody>
    </table>
  );
}
