import { useState } from "react";
import type { TableColumn } from "./Table";
import { type TableSort, nextSort, sortRows } from "./tableSort";

/**
 * Sorting in the browser for a Table whose rows are all at hand: the order chosen by the headers
 * (ascending, descending, then the rows' own order again) and the rows in that order, each column
 * sorted by its `sortValue`.
 *
 * @example
 * const sorted = useSortedRows(quotes, COLUMNS);
 * <Table columns={COLUMNS} {...sorted} rowKey={(q) => q.id} />  // rows, sort and onSort
 */
export function useSortedRows<R>(
  rows: readonly R[],
  columns: readonly TableColumn<R>[],
): { rows: readonly R[]; sort: TableSort; onSort: (columnId: string) => void } {
  const [sort, setSort] = useState<TableSort>(null);
  const by = columns.find((c) => c.id === sort?.id)?.sortValue;
  return {
    rows: sort && by ? sortRows(rows, by, sort.desc) : rows,
    sort,
    onSort: (columnId) => setSort((current) => nextSort(current, columnId, true)),
  };
}
