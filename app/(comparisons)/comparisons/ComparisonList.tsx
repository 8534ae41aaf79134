"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useEffect, useId, useState, useSyncExternalStore } from "react";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { Alert } from "@/components/ui/Alert";
import { Badge } from "@/components/ui/Badge";
import { Button, buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { type DisplayPrefs, formatLen, formatNumber } from "@/lib/comparisons/format";
import { readingPhrase } from "@/lib/comparisons/speedometer";
import { workspaceUrl } from "@/lib/comparisons/url";
import type { ComparisonShare, SavedComparison } from "@/lib/comparisons/api";
import { COMPARISON_SORTS, COMPARISON_SORT_LABEL, type ComparisonSort, comparisonNameSchema } from "@/lib/comparisons/savedSchema";

type ListData = SavedComparison[];

const noSubscribe = () => () => {};
/** The page's origin in the browser ("" while rendering on the server). */
function useOrigin(): string {
  return useSyncExternalStore(
    noSubscribe,
    () => window.location.origin,
    () => "",
  );
}

/** Opens the comparison in the workspace through the URL codec, remembering which saved one it is. */
export function workspaceHref(c: SavedComparison): string {
  return workspaceUrl({ input: c.input, savedId: c.id, vehicleId: c.vehicleId });
}

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

export function ComparisonList({ initial }: { initial: ListData }) {
  const [prefs, setPrefs] = useDisplayPrefs();
  const [search, setSearch] = useState("");
  const [sort, setSort] = useState<ComparisonSort>("updated");
  const q = useDebounced(search.trim(), 250);
  const list = useQuery({
    queryKey: queryKeys.comparisons.list({ q, sort }),
    queryFn: () => api<{ comparisons: ListData }>(`/api/comparisons?q=${encodeURIComponent(q)}&sort=${sort}`).then((r) => r.comparisons),
    initialData: q === "" && sort === "updated" ? initial : undefined,
    placeholderData: (prev) => prev,
  });
  const items = list.data ?? [];
  return (
    <div className="flex flex-col gap-4">
      <Card className="flex flex-wrap items-end gap-4 p-4">
        <label className="flex min-w-[14rem] flex-1 flex-col gap-1 text-sm font-medium text-basalt-800">
          Search by name or tire size
          <input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            maxLength={100}
            placeholder="e.g. 35x12.50 or trail"
            className="min-h-10 rounded-lg border border-basalt-300 bg-white px-3 text-base placeholder:text-basalt-500"
          />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium text-basalt-800">
          Sort
          <select
            value={sort}
            onChange={(e) => setSort(e.target.value as ComparisonSort)}
            className="min-h-10 rounded-lg border border-basalt-300 bg-white px-3 text-base"
          >
            {COMPARISON_SORTS.map((s) => (
              <option key={s} value={s}>
                {COMPARISON_SORT_LABEL[s]}
              </option>
            ))}
          </select>
        </label>
        <DisplayToggle prefs={prefs} onChange={setPrefs} />
      </Card>
      {list.isError && <Alert tone="error">{(list.error as Error).message}</Alert>}
      <p role="status" aria-live="polite" className="text-sm text-basalt-600 wrap-anywhere" data-testid="list-status">
        {list.isFetching && !list.isLoading
          ? "Updating…"
          : items.length === 0
            ? q
              ? `No saved comparison matches “${q}”.`
              : ""
            : `${items.length} saved comparison${items.length === 1 ? "" : "s"}${q ? ` matching “${q}”` : ""}.`}
      </p>
      {items.length === 0 && !q && !list.isLoading && (
        <Card className="text-center">
          <p className="text-basalt-700">Nothing saved yet. Build a comparison in the workspace and press “Save comparison”.</p>
          <Link href="/workspace" className={buttonClass("primary", "mt-4")}>
            Open the workspace
          </Link>
        </Card>
      )}
      <ul className="flex flex-col gap-3" aria-label="Saved comparisons">
        {items.map((c) => (
          <ComparisonItem key={c.id} c={c} prefs={prefs} />
        ))}
      </ul>
    </div>
  );
}

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="min-w-[7.5rem]">
      <dt className="text-xs font-semibold uppercase tracking-wide text-basalt-500">{label}</dt>
      <dd className="font-display text-base font-bold tabular-nums text-basalt-950">{value}</dd>
    </div>
  );
}

