"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { FitmentSummaryCard } from "@/components/quotes/FitmentSummaryCard";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { api } from "@/lib/client/api";
import { STATUS_LABEL } from "@/lib/quotes/status";
import type { QuoteEventRow, QuoteLineKind, QuoteLineRow, QuoteRow } from "@/lib/db/types";
import type { FitmentSummary } from "@/lib/quotes/fitment";
import { formatBp, formatCents, formatUsd, parseMoneyToCents } from "@/lib/quotes/money";
import { statusTone } from "../statusTone";

type J<T> = { [K in keyof T]: T[K] extends Date ? string : T[K] extends Date | null ? string | null : T[K] };
export interface Detail {
  quote: J<QuoteRow>;
  lines: J<QuoteLineRow>[];
  events: J<QuoteEventRow>[];
  customer: { id: string; name: string; phone: string; email: string };
  createdByName: string | null;
}


interface EditLine {
  key: string;
  kind: QuoteLineKind;
  catalogItemId: string | null;
  sku: string;
  description: string;
  quantity: string;
  unitPrice: string;
  discount: string;
  taxable: boolean;
}

const toEdit = (l: J<QuoteLineRow>): EditLine => ({
  key: l.id,
  kind: l.kind,
  catalogItemId: l.catalog_item_id,
  sku: l.sku,
  description: l.description,
  quantity: String(l.quantity),
  unitPrice: formatCents(l.unit_price_cents).replace(/,/g, ""),
  discount: formatCents(l.discount_cents).replace(/,/g, ""),
  taxable: l.taxable,
});

