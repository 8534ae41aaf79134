// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { Table, type TableColumn } from "./Table";
import { useSortedRows } from "./useSortedRows";

afterEach(cleanup);

type Tire = { id: string; size: string; diameterMm: number };
const TIRES: Tire[] = [
  { id: "a", size: "35x12.50R17LT", diameterMm: 889 },
  { id: "b", size: "265/70R17", diameterMm: 802.8 },
  { id: "c", size: "33x12.50R17LT", diameterMm: 838.2 },
];
const COLUMNS: TableColumn<Tire>[] = [
  { id: "size", header: "Tire size", cell: (t) => t.size, sortable: true, sortValue: (t) => t.size },
  { id: "diameter", header: "Diameter", cell: (t) => `${t.diameterMm} mm`, sortable: true, sortValue: (t) => t.diameterMm, align: "end" },
  { id: "note", header: "Note", cell: () => "—" },
];

/** A table sorted in the browser, as the pages using it are. */
function Sorted() {
  const sorted = useSortedRows(TIRES, COLUMNS);
  return (
    <Table
      caption="Tires; column headers sort"
      columns={COLUMNS}
      rows={sorted.rows}
      rowKey={(t) => t.id}
      sort={sorted.sort}
      onSort={sorted.onSort}
    />
  );
}
const bodyRows = () => within(screen.getAllByRole("rowgroup")[1]!).getAllByRole("row");
const header = (name: string) => screen.getByRole("columnheader", { name: new RegExp(`^${name}`) });

describe("Table", () => {
  it("puts a button in each sortable header and none in the others", () => {
    render(<Sorted />);
    expect(within(header("Tire size")).getByRole("button", { name: "Tire size" })).toBeTruthy();
    expect(within(header("Diameter")).getByRole("button", { name: "Diameter" })).toBeTruthy();
    expect(within(header("Note")).queryByRole("button")).toBeNull();
    expect(screen.getByRole("table", { name: "Tires; column headers sort" })).toBeTruthy();
  });

  it("says the order on the sorted header only: ascending, descending, then the rows' own order", async () => {
    const user = userEvent.setup();
    render(<Sorted />);
    const button = screen.getByRole("button", { name: "Diameter" });
    expect(header("Diameter").getAttribute("aria-sort")).toBeNull();
    await user.click(button);
    expect(header("Diameter").getAttribute("aria-sort")).toBe("ascending");
    expect(header("Tire size").getAttribute("aria-sort")).toBeNull();
    expect(bodyRows().map((r) => r.textContent)).toEqual(["265/70R17802.8 mm—", "33x12.50R17LT838.2 mm—", "35x12.50R17LT889 mm—"]);
    await user.click(button);
    expect(header("Diameter").getAttribute("aria-sort")).toBe("descending");
    expect(bodyRows()[0]!.textContent).toMatch(/^35x12\.50R17LT/);
    await user.click(button);
    expect(header("Diameter").getAttribute("aria-sort")).toBeNull();
    expect(bodyRows()[0]!.textContent).toMatch(/^35x12\.50R17LT/);
  });

  it("sorts from the keyboard: Tab reaches the header's button, Enter and Space press it", async () => {
    const user = userEvent.setup();
    render(<Sorted />);
    await user.tab();
    expect(document.activeElement).toBe(screen.getByRole("button", { name: "Tire size" }));
    await user.keyboard("{Enter}");
    expect(header("Tire size").getAttribute("aria-sort")).toBe("ascending");
    await user.tab();
    expect(document.activeElement).toBe(screen.getByRole("button", { name: "Diameter" }));
    await user.keyboard(" ");
    expect(header("Diameter").getAttribute("aria-sort")).toBe("ascending");
    expect(header("Tire size").getAttribute("aria-sort")).toBeNull();
  });

  it("draws whole rows with renderRow, and the empty message across every column", () => {
    const renderRow = vi.fn((t: Tire) => (
      <tr key={t.id}>
        <td colSpan={3}>{t.size} row</td>
      </tr>
    ));
    const { rerender } = render(<Table columns={COLUMNS} rows={TIRES} rowKey={(t) => t.id} renderRow={renderRow} empty="Nothing fits." />);
    expect(bodyRows().map((r) => r.textContent)).toEqual(["35x12.50R17LT row", "265/70R17 row", "33x12.50R17LT row"]);
    rerender(<Table columns={COLUMNS} rows={[]} rowKey={(t) => t.id} empty="Nothing fits." />);
    const cell = screen.getByRole("cell", { name: "Nothing fits." });
    expect(cell.getAttribute("colspan")).toBe("3");
  });

  it("draws headers without buttons when the table has no onSort", () => {
    render(<Table columns={COLUMNS} rows={TIRES} rowKey={(t) => t.id} />);
    expect(screen.queryAllByRole("button")).toEqual([]);
  });
});
