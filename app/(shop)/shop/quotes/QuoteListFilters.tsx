import Link from "next/link";
import { Button } from "@/components/ui/Button";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { QUOTE_LIST_LABELS, QUOTE_SORTS, type QuoteListQuery, STATUS_FILTER_OPTIONS } from "@/lib/shop/quotes/listQuery";

const SORT_OPTIONS = Object.entries(QUOTE_SORTS).map(([value, label]) => ({ value, label }));

/**
 * The list's search, status and order as a plain GET form: the result is an address that can be
 * bookmarked or sent to a colleague, and the form works before (or without) the page's script.
 */
export function QuoteListFilters({ query, errors }: { query: QuoteListQuery; errors: Partial<Record<"q" | "status" | "sort", string>> }) {
  return (
    <form method="get" action="/shop/quotes" role="search" aria-label="Find quotes" className="mb-4 flex flex-wrap items-start gap-3">
      <TextField
        label={QUOTE_LIST_LABELS.q}
        name="q"
        type="search"
        maxLength={100}
        defaultValue={query.q ?? ""}
        hint="Customer, phone, quote number or vehicle"
        placeholder="e.g. Q-1042, 555-0160 or a vehicle"
        error={errors.q}
        className="w-80 max-w-full"
      />
      <SelectField
        label={QUOTE_LIST_LABELS.status}
        name="status"
        options={STATUS_FILTER_OPTIONS}
        defaultValue={query.status ?? ""}
        error={errors.status}
      />
      <SelectField label={QUOTE_LIST_LABELS.sort} name="sort" options={SORT_OPTIONS} defaultValue={query.sort} error={errors.sort} />
      {/* Level with the fields' boxes, below their labels (the hint under Search would push an end-aligned row off). */}
      <div className="flex gap-2 pt-6">
        <Button type="submit">Find</Button>
        <Link href="/shop/quotes" className="inline-flex min-h-10 items-center px-2 text-sm font-medium text-ember-700 underline">
          Clear
        </Link>
      </div>
    </form>
  );
}
