import type { ReactNode } from "react";
import { cx } from "./cx";
import { SortHeader } from "./SortHeader";
import type { SortValue, TableSort } from "./tableSort";

/** One column: its header, how a row fills its cell, and whether its header sorts. */
export interface TableColumn<R> {
  id: string;
  header: ReactNode;
  /** The cell's content; not needed when the table's `renderRow` draws whole rows. */
  cell?: (row: R, index: number) => ReactNode;
  /** The header is a sort button (the table needs `onSort`). */
  sortable?: boolean;
  /** The row's value in this column, for tables sorted in the browser (see useSortedRows). */
  sortValue?: (row: R) => SortValue;
  /** Figures line up on the right. */
  align?: "end";
  /** Added to the column's header and cells. */
  className?: string;
}

/**
 * A data table: one look for every list of rows (header row, rules between rows, cell padding),
 * with sortable headers (see SortHeader). The caller keeps the order and the rows: `sort` says
 * which column the rows are in order of, `onSort` hears a header's click.
 *
 * Rows that hold state of their own (a form per row) are drawn by `renderRow` as whole `<tr>`s
 * in the columns' order; the columns then give only the headers.
 *
 * @example
 * <Table caption="Quotes" columns={[{ id: "n", header: "Quote", cell: (q) => q.number, sortable: true }]}
 *   rows={quotes} rowKey={(q) => q.id} sort={sort} onSort={(id) => setSort(nextSort(sort, id))} />
 */
export function Table<R>({
  columns,
  rows,
  rowKey,
  caption,
  sort = null,
  onSort,
  renderRow,
  rowTestId,
  empty,
  className,
  headClassName,
  bodyClassName,
  testId,
}: {
  columns: readonly TableColumn<R>[];
  rows: readonly R[];
  /** A key for the row; its place in `rows` is given for rows that have no id of their own. */
  rowKey: (row: R, index: number) => string;
  /** Read by screen readers only: what the table lists (and that its headers sort, when they do). */
  caption?: string;
  sort?: TableSort;
  onSort?: (columnId: string) => void;
  renderRow?: (row: R) => ReactNode;
  rowTestId?: string;
  /** Shown in one full-width cell when there are no rows. */
  empty?: ReactNode;
  className?: string;
  headClassName?: string;
  bodyClassName?: string;
  testId?: string;
}) {
  const endAligned = (c: TableColumn<R>) => c.align === "end" && "text-right";
  return (
    <table className={cx("w-full text-left text-sm", className)} data-testid={testId}>
      {caption && <caption className="sr-only">{caption}</caption>}
      <thead className={cx("text-xs uppercase tracking-wide text-basalt-600", headClassName)}>
        <tr>
          {columns.map((c) =>
            c.sortable && onSort ? (
              <SortHeader
                key={c.id}
                direction={sort?.id === c.id ? (sort.desc ? "desc" : "asc") : null}
                onSort={() => onSort(c.id)}
                align={c.align}
                className={cx("py-2 pr-3 align-bottom", endAligned(c), c.className)}
              >
                {c.header}
              </SortHeader>
            ) : (
              <th key={c.id} scope="col" className={cx("py-2 pr-3 align-bottom font-semibold", endAligned(c), c.className)}>
                {c.header}
              </th>
            ),
          )}
        </tr>
      </thead>
      <tbody className={cx("divide-y divide-basalt-100", bodyClassName)}>
        {rows.map((row, index) =>
          renderRow ? (
            renderRow(row)
          ) : (
            <tr key={rowKey(row, index)} data-testid={rowTestId}>
              {columns.map((c) => (
                <td key={c.id} className={cx("py-2 pr-3 align-top", c.align === "end" && "text-right tabular-nums", c.className)}>
                  {c.cell?.(row, index)}
                </td>
              ))}
            </tr>
          ),
        )}
        {rows.length === 0 && empty && (
          <tr>
            <td colSpan={columns.length} className="py-6 text-center text-basalt-600">
              {empty}
            </td>
          </tr>
        )}
      </tbody>
    </table>
  );
}
