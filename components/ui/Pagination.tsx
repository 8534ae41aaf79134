import { Button } from "./Button";

/**
 * Previous / "Page n of m" / Next under a paged list. The page line is announced when it changes,
 * so a screen reader hears where a click went.
 *
 * @example
 * <Pagination label="Catalog pages" pageIndex={0} pageCount={4} onPage={setPage} />
 */
export function Pagination({
  label,
  pageIndex,
  pageCount,
  onPage,
}: {
  label: string;
  pageIndex: number;
  pageCount: number;
  onPage: (pageIndex: number) => void;
}) {
  const last = Math.max(pageCount, 1) - 1;
  return (
    <nav aria-label={label} className="flex flex-wrap items-center gap-2 text-sm">
      <Button variant="secondary" className="min-h-8 py-1" onClick={() => onPage(pageIndex - 1)} disabled={pageIndex <= 0}>
        Previous
      </Button>
      <span aria-live="polite">
        Page {Math.min(pageIndex, last) + 1} of {last + 1}
      </span>
      <Button variant="secondary" className="min-h-8 py-1" onClick={() => onPage(pageIndex + 1)} disabled={pageIndex >= last}>
        Next
      </Button>
    </nav>
  );
}
