"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useId, useState } from "react";
import { Button, buttonClass } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { ComparisonShare, SavedComparison } from "@/lib/comparisons/api";
import { useOrigin } from "./useOrigin";

/** The saved comparison's public link: create, copy, view, replace or revoke it. */
export function ShareControls({ c }: { c: SavedComparison }) {
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
