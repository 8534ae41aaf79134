import type { ReactNode } from "react";
import { cx } from "./cx";
import { EmptyRow } from "./EmptyRow";

/** One column of a figures table: its header and how a row fills its cell. */
export interface FigureColumn<R> {
  id: string;
  header: ReactNode;
  /** The cell's content; the first column's cell is the row's header (`<th scope="row">`). */
  cell: (row: R) => ReactNode;
  /** Figures line up on the right. */
  align?: "end";
  /** Added to the column's header and cells (the chosen unit in bold, a column shown on paper only). */
  className?: string;
  /** Added to the column's header only (a width, the setup's colour). */
  headerClassName?: string;
  /** A test id on the column's cell in each row. */
  cellTestId?: (row: R) => string;
}

/**
 * The looks a figures table comes in. `ruled`: a rule under the header and under every row.
 * `quiet`: small capitals headers and a rule above each row. `banded`: a shaded header band and
 * padded cells, for two setups side by side in a frame. `bare`: none (a table for screen readers only).
 */
const LOOKS = {
  ruled: {
    table: "w-full text-sm",
    caption: "mb-1 text-left text-sm text-basalt-700",
    headRow: "border-b border-basalt-200 text-left",
    head: "py-1.5 pr-3 last:pr-0",
    row: "border-b border-basalt-100 align-top",
    cell: "py-1.5 pr-3 last:pr-0",
    rowHeader: "font-semibold",
  },
  quiet: {
    table: "w-full text-sm",
    caption: "mb-1 text-left text-sm text-basalt-700",
    headRow: "text-left text-xs uppercase tracking-wide text-basalt-600",
    head: "pb-1 pr-3 last:pr-0",
    row: "border-t border-basalt-100 align-top",
    cell: "py-2 pr-3 last:pr-0",
    rowHeader: "font-semibold",
  },
  /** No look of its own: figures for screen readers only, inside a visually hidden block. */
  bare: { table: "", caption: "", headRow: "", head: "", row: "", cell: "", rowHeader: "" },
  banded: {
    table: "w-full text-sm",
    caption: "mb-1 text-left text-sm text-basalt-700",
    headRow: "bg-basalt-50 text-left",
    head: "px-3 py-2 font-semibold",
    row: "border-t border-basalt-100 align-top",
    cell: "px-3 py-2",
    rowHeader: "font-medium text-basalt-700",
  },
} as const;
export type FigureTableLook = keyof typeof LOOKS;

/**
 * A table of figures: column headers (`scope="col"`), then one row per item whose first cell heads
 * the row (`scope="row"`), so a screen reader names every figure by its row and column. One look
 * for the tools' figures (equivalent sizes, torque passes, pressures per axle, trail angles, both
 * setups side by side); sorting and per-row forms are the data `Table`'s job.
 *
 * A table wider than a phone goes in a `scrollRegion`: a named region that takes the keyboard's
 * focus, so it can be scrolled sideways without a pointer.
 *
 * @example
 * <FigureTable look="quiet" caption="Trail angles" rows={angles} rowKey={(a) => a.kind}
 *   columns={[{ id: "angle", header: "Angle", cell: (a) => a.name }, { id: "deg", header: "Current", cell: (a) => `${a.deg}°` }]} />
 */
export function FigureTable<R>({
  columns,
  rows,
  rowKey,
  look = "ruled",
  caption,
  empty,
  rowTestId,
  rowHeaderClassName,
  cellClassName,
  className,
  testId,
  scrollRegion,
  id,
  footRows,
}: {
  columns: readonly FigureColumn<R>[];
  rows: readonly R[];
  rowKey: (row: R) => string;
  look?: FigureTableLook;
  /** Shown above the table; names it. */
  caption?: ReactNode;
  /** Shown in one full-width row when there are no rows. */
  empty?: ReactNode;
  rowTestId?: (row: R) => string;
  /** Replaces the look's weight and colour of the rows' first cells. */
  rowHeaderClassName?: string;
  /** Added to every header and cell (e.g. tighter rows on paper). */
  cellClassName?: string;
  className?: string;
  testId?: string;
  /** Wraps the table in a focusable region named `label` that scrolls sideways. */
  scrollRegion?: { label: string; className?: string };
  id?: string;
  /** Rows drawn after the listed ones (e.g. a figure whose one cell spans both setups). */
  footRows?: ReactNode;
}) {
  const l = LOOKS[look];
  const align = (c: FigureColumn<R>) => c.align === "end" && "text-right";
  const table = (
    <table id={id} className={cx(l.table, className) || undefined} data-testid={testId}>
      {caption && <caption className={l.caption || undefined}>{caption}</caption>}
      <thead>
        <tr className={l.headRow || undefined}>
          {columns.map((c) => (
            <th key={c.id} scope="col" className={cx(l.head, cellClassName, align(c), c.className, c.headerClassName) || undefined}>
              {c.header}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={rowKey(row)} className={l.row || undefined} data-testid={rowTestId?.(row)}>
            {columns.map((c, i) => {
              const props = {
                className: cx(l.cell, cellClassName, align(c), c.className) || undefined,
                "data-testid": c.cellTestId?.(row),
              };
              return i === 0 ? (
                <th key={c.id} scope="row" {...props} className={cx(props.className, "text-left", rowHeaderClassName ?? l.rowHeader)}>
                  {c.cell(row)}
                </th>
              ) : (
                <td key={c.id} {...props}>
                  {c.cell(row)}
                </td>
              );
            })}
          </tr>
        ))}
        {rows.length === 0 && empty && (
          <EmptyRow colSpan={columns.length} className="py-3 text-basalt-500">
            {empty}
          </EmptyRow>
        )}
        {footRows}
      </tbody>
    </table>
  );
  if (!scrollRegion) return table;
  return (
    <div
      className={cx("scroll-cue relative overflow-x-auto", scrollRegion.className)}
      tabIndex={0}
      role="region"
      aria-label={scrollRegion.label}
    >
      {table}
    </div>
  );
}
