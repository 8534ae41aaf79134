import { formatNumber } from "@/lib/comparisons/format";
import type { TorquePlan, TorqueUnit } from "@/lib/fitment";
import { cx } from "@/components/ui/cx";

/**
 * The torque passes in ft·lb and N·m (the chosen unit in bold). On paper a last column lists the
 * order with a box per bolt, one row per pass, to tick by hand.
 */
export function PassTable({ plan, unit }: { plan: TorquePlan; unit: TorqueUnit }) {
  const strong = (u: TorqueUnit) => (u === unit ? "font-semibold text-basalt-950" : undefined);
  return (
    <table className="mt-3 w-full text-sm tabular-nums" data-testid="torque-passes">
      <thead>
        <tr className="border-b border-basalt-200 text-left">
          <th scope="col" className="py-1.5 print:py-1">
            Pass
          </th>
          <th scope="col" className="py-1.5 print:py-1 pl-3 text-right">
            Share
          </th>
          <th scope="col" className={cx("py-1.5 print:py-1 pl-3 text-right", strong("ftlb"))}>
            ft·lb
          </th>
          <th scope="col" className={cx("py-1.5 print:py-1 pl-3 text-right", strong("nm"))}>
            N·m
          </th>
          <th scope="col" className="hidden py-1.5 print:py-1 pl-4 print:table-cell">
            Order — tick each bolt as you go
          </th>
        </tr>
      </thead>
      <tbody>
        {plan.passes.map((p) => (
          <tr key={p.pass} className="break-inside-avoid border-b border-basalt-100 align-top">
            <th scope="row" className="py-1.5 print:py-1 text-left font-medium">
              {p.kind === "check" ? `${p.pass}: check every bolt` : `${p.pass}`}
            </th>
            <td className="py-1.5 print:py-1 pl-3 text-right whitespace-nowrap">{Math.round(p.fraction * 100)} %</td>
            <td className={cx("py-1.5 print:py-1 pl-3 text-right", strong("ftlb"))}>{formatNumber(p.torqueFtLb, 1)}</td>
            <td className={cx("py-1.5 print:py-1 pl-3 text-right", strong("nm"))}>{formatNumber(p.torqueNm, 1)}</td>
            <td className="hidden py-1.5 print:py-1 pl-4 print:table-cell">
              <ol data-testid="print-order" aria-label={`Order for pass ${p.pass}`} className="flex flex-wrap gap-x-1.5 gap-y-1">
                {p.sequence.map((bolt) => (
                  <li key={bolt} className="inline-flex items-center gap-0.5 text-xs leading-none font-semibold">
                    <span aria-hidden className="inline-block size-3 border border-basalt-900" />
                    {bolt}
                  </li>
                ))}
              </ol>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
