"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FitmentSummaryCard } from "@/components/quotes/FitmentSummaryCard";
import { useLeaveGuard } from "@/components/feedback/useLeaveGuard";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { PageHeader } from "@/components/ui/PageHeader";
import { ApiError, api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { formatDayOf, formatInstant } from "@/lib/shop/bookings/zoned";
import { type EditForm, type EditLine, bodyOf, formOf, isDirty, labourLine, lineFromCatalog, partsLine } from "@/lib/shop/quotes/editLines";
import { describeFieldErrors } from "@/lib/shop/quotes/fieldLabels";
import { STATUS_LABEL } from "@/lib/shop/quotes/status";
import { statusTone } from "../statusTone";
import { CatalogItemPicker } from "./CatalogItemPicker";
import { HubChecksCard } from "./HubChecksCard";
import { QuoteLinesTable } from "./QuoteLinesTable";
import { QuoteTotalsCard } from "./QuoteTotalsCard";
import type { QuoteDetail as Detail } from "@/lib/shop/quotes/api";
import type { WorkOrderStatus } from "@/lib/platform/db/types";
import { INSTALL_WITHOUT_SHEET } from "@/lib/shop/workOrders/vocabulary";

const LEAVE = "This quote has changes that are not saved. Leave without saving them?";

/** Problems from the browser's own checks or the server, in the screen's words. */
class Problems extends Error {
  constructor(public readonly list: string[]) {
    super(list[0]);
  }
}
const problemsOf = (e: unknown): string[] =>
  e instanceof Problems
    ? e.list
    : e instanceof ApiError && e.body.fieldErrors
      ? describeFieldErrors(e.body.fieldErrors)
      : [(e as Error).message];

export function QuoteEditor({
  initial,
  labourRateCents,
  workOrder = null,
  depositGivenBack = false,
}: {
  initial: Detail;
  labourRateCents: number;
  /** The quote's work order, when it has one: while it is not done, the quote is installed from there. */
  workOrder?: { id: string; status: WorkOrderStatus } | null;
  /** The deposit was asked back in full (the quote is declined once the provider confirms): nothing to install. */
  depositGivenBack?: boolean;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [detail, setDetail] = useState(initial);
  const q = detail.quote;
  const draft = q.status === "draft";
  const [form, setForm] = useState<EditForm>(() => formOf(initial));
  const [problems, setProblems] = useState<{ title: string; list: string[] } | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const dirty = draft && isDirty(form, formOf(detail));
  useLeaveGuard(dirty, LEAVE);

  const accept = (d: Detail) => {
    setDetail(d);
    setForm(formOf(d));
  };

  /** Saves the form; throws Problems (nothing sent to the server) or the server's ApiError. */
  const saveNow = async (): Promise<Detail> => {
    const { body, problems: list } = bodyOf(form);
    if (!body) throw new Problems(list);
    // With the version on screen: a save made meanwhile in another window is refused, not overwritten.
    const d = await api<Detail>(`/api/shop/quotes/${q.id}`, { method: "PUT", body: { ...body, seenUpdatedAt: q.updatedAt } });
    accept(d);
    return d;
  };

  const save = useMutation({
    mutationFn: saveNow,
    onMutate: () => {
      setProblems(null);
      setNotice(null);
    },
    onSuccess: () => setNotice("Saved. Totals were computed by the server."),
    onError: (e) => setProblems({ title: "Not saved", list: problemsOf(e) }),
  });
  // Sending saves pending edits first, so the customer gets what the screen shows; the server
  // also refuses a send when the quote changed after the version this screen last saw.
  const send = useMutation({
    mutationFn: async () => {
      let seen = detail.quote.updatedAt;
      if (dirty) {
        try {
          seen = (await saveNow()).quote.updatedAt;
        } catch (e) {
          throw new Problems([
            "Not sent: your changes could not be saved, so nothing went to the customer. Fix these and send again.",
            ...problemsOf(e),
          ]);
        }
      }
      return api<Detail>(`/api/shop/quotes/${q.id}/send`, { body: { seenUpdatedAt: seen } });
    },
    onMutate: () => {
      setProblems(null);
      setNotice(null);
    },
    onSuccess: (d) => {
      accept(d);
      setNotice(`Sent to ${d.customer.email} with the PDF attached.`);
    },
    onError: (e) => setProblems({ title: "Not sent", list: problemsOf(e) }),
  });
  const move = useMutation({
    mutationFn: (to: "draft" | "declined" | "installed") => api<Detail>(`/api/shop/quotes/${q.id}/status`, { body: { to } }),
    onMutate: () => setProblems(null),
    onSuccess: async (d) => {
      accept(d);
      setNotice(`Quote is now ${STATUS_LABEL[d.quote.status].toLowerCase()}.`);
      // The booking, work-order and payments panels below are rendered on the server from the status (an installed
      // quote's booking is released, its invoice opens): re-render them now, and drop the bay time cached for the
      // calendar and the slot pickers.
      router.refresh();
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: queryKeys.shop.calendar.all }),
        queryClient.invalidateQueries({ queryKey: queryKeys.shop.slots.all }),
      ]);
    },
    onError: (e) => setProblems({ title: "Not changed", list: problemsOf(e) }),
  });

  const setLines = (f: (ls: EditLine[]) => EditLine[]) => {
    setNotice(null);
    setForm((cur) => ({ ...cur, lines: f(cur.lines) }));
  };
  const fit = q.fitment;
  // A job with a sheet in progress is installed by the sheet's "done"; the server refuses it here too.
  const workOrderOpen = workOrder !== null && workOrder.status !== "done";

  return (
    <>
      <PageHeader
        title={`Quote Q-${q.number}`}
        lead={
          <>
            <Badge tone={statusTone(q.status)}>{STATUS_LABEL[q.status]}</Badge>{" "}
            <span data-testid="quote-status" className="sr-only">
              {STATUS_LABEL[q.status]}
            </span>
            {dirty && (
              <>
                <Badge tone="tight">
                  <span data-testid="unsaved">Unsaved changes</span>
                </Badge>{" "}
              </>
            )}
            {detail.customer.name} · {q.vehicleDescription}
            {q.validUntil && ` · valid until ${formatDayOf(q.validUntil, detail.timeZone)}`}
          </>
        }
        actions={
          <div className="flex flex-wrap gap-2">
            <a className={buttonClass("secondary")} href={`/api/shop/quotes/${q.id}/pdf`}>
              PDF{dirty && <span className="sr-only"> (saved version)</span>}
            </a>
            {(q.status === "draft" || q.status === "sent") && (
              <Button pending={send.isPending} disabled={save.isPending} onClick={() => send.mutate()}>
                {q.status === "sent" ? "Send again" : dirty ? "Save and send to customer" : "Send to customer"}
              </Button>
            )}
            {q.status === "sent" && (
              <Button variant="secondary" pending={move.isPending} onClick={() => move.mutate("draft")}>
                Back to draft
              </Button>
            )}
            {(q.status === "sent" || q.status === "accepted") && (
              <Button variant="secondary" pending={move.isPending} onClick={() => move.mutate("declined")}>
                Mark declined
              </Button>
            )}
            {q.status === "deposit_paid" && !depositGivenBack && workOrderOpen && (
              <Link className={buttonClass("primary")} href={`/shop/work-orders/${workOrder.id}`}>
                Finish the work order to mark installed
              </Link>
            )}
            {q.status === "deposit_paid" && !depositGivenBack && !workOrderOpen && (
              <Button
                pending={move.isPending}
                onClick={() => {
                  if (workOrder === null && !window.confirm(INSTALL_WITHOUT_SHEET)) return;
                  move.mutate("installed");
                }}
              >
                Mark installed
              </Button>
            )}
          </div>
        }
      />
      <div aria-live="polite" className="mb-4 flex flex-col gap-2">
        {notice && <Alert tone="success">{notice}</Alert>}
        {problems && (
          <Alert tone="error" title={problems.title}>
            <ul className="list-disc pl-5">
              {problems.list.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </Alert>
        )}
      </div>
      {/* min-w-0: grid items would otherwise grow to the lines table's width and widen the page on a phone. */}
      <div className="grid gap-5 lg:grid-cols-[1.6fr_1fr]">
        <div className="flex min-w-0 flex-col gap-5">
          <Card className="min-w-0">
            <h2 className="text-lg font-semibold">Lines</h2>
            {!draft && <p className="text-sm text-basalt-600">Lines can be edited while the quote is a draft.</p>}
            {/* relative: the table's screen-reader-only labels are absolutely positioned; without a
                containing block here they escape the scrolling region and widen the page. */}
            <div
              className="scroll-cue relative overflow-x-auto"
              tabIndex={0}
              role="region"
              aria-label="Quote lines (scrolls sideways on a narrow screen)"
            >
              <QuoteLinesTable
                lines={form.lines}
                saved={detail.lines}
                editable={draft}
                onChange={(i, patch) => setLines((ls) => ls.map((l, j) => (j === i ? { ...l, ...patch } : l)))}
                onRemove={(i) => setLines((ls) => ls.filter((_, j) => j !== i))}
              />
            </div>
            {draft && (
              <>
                <div className="mt-3 flex flex-wrap items-end gap-3">
                  <Button variant="secondary" onClick={() => setLines((ls) => [...ls, labourLine(labourRateCents)])}>
                    Add a labour line
                  </Button>
                  <label className="flex flex-col gap-1 text-sm font-medium">
                    Quote discount ($)
                    <input
                      inputMode="decimal"
                      className="w-28 rounded-lg border border-basalt-300 px-3 py-2"
                      value={form.discount}
                      onChange={(e) => setForm((f) => ({ ...f, discount: e.target.value }))}
                    />
                  </label>
                  <label className="flex min-w-0 flex-1 basis-56 flex-col gap-1 text-sm font-medium">
                    Notes for the customer
                    <input
                      className="rounded-lg border border-basalt-300 px-3 py-2"
                      value={form.notes}
                      onChange={(e) => setForm((f) => ({ ...f, notes: e.target.value }))}
                    />
                  </label>
                  <Button pending={save.isPending} disabled={send.isPending} onClick={() => save.mutate()}>
                    Save lines
                  </Button>
                  <span role="status" className="text-sm text-basalt-600">
                    {dirty ? "Unsaved changes" : "All changes saved"}
                  </span>
                </div>
                <p className="mt-2 text-xs text-basalt-600">
                  Hourly labour takes part hours: 1.5, 1 1/2, 1½ or 1:30 (to the hundredth of an hour).
                </p>
                <CatalogItemPicker
                  vehicle={{ boltPattern: q.boltPattern, hubBoreMm: q.hubBoreMm }}
                  onAdd={(item) => {
                    setLines((ls) => [...ls, lineFromCatalog(item, q.wheelQty)]);
                    setNotice(`${item.description} added. Save the lines to keep it.`);
                  }}
                />
              </>
            )}
          </Card>
          <FitmentSummaryCard fit={fit} />
        </div>
        <div className="flex min-w-0 flex-col gap-5">
          <QuoteTotalsCard quote={q} stale={dirty} />
          <HubChecksCard
            checks={detail.hubChecks}
            hubBoreMm={q.hubBoreMm}
            boltPattern={q.boltPattern}
            haveLine={(d) => form.lines.some((l) => l.description === d)}
            onAddRings={draft ? (d, n) => setLines((ls) => [...ls, partsLine(d, n)]) : undefined}
          />
          <Card>
            <h2 className="text-lg font-semibold">Customer</h2>
            <p className="mt-1 break-words text-sm">
              {detail.customer.name}
              <br />
              {detail.customer.phone}
              <br />
              {detail.customer.email || <em>no e-mail — add one to send</em>}
            </p>
            <h2 className="mt-4 text-lg font-semibold">Vehicle</h2>
            <p className="mt-1 text-sm">
              {q.vehicleDescription}
              <br />
              Bolt pattern {q.boltPattern}
              {q.hubBoreMm !== null && <>, hub bore {q.hubBoreMm} mm</>}
            </p>
          </Card>
          <Card>
            <h2 className="text-lg font-semibold">History</h2>
            <ol className="mt-2 flex flex-col gap-1 text-sm" data-testid="quote-history">
              {detail.events.map((e) => (
                <li key={e.id}>
                  <span className="font-medium">{STATUS_LABEL[e.toStatus]}</span> — {e.actor}, {formatInstant(e.at, detail.timeZone)}
                  {e.note && <span className="text-basalt-600"> ({e.note})</span>}
                </li>
              ))}
            </ol>
            <Link href="/shop/quotes" className="mt-3 inline-block text-sm text-ember-700 underline">
              All quotes
            </Link>
          </Card>
        </div>
      </div>
    </>
  );
}
