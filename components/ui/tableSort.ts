/** Which column a table is ordered by, and which way; null for the rows' own order. */
export type TableSort = { id: string; desc: boolean } | null;

/** A row's value in the column it is sorted by; null (or undefined) has no value and sorts last. */
export type SortValue = number | string | null | undefined;

/**
 * The order after a click on column `id`'s header: ascending first, then descending, then back to
 * the rows' own order when `removable` (a list with a meaningful order of its own, such as the
 * finder's ranking); a table the server orders stays sorted and flips between the two.
 *
 * @example
 * nextSort(null, "price");                                 // { id: "price", desc: false }
 * nextSort({ id: "price", desc: false }, "price");         // { id: "price", desc: true }
 * nextSort({ id: "price", desc: true }, "price", true);    // null
 */
export function nextSort(current: TableSort, id: string, removable = false): TableSort {
  if (current?.id !== id) return { id, desc: false };
  if (!current.desc) return { id, desc: true };
  return removable ? null : { id, desc: false };
}

const collator = new Intl.Collator("en-US", { numeric: true, sensitivity: "base" });

/**
 * A sorted copy of `rows` by `value`: numbers by size, text in natural order ("17x9" before
 * "17x10"), rows without a value last in either direction, ties kept in their own order.
 *
 * @example
 * sortRows([{ d: 3 }, { d: null }, { d: 1 }], (r) => r.d, false); // d: 1, 3, null
 */
export function sortRows<R>(rows: readonly R[], value: (row: R) => SortValue, desc: boolean): R[] {
  const keyed = rows.map((row, index) => ({ row, index, v: value(row) }));
  keyed.sort((a, b) => {
    const aMissing = a.v === null || a.v === undefined || (typeof a.v === "number" && Number.isNaN(a.v));
    const bMissing = b.v === null || b.v === undefined || (typeof b.v === "number" && Number.isNaN(b.v));
    if (aMissing || bMissing) return aMissing === bMissing ? a.index - b.index : aMissing ? 1 : -1;
    const c =
      typeof a.v === "number" && typeof b.v === "number" ? (a.v === b.v ? 0 : a.v - b.v) : collator.compare(String(a.v), String(b.v));
    return c === 0 ? a.index - b.index : desc ? -c : c;
  });
  return keyed.map((k) => k.row);
}

/**
 * One page of `rows` (pages counted from 0); a page past the end shows the last page, so a list
 * that shrank under the reader never shows an empty page while rows remain.
 *
 * @example
 * pageOf(["a", "b", "c"], 1, 2); // { rows: ["c"], pageIndex: 1, pageCount: 2 }
 */
export function pageOf<R>(rows: readonly R[], pageIndex: number, pageSize: number): { rows: R[]; pageIndex: number; pageCount: number } {
  const pageCount = Math.max(1, Math.ceil(rows.length / pageSize));
  const index = Math.min(Math.max(0, pageIndex), pageCount - 1);
  return { rows: rows.slice(index * pageSize, (index + 1) * pageSize), pageIndex: index, pageCount };
}
