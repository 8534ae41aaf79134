"use client";
import { Button } from "@/components/ui/Button";
import { Table, type TableColumn } from "@/components/ui/Table";
import { type EditLine, lineUnchanged } from "@/lib/shop/quotes/editLines";
import { formatUsd } from "@/lib/shop/quotes/money";
import { formatQuantity } from "@/lib/shop/quotes/quantity";
import type { QuoteDetail as Detail } from "@/lib/shop/quotes/api";

const input = "w-full rounded border border-basalt-300 px-2 py-1";

/**
 * The quote's lines: editable while a draft, in the order they print (so no header sorts). The
 * table keeps its width and scrolls inside its focusable region (QuoteEditor) on a narrow screen
 * instead of widening the page.
 */
export function QuoteLinesTable({
  lines,
  saved,
  editable,
  onChange,
  onRemove,
}: {
  lines: EditLine[];
  saved: Detail["lines"];
  editable: boolean;
  onChange: (i: number, patch: Partial<EditLine>) => void;
  onRemove: (i: number) => void;
}) {
  /** A line's dollar figure: typed while a draft (as the shop writes it), the text as saved otherwise. */
  const dollarsCell = (l: EditLine, i: number, key: "unitPrice" | "discount", what: string, width: "w-24" | "w-20") =>
    editable ? (
      <input
        aria-label={`${what} of line ${i + 1}`}
        inputMode="decimal"
        className={`${width} rounded border border-basalt-300 px-2 py-1`}
        value={l[key]}
        onChange={(e) => onChange(i, key === "unitPrice" ? { unitPrice: e.target.value } : { discount: e.target.value })}
      />
    ) : (
      l[key]
    );
  const columns: TableColumn<EditLine>[] = [
    {
      id: "description",
      header: "Description",
      cell: (l, i) => (
        <>
          {editable ? (
            <input
              aria-label={`Description of line ${i + 1}`}
              className={input}
              value={l.description}
              onChange={(e) => onChange(i, { description: e.target.value })}
            />
          ) : (
            l.description
          )}
          {l.sku && <span className="block text-xs text-basalt-600">{l.sku}</span>}
        </>
      ),
    },
    {
      id: "quantity",
      header: "Qty",
      cell: (l, i) => {
        const hours = l.unit === "hour";
        return editable ? (
          <span className="flex items-center gap-1">
            <input
              aria-label={`Quantity of line ${i + 1}${hours ? " (hours)" : ""}`}
              inputMode={hours ? "decimal" : "numeric"}
              className="w-16 rounded border border-basalt-300 px-2 py-1"
              value={l.quantity}
              onChange={(e) => onChange(i, { quantity: e.target.value })}
            />
            {hours && (
              <span aria-hidden className="text-basalt-600">
                h
              </span>
            )}
          </span>
        ) : (
          formatQuantity(Number(l.quantity), l.unit)
        );
      },
    },
    { id: "unitPrice", header: "Unit $", cell: (l, i) => dollarsCell(l, i, "unitPrice", "Unit price", "w-24") },
    { id: "discount", header: "Discount $", cell: (l, i) => dollarsCell(l, i, "discount", "Discount", "w-20") },
    {
      id: "taxable",
      header: "Tax",
      cell: (l, i) => (
        <input
          type="checkbox"
          aria-label={`Line ${i + 1} is taxable`}
          className="size-4 accent-ember-600"
          disabled={!editable}
          checked={l.taxable}
          onChange={(e) => onChange(i, { taxable: e.target.checked })}
        />
      ),
    },
    {
      id: "amount",
      header: "Amount",
      align: "end",
      cell: (l) => {
        const s = saved.find((x) => x.id === l.key);
        return s && lineUnchanged(l, saved) ? formatUsd(s.lineTotalCents) : <span title="Save to compute">—</span>;
      },
    },
    {
      id: "remove",
      header: <span className="sr-only">Remove</span>,
      align: "end",
      cell: (_l, i) =>
        editable && (
          <Button variant="ghost" className="min-h-8 px-2 py-1" onClick={() => onRemove(i)}>
            ✕<span className="sr-only">Remove line {i + 1}</span>
          </Button>
        ),
    },
  ];
  return <Table className="mt-3 min-w-[640px]" columns={columns} rows={lines} rowKey={(l) => l.key} rowTestId="quote-line" />;
}
