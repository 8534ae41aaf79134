"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useId, useState } from "react";
import { Badge } from "@/components/ui/Badge";
import { Button, buttonClass } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { type DisplayPrefs, formatLen, formatNumber } from "@/lib/comparisons/format";
import { readingPhrase } from "@/lib/comparisons/speedometer";
import type { SavedComparison } from "@/lib/comparisons/api";
import { Figure } from "./Figure";
import { RenameForm } from "./RenameForm";
import { ShareControls } from "./ShareControls";
import { workspaceHref } from "./workspaceHref";

type ListData = SavedComparison[];

/** One saved comparison in the list: its figures, and renaming, copying, deleting and sharing it. */
export function ComparisonItem({ c, prefs }: { c: SavedComparison; prefs: DisplayPrefs }) {
  const qc = useQueryClient();
  const headingId = useId();
  const [renaming, setRenaming] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [message, setMessage] = useState<{ tone: "error" | "ok"; text: string } | null>(null);
  const len = (mm: number) => formatLen(mm, prefs, { signed: true, decimals: prefs.units === "metric" ? 0 : 2 });
  const done = () => qc.invalidateQueries({ queryKey: queryKeys.comparisons.all });

  const rename = useMutation({
    mutationFn: (name: string) => api<{ comparison: SavedComparison }>(`/api/comparisons/${c.id}`, { method: "PATCH", body: { name } }),
    // Optimistic: every cached list shows the new name at once; rolled back if the server refuses.
    onMutate: async (name) => {
      await qc.cancelQueries({ queryKey: queryKeys.comparisons.lists });
      const before = qc.getQueriesData<ListData>({ queryKey: queryKeys.comparisons.lists });
      qc.setQueriesData<ListData>({ queryKey: queryKeys.comparisons.lists }, (old) =>
        old?.map((x) => (x.id === c.id ? { ...x, name: name.trim() } : x)),
      );
      setRenaming(false);
      setMessage(null);
      return { before };
    },
    onError: (error, _name, ctx) => {
      for (const [key, data] of ctx?.before ?? []) qc.setQueryData(key, data);
      setMessage({ tone: "error", text: `Not renamed: ${(error as Error).message}` });
    },
    onSettled: done,
  });
  const duplicate = useMutation({
    mutationFn: () => api<{ comparison: SavedComparison }>(`/api/comparisons/${c.id}/duplicate`, { method: "POST" }),
    onSuccess: ({ comparison }) => setMessage({ tone: "ok", text: `Copied as “${comparison.name}”.` }),
    onError: (error) => setMessage({ tone: "error", text: (error as Error).message }),
    onSettled: done,
  });
  const remove = useMutation({
    mutationFn: () => api(`/api/comparisons/${c.id}`, { method: "DELETE" }),
    onError: (error) => setMessage({ tone: "error", text: (error as Error).message }),
    onSettled: done,
  });

  const f = c.figures;
  return (
    // wrap-anywhere is inherited: a name that is one long word (it shows in the heading, the status
    // lines and the delete question) breaks where it must instead of widening the page.
    <li
      aria-labelledby={headingId}
      className="rounded-card bg-white p-4 shadow-card ring-1 ring-basalt-100 wrap-anywhere sm:p-5"
      data-testid="saved-comparison"
    >
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0 flex-1">
          {renaming ? (
            <RenameForm name={c.name} onCancel={() => setRenaming(false)} onSave={(name) => rename.mutate(name)} />
          ) : (
            <h2 id={headingId} className="text-lg font-semibold text-basalt-950">
              <Link href={workspaceHref(c)} className="hover:underline" data-testid="comparison-name">
                {c.name}
              </Link>
            </h2>
          )}
          <p className="mt-0.5 text-sm text-basalt-600">
            <span className="text-steel-800">{f.currentTire}</span> → <span className="text-ember-800">{f.plannedTire}</span>
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          {c.share ? <Badge tone="clear">Shared</Badge> : <Badge>Private</Badge>}
          {f.warningCount > 0 && <Badge tone="tight">{f.warningCount} to check</Badge>}
        </div>
      </div>
      <dl className="mt-3 flex flex-wrap gap-x-6 gap-y-2">
        <Figure label="Diameter" value={len(f.diameterChangeMm)} />
        <Figure label="Poke" value={len(f.pokeChangeMm)} />
        <Figure label="Scrub" value={len(f.scrubChangeMm)} />
        {/* The stored figure is (r − 1) × 100, actual speed above the indicated; say how the speedometer reads instead. */}
        <Figure label="Speedometer" value={readingPhrase(1 + f.speedometerErrorPct / 100)} />
        <Figure label="Suggested ratio" value={formatNumber(f.suggestedRatio, 2)} />
      </dl>
      <p className="mt-2 text-xs text-basalt-500">
        Changed{" "}
        <time dateTime={c.updatedAt}>{new Date(c.updatedAt).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" })}</time>
      </p>
      <div className="mt-3 flex flex-wrap items-center gap-2 border-t border-basalt-100 pt-3">
        <Link href={workspaceHref(c)} className={buttonClass("primary", "min-h-9 py-1.5")} aria-label={`Open ${c.name} in the workspace`}>
          Open in workspace
        </Link>
        {c.vehicleId && (
          <Link
            href={`/garage/${c.vehicleId}/checklist?comparison=${c.id}`}
            className={buttonClass("secondary", "min-h-9 py-1.5")}
            aria-label={`Install checklist for ${c.name}`}
            data-testid="comparison-checklist"
          >
            Install checklist
          </Link>
        )}
        {!renaming && (
          <Button variant="secondary" className="min-h-9 py-1.5" onClick={() => setRenaming(true)} aria-label={`Rename ${c.name}`}>
            Rename
          </Button>
        )}
        <Button
          variant="secondary"
          className="min-h-9 py-1.5"
          pending={duplicate.isPending}
          onClick={() => duplicate.mutate()}
          aria-label={`Duplicate ${c.name}`}
        >
          Duplicate
        </Button>
        {confirmDelete ? (
          <span className="flex items-center gap-2 text-sm">
            Delete for good{c.share ? " (its share link dies too)" : ""}?
            <Button variant="danger" className="min-h-9 py-1.5" pending={remove.isPending} onClick={() => remove.mutate()}>
              Delete
            </Button>
            <Button variant="ghost" className="min-h-9 py-1.5" onClick={() => setConfirmDelete(false)}>
              Keep
            </Button>
          </span>
        ) : (
          <Button
            variant="ghost"
            className="min-h-9 py-1.5 text-contact-800"
            onClick={() => setConfirmDelete(true)}
            aria-label={`Delete ${c.name}`}
          >
            Delete…
          </Button>
        )}
      </div>
      <ShareControls c={c} />
      <p aria-live="polite" className={message?.tone === "error" ? "mt-2 text-sm text-contact-600" : "mt-2 text-sm text-clear-800"}>
        {message?.text}
      </p>
    </li>
  );
}