export function QuoteEditor({ initial, labourRateCents }: { initial: Detail; labourRateCents: number }) {
  const qc = useQueryClient();
  const [detail, setDetail] = useState(initial);
  const q = detail.quote;
  const draft = q.status === "draft";
  const [lines, setLines] = useState<EditLine[]>(() => initial.lines.map(toEdit));
  const [discount, setDiscount] = useState(formatCents(initial.quote.discount_cents).replace(/,/g, ""));
  const [notes, setNotes] = useState(initial.quote.notes);
  const [problems, setProblems] = useState<string[]>([]);
  const [notice, setNotice] = useState<string | null>(null);

  const accept = (d: Detail) => {
    setDetail(d);
    setLines(d.lines.map(toEdit));
    setDiscount(formatCents(d.quote.discount_cents).replace(/,/g, ""));
    void qc.invalidateQueries({ queryKey: ["shop-quotes"] });
  };

  const save = useMutation({
    mutationFn: async () => {
      const errs: string[] = [];
      const body = {
        lines: lines.map((l, i) => {
          const quantity = Number(l.quantity);
          const unitPriceCents = parseMoneyToCents(l.unitPrice);
          const discountCents = parseMoneyToCents(l.discount || "0");
          if (!Number.isInteger(quantity) || quantity < 1) errs.push(`Line ${i + 1}: quantity must be a whole number of at least 1.`);
          if (unitPriceCents === null || unitPriceCents < 0) errs.push(`Line ${i + 1}: enter the price in dollars, like 129.50.`);
          if (discountCents === null || discountCents < 0) errs.push(`Line ${i + 1}: enter the discount in dollars (0 or more).`);
          return { kind: l.kind, catalogItemId: l.catalogItemId, sku: l.sku, description: l.description, quantity, unitPriceCents: unitPriceCents ?? -1, discountCents: discountCents ?? -1, taxable: l.taxable };
        }),
        discountCents: parseMoneyToCents(discount || "0") ?? -1,
        notes,
      };
      if (body.discountCents < 0) errs.push("Enter the quote discount in dollars (0 or more).");
      if (errs.length) throw Object.assign(new Error(errs[0]), { list: errs });
      return api<Detail>(`/api/shop/quotes/${q.id}`, { method: "PUT", body });
    },
    onMutate: () => {
      setProblems([]);
      setNotice(null);
    },
    onSuccess: (d) => {
      accept(d);
      setNotice("Saved. Totals were computed by the server.");
    },
    onError: (e) => {
      const list = (e as { list?: string[] }).list;
      const fe = (e as { body?: { fieldErrors?: Record<string, string[]> } }).body?.fieldErrors;
      setProblems(list ?? (fe ? Object.entries(fe).map(([k, v]) => `${k}: ${v[0]}`) : [(e as Error).message]));
    },
  });
  const send = useMutation({
    mutationFn: () => api<Detail>(`/api/shop/quotes/${q.id}/send`, { method: "POST", body: {} }),
    onMutate: () => setProblems([]),
    onSuccess: (d) => {
      accept(d);
      setNotice(`Sent to ${d.customer.email} with the PDF attached.`);
    },
    onError: (e) => setProblems([(e as Error).message]),
  });
  const move = useMutation({
    mutationFn: (to: "draft" | "declined" | "installed") => api<Detail>(`/api/shop/quotes/${q.id}/status`, { body: { to } }),
    onMutate: () => setProblems([]),
    onSuccess: (d) => {
      accept(d);
      setNotice(`Quote is now ${STATUS_LABEL[d.quote.status].toLowerCase()}.`);
    },
    onError: (e) => setProblems([(e as Error).message]),
  });

  const set = (i: number, patch: Partial<EditLine>) => setLines((ls) => ls.map((l, j) => (j === i ? { ...l, ...patch } : l)));
  const fit = q.fitment as FitmentSummary;

  return (
    <>
      <PageHeader
        title={`Quote Q-${q.number}`}
        lead={
          <>
            <Badge tone={statusTone(q.status)}>{STATUS_LABEL[q.status]}</Badge>{" "}
            <span data-testid="quote-status" className="sr-only">{STATUS_LABEL[q.status]}</span>
            {detail.customer.name} · {q.vehicle_description}
            {q.valid_until && ` · valid until ${new Date(q.valid_until).toLocaleDateString("en-US")}`}
          </>
        }
        actions={
          <div className="flex flex-wrap gap-2">
            <a className={buttonClass("secondary")} href={`/api/shop/quotes/${q.id}/pdf`}>PDF</a>
            {(q.status === "draft" || q.status === "sent") && (
              <Button pending={send.isPending} onClick={() => send.mutate()}>{q.status === "sent" ? "Send again" : "Send to customer"}</Button>
            )}
            {q.status === "sent" && <Button variant="secondary" pending={move.isPending} onClick={() => move.mutate("draft")}>Back to draft</Button>}
            {(q.status === "sent" || q.status === "accepted") && <Button variant="secondary" pending={move.isPending} onClick={() => move.mutate("declined")}>Mark declined</Button>}
            {q.status === "deposit_paid" && <Button pending={move.isPending} onClick={() => move.mutate("installed")}>Mark installed</Button>}
          </div>
        }
      />
      <div aria-live="polite" className="mb-4 flex flex-col gap-2">
        {notice && <Alert tone="success">{notice}</Alert>}
        {problems.length > 0 && (
          <Alert tone="error" title="Not saved">
            <ul className="list-disc pl-5">{problems.map((p) => <li key={p}>{p}</li>)}</ul>
          </Alert>
        )}
      </div>
      <div className="grid gap-5 lg:grid-cols-[1.6fr_1fr]">
        <div className="flex flex-col gap-5">
          <Card className="overflow-x-auto" tabIndex={0} role="region" aria-label="Quote lines">
            <h2 className="text-lg font-semibold">Lines</h2>
            {!draft && <p className="text-sm text-basalt-600">Lines can be edited while the quote is a draft.</p>}
            <table className="mt-3 w-full min-w-[640px] text-left text-sm">
              <thead className="text-xs uppercase tracking-wide text-basalt-600">
                <tr><th className="py-1">Description</th><th>Qty</th><th>Unit $</th><th>Discount $</th><th>Tax</th><th className="text-right">Amount</th><th><span className="sr-only">Remove</span></th></tr>
              </thead>
              <tbody className="divide-y divide-basalt-100">
                {lines.map((l, i) => {
                  const saved = detail.lines[i];
                  return (
                    <tr key={l.key} data-testid="quote-line">
                      <td className="py-1 pr-2">
                        {draft ? (
                          <input aria-label={`Description of line ${i + 1}`} className="w-full rounded border border-basalt-300 px-2 py-1" value={l.description} onChange={(e) => set(i, { description: e.target.value })} />
                        ) : (
                          l.description
                        )}
                        {l.sku && <span className="block text-xs text-basalt-600">{l.sku}</span>}
                      </td>
                      <td className="pr-2">
                        {draft ? <input aria-label={`Quantity of line ${i + 1}`} inputMode="numeric" className="w-14 rounded border border-basalt-300 px-2 py-1" value={l.quantity} onChange={(e) => set(i, { quantity: e.target.value })} /> : l.quantity}
                      </td>
                      <td className="pr-2">
                        {draft ? <input aria-label={`Unit price of line ${i + 1}`} inputMode="decimal" className="w-24 rounded border border-basalt-300 px-2 py-1" value={l.unitPrice} onChange={(e) => set(i, { unitPrice: e.target.value })} /> : l.unitPrice}
                      </td>
                      <td className="pr-2">
                        {draft ? <input aria-label={`Discount of line ${i + 1}`} inputMode="decimal" className="w-20 rounded border border-basalt-300 px-2 py-1" value={l.discount} onChange={(e) => set(i, { discount: e.target.value })} /> : l.discount}
                      </td>
                      <td className="pr-2">
                        <input type="checkbox" aria-label={`Line ${i + 1} is taxable`} className="size-4 accent-ember-600" disabled={!draft} checked={l.taxable} onChange={(e) => set(i, { taxable: e.target.checked })} />
                      </td>
                      <td className="text-right tabular-nums">{saved && saved.id === l.key ? formatUsd(saved.line_total_cents) : "—"}</td>
                      <td className="pl-2 text-right">
                        {draft && <Button variant="ghost" className="min-h-8 px-2 py-1" onClick={() => setLines((ls) => ls.filter((_, j) => j !== i))}>✕<span className="sr-only">Remove line {i + 1}</span></Button>}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
            {draft && (
              <div className="mt-3 flex flex-wrap items-end gap-3">
                <Button
                  variant="secondary"
                  onClick={() => setLines((ls) => [...ls, { key: `new-${Date.now()}`, kind: "custom", catalogItemId: null, sku: "", description: "Labour (1 hour)", quantity: "1", unitPrice: formatCents(labourRateCents).replace(/,/g, ""), discount: "0", taxable: false }])}
                >
                  Add a labour line
                </Button>
                <label className="flex flex-col gap-1 text-sm font-medium">
                  Quote discount ($)
                  <input inputMode="decimal" className="w-28 rounded-lg border border-basalt-300 px-3 py-2" value={discount} onChange={(e) => setDiscount(e.target.value)} />
                </label>
                <label className="flex min-w-64 flex-1 flex-col gap-1 text-sm font-medium">
                  Notes for the customer
                  <input className="rounded-lg border border-basalt-300 px-3 py-2" value={notes} onChange={(e) => setNotes(e.target.value)} />
                </label>
                <Button pending={save.isPending} onClick={() => save.mutate()}>Save lines</Button>
              </div>
            )}
          </Card>
          <FitmentSummaryCard fit={fit} />
        </div>
        <div className="flex flex-col gap-5">
          <Card>
            <h2 className="text-lg font-semibold">Totals</h2>
            <dl className="mt-3 grid grid-cols-[1fr_auto] gap-y-1 text-sm tabular-nums" data-testid="quote-totals">
              <dt>Subtotal</dt><dd className="text-right">{formatUsd(q.subtotal_cents)}</dd>
              {q.discount_cents > 0 && (<><dt>Discount</dt><dd className="text-right">−{formatUsd(q.discount_cents)}</dd></>)}
              <dt>Tax {formatBp(q.tax_rate_bp)} % on {formatUsd(q.taxable_cents)}</dt><dd className="text-right">{formatUsd(q.tax_cents)}</dd>
              <dt className="font-semibold">Total</dt><dd className="text-right font-semibold">{formatUsd(q.total_cents)}</dd>
              <dt>Deposit ({q.deposit_pct} %)</dt><dd className="text-right">{formatUsd(q.deposit_cents)}</dd>
            </dl>
          </Card>
          <Card>
            <h2 className="text-lg font-semibold">Customer</h2>
            <p className="mt-1 text-sm">{detail.customer.name}<br />{detail.customer.phone}<br />{detail.customer.email || <em>no e-mail — add one to send</em>}</p>
            <h2 className="mt-4 text-lg font-semibold">Vehicle</h2>
            <p className="mt-1 text-sm">{q.vehicle_description}<br />Bolt pattern {q.bolt_pattern}</p>
          </Card>
          <Card>
            <h2 className="text-lg font-semibold">History</h2>
            <ol className="mt-2 flex flex-col gap-1 text-sm" data-testid="quote-history">
              {detail.events.map((e) => (
                <li key={e.id}>
                  <span className="font-medium">{STATUS_LABEL[e.to_status]}</span> — {e.actor}, {new Date(e.at).toLocaleString("en-US")}
                  {e.note && <span className="text-basalt-600"> ({e.note})</span>}
                </li>
              ))}
            </ol>
            <Link href="/shop/quotes" className="mt-3 inline-block text-sm text-ember-700 underline">All quotes</Link>
          </Card>
        </div>
      </div>
    </>
  );
}
