"use client";
import { Button } from "@/components/ui/Button";
import { type EditLine, lineUnchanged } from "@/lib/shop/quotes/editLines";
import { formatUsd } from "@/lib/shop/quotes/money";
import { formatQuantity } from "@/lib/shop/quotes/quantity";
import type { QuoteDetail as Detail } from "@/lib/shop/quotes/api";

const input = "w-full rounded border border-basalt-300 px-2 py-1";

/**
 * The quote's lines: editable while a draft. The table keeps its width and scrolls inside its
 * focusable region (QuoteEditor) on a narrow screen instead of widening the page.
 */
export function QuoteLinesTable({ lines, saved, editable, onChange, onRemove }: { lines: EditLine[]; saved: Detail["lines"]; editable: boolean; onChange: (i: number, patch: Partial<EditLine>) => void; onRemove: (i: number) => void }) {
  return (
    <table className="mt-3 w-full min-w-[640px] text-left text-sm">
      <thead className="text-xs uppercase tracking-wide text-basalt-600">
        <tr><th className="py-1">Description</th><th>Qty</th><th>Unit $</th><th>Discount $</th><th>Tax</th><th className="text-right">Amount</th><th><span className="sr-only">Remove</span></th></tr>
      </thead>
      <tbody className="divide-y divide-basalt-100">
        {lines.map((l, i) => {
          const n = i + 1;
          const s = saved.find((x) => x.id === l.key);
          const hours = l.unit === "hour";
          return (
            <tr key={l.key} data-testid="quote-line">
              <td className="py-1 pr-2">
                {editable ? <input aria-label={`Description of line ${n}`} className={input} value={l.description} onChange={(e) => onChange(i, { description: e.target.value })} /> : l.description}
                {l.sku && <span className="block text-xs text-basalt-600">{l.sku}</span>}
              </td>
              <td className="pr-2">
                {editable ? (
                  <span className="flex items-center gap-1">
                    <input
                      aria-label={`Quantity of line ${n}${hours ? " (hours)" : ""}`}
                      inputMode={hours ? "decimal" : "numeric"}
                      className="w-16 rounded border border-basalt-300 px-2 py-1"
                      value={l.quantity}
                      onChange={(e) => onChange(i, { quantity: e.target.value })}
                    />
                    {hours && <span aria-hidden className="text-basalt-600">h</span>}
                  </span>
                ) : (
                  formatQuantity(Number(l.quantity), l.unit)
                )}
              </td>
              <td className="pr-2">
                {editable ? <input aria-label={`Unit price of line ${n}`} inputMode="decimal" className="w-24 rounded border border-basalt-300 px-2 py-1" value={l.unitPrice} onChange={(e) => onChange(i, { unitPrice: e.target.value })} /> : l.unitPrice}
              </td>
              <td className="pr-2">
                {editable ? <input aria-label={`Discount of line ${n}`} inputMode="decimal" className="w-20 rounded border border-basalt-300 px-2 py-1" value={l.discount} onChange={(e) => onChange(i, { discount: e.target.value })} /> : l.discount}
              </td>
              <td className="pr-2">
                <input type="checkbox" aria-label={`Line ${n} is taxable`} className="size-4 accent-ember-600" disabled={!editable} checked={l.taxable} onChange={(e) => onChange(i, { taxable: e.target.checked })} />
              </td>
              <td className="text-right tabular-nums">{s && lineUnchanged(l, saved) ? formatUsd(s.lineTotalCents) : <span title="Save to compute">—</span>}</td>
              <td className="pl-2 text-right">
                {editable && <Button variant="ghost" className="min-h-8 px-2 py-1" onClick={() => onRemove(i)}>✕<span className="sr-only">Remove line {n}</span></Button>}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
