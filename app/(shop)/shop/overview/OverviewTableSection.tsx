import type { ReactNode } from "react";
import { Table, type TableColumn } from "@/components/ui/Table";
import { OverviewSection } from "./OverviewSection";

/** What an overview table says besides its rows: every one has a caption for screen readers, a test id and a line for no rows. */
export interface OverviewTable<R> {
  caption: string;
  testId: string;
  rowKey: (row: R) => string;
  empty: ReactNode;
  columns: readonly TableColumn<R>[];
}

/**
 * An overview block that is one table: the section (heading, summing-up line, sideways scroll)
 * around the shared data table, so each card gives only its words, columns and rows.
 *
 * @example
 * <OverviewTableSection id="overview-week" title="This week in the bays" lead="…" table={BAYS_TABLE} rows={week.bays} />
 */
export function OverviewTableSection<R>({
  id,
  title,
  lead,
  table,
  rows,
}: {
  id: string;
  title: string;
  lead: ReactNode;
  table: OverviewTable<R>;
  rows: readonly R[];
}) {
  return (
    <OverviewSection id={id} title={title} lead={lead}>
      <Table {...table} rows={rows} />
    </OverviewSection>
  );
}
