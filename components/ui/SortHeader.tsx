import type { ReactNode } from "react";
import { cx } from "./cx";

/**
 * A column header that sorts: the header cell says the order (`aria-sort`, on the sorted column
 * only) and holds a real button, so it is reached with Tab and pressed with Enter or Space. The
 * arrow is decoration; the button's name stays the column's name.
 */
export function SortHeader({
  children,
  direction,
  onSort,
  align,
  className,
}: {
  children: ReactNode;
  direction: "asc" | "desc" | null;
  onSort: () => void;
  align?: "end";
  className?: string;
}) {
  return (
    <th scope="col" aria-sort={direction === "asc" ? "ascending" : direction === "desc" ? "descending" : undefined} className={className}>
      <button
        type="button"
        onClick={onSort}
        className={cx(
          "inline-flex items-center gap-1 rounded text-left font-semibold uppercase tracking-wide hover:text-basalt-900",
          align === "end" && "flex-row-reverse text-right",
        )}
      >
        <span>{children}</span>
        {/* The arrow's room is kept when unsorted, so the header does not shift when clicked. */}
        <span aria-hidden className="inline-block w-3 shrink-0 text-center">
          {direction === "asc" ? "▲" : direction === "desc" ? "▼" : ""}
        </span>
      </button>
    </th>
  );
}
