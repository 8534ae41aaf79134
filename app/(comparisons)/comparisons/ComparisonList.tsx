"use client";
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { DisplayToggle } from "@/components/comparison/DisplayToggle";
import { useDisplayPrefs } from "@/components/comparison/useDisplayPrefs";
import { Alert } from "@/components/ui/Alert";
import { SearchField } from "@/components/ui/SearchField";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { SavedComparison } from "@/lib/comparisons/api";
import { COMPARISON_SORTS, COMPARISON_SORT_LABEL, type ComparisonSort } from "@/lib/comparisons/savedSchema";
import { ComparisonItem } from "./ComparisonItem";
import { useDebounced } from "./useDebounced";

// Importers (and the tests) take the link builder from the list module, as before the split.
export { workspaceHref } from "./workspaceHref";

type ListData = SavedComparison[];

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
        <SearchField
          label="Search by name or tire size"
          value={search}
          onValue={setSearch}
          maxLength={100}
          placeholder="e.g. 35x12.50 or trail"
          className="min-w-[14rem] flex-1 text-basalt-800"
          inputClassName="min-h-10 bg-white text-base placeholder:text-basalt-500"
        />
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