function ComparisonItem({ c, prefs }: { c: SavedComparison; prefs: DisplayPrefs }) {
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

function RenameForm({ name, onSave, onCancel }: { name: string; onSave: (name: string) => void; onCancel: () => void }) {
  const [value, setValue] = useState(name);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  return (
    <form
      noValidate
      className="flex flex-wrap items-start gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const parsed = comparisonNameSchema.safeParse(value);
        if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? "Check the name.");
        onSave(parsed.data);
      }}
    >
      <div className="flex min-w-[14rem] flex-1 flex-col gap-1">
        <label htmlFor={id} className="text-sm font-medium text-basalt-800">
          New name
        </label>
        <input
          id={id}
          value={value}
          maxLength={120}
          autoFocus
          onChange={(e) => {
            setValue(e.target.value);
            setError(null);
          }}
          onKeyDown={(e) => e.key === "Escape" && onCancel()}
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-error`}
          className="min-h-10 rounded-lg border border-basalt-300 bg-white px-3 text-base"
        />
        <p id={`${id}-error`} aria-live="polite" className="text-sm text-contact-600">
          {error}
        </p>
      </div>
      <div className="flex gap-2 pt-6">
        <Button type="submit" className="min-h-9 py-1.5">
          Save name
        </Button>
        <Button type="button" variant="ghost" className="min-h-9 py-1.5" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

function ShareControls({ c }: { c: SavedComparison }) {
  const qc = useQueryClient();
  const origin = useOrigin();
  const [copied, setCopied] = useState<"idle" | "done" | "failed">("idle");
  const [error, setError] = useState<string | null>(null);
  const inputId = useId();
  const done = () => qc.invalidateQueries({ queryKey: queryKeys.comparisons.all });
  const create = useMutation({
    mutationFn: () => api<{ share: ComparisonShare }>(`/api/comparisons/${c.id}/share`, { method: "POST" }),
    onMutate: () => setError(null),
    onError: (e) => setError((e as Error).message),
    onSettled: done,
  });
  const revoke = useMutation({
    mutationFn: () => api(`/api/comparisons/${c.id}/share`, { method: "DELETE" }),
    onMutate: () => setError(null),
    onError: (e) => setError((e as Error).message),
    onSettled: done,
  });
  const url = c.share ? `${origin}/s/${c.share.slug}` : null;
  const copy = async () => {
    if (!url) return;
    try {
      await navigator.clipboard.writeText(url);
      setCopied("done");
    } catch {
      setCopied("failed");
      (document.getElementById(inputId) as HTMLInputElement | null)?.select();
    }
  };
  return (
    <div className="mt-3 rounded-lg bg-dune-50 p-3 text-sm ring-1 ring-inset ring-basalt-100" data-testid="share-controls">
      {url ? (
        <div className="flex flex-wrap items-end gap-2">
          <div className="flex min-w-[16rem] flex-1 flex-col gap-1">
            <label htmlFor={inputId} className="font-medium text-basalt-800">
              Public link (anyone with it can view, read-only)
            </label>
            <input
              id={inputId}
              readOnly
              value={url}
              onFocus={(e) => e.currentTarget.select()}
              className="min-h-9 rounded-lg border border-basalt-300 bg-white px-3 font-mono text-sm"
              data-testid="share-url"
            />
          </div>
          <Button variant="secondary" className="min-h-9 py-1.5" onClick={copy}>
            Copy link
          </Button>
          <a href={`/s/${c.share!.slug}`} className={buttonClass("ghost", "min-h-9 py-1.5")} target="_blank" rel="noopener">
            View
          </a>
          <Button variant="secondary" className="min-h-9 py-1.5" pending={create.isPending} onClick={() => create.mutate()}>
            New link
          </Button>
          <Button variant="ghost" className="min-h-9 py-1.5 text-contact-800" pending={revoke.isPending} onClick={() => revoke.mutate()}>
            Revoke link
          </Button>
          <span role="status" className="w-full text-xs text-basalt-600">
            {copied === "done"
              ? "Link copied."
              : copied === "failed"
                ? "Copying was refused: the link is selected, press Ctrl+C (⌘C)."
                : "A new link or revoking makes the current one stop working at once."}
          </span>
        </div>
      ) : (
        <div className="flex flex-wrap items-center gap-3">
          <Button variant="secondary" className="min-h-9 py-1.5" pending={create.isPending} onClick={() => create.mutate()}>
            Create share link
          </Button>
          <span className="text-basalt-600">A read-only page with the drawing, results and charts; no account needed to view it.</span>
        </div>
      )}
      {error && (
        <p role="alert" className="mt-2 text-contact-600">
          {error}
        </p>
      )}
    </div>
  );
}
