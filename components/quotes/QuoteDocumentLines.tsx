import type { QuoteDocument } from "@/lib/shop/quotes/document";
import { formatUsd } from "@/lib/shop/quotes/money";
import { formatQuantity } from "@/lib/shop/quotes/quantity";
import { QuoteTotalsList } from "./QuoteTotalsList";

/**
 * A quote document's lines and totals for the customer: a table from 640 px up, and one card per
 * line on a phone (the page never scrolls sideways).
 */
export function QuoteDocumentLines({ document: d }: { document: QuoteDocument }) {
  return (
    <>
      <table className="mt-3 hidden w-full text-left text-sm sm:table">
        <thead className="text-xs uppercase tracking-wide text-basalt-600">
          <tr>
            <th className="py-1">Item</th>
            <th className="text-right">Qty</th>
            <th className="text-right">Unit</th>
            <th className="text-right">Amount</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {d.lines.map((l, i) => (
            <tr key={i}>
              <td className="py-1">
                {l.description}
                {l.discountCents > 0 && <span className="text-basalt-600"> (less {formatUsd(l.discountCents)})</span>}
              </td>
              <td className="text-right tabular-nums">{formatQuantity(l.quantity, l.unit)}</td>
              <td className="text-right tabular-nums">{formatUsd(l.unitPriceCents)}</td>
              <td className="text-right tabular-nums">{formatUsd(l.lineTotalCents)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <ul className="mt-3 divide-y divide-basalt-100 text-sm sm:hidden">
        {d.lines.map((l, i) => (
          <li key={i} className="py-2">
            <span className="block font-medium">{l.description}</span>
            <span className="flex justify-between tabular-nums text-basalt-700">
              <span>
                {formatQuantity(l.quantity, l.unit)} × {formatUsd(l.unitPriceCents)}
                {l.discountCents > 0 && ` less ${formatUsd(l.discountCents)}`}
              </span>
              <span className="font-medium text-basalt-950">{formatUsd(l.lineTotalCents)}</span>
            </span>
          </li>
        ))}
      </ul>
      <QuoteTotalsList
        totals={d.totals}
        className="ml-auto mt-4 max-w-xs gap-x-4"
        testIds={{ deposit: "public-deposit", balance: "public-balance" }}
      />
    </>
  );
}
