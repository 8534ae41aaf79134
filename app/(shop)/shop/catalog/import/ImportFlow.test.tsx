// @vitest-environment jsdom
import { cleanup, fireEvent, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { renderWithQuery } from "@/app/(shop)/shop/shopTestUtil";
import { ImportFlow } from "./ImportFlow";

vi.mock("next/link", () => import("@/tests/support/nextLink"));
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** An upload answered at once with `body` (the preview the import route returns). */
function answerUploadWith(body: unknown) {
  class FakeXhr {
    status = 200;
    responseText = JSON.stringify(body);
    upload: { onprogress: ((e: ProgressEvent) => void) | null } = { onprogress: null };
    onload: (() => void) | null = null;
    onerror: (() => void) | null = null;
    open() {}
    setRequestHeader() {}
    send() {
      queueMicrotask(() => this.onload?.());
    }
  }
  vi.stubGlobal("XMLHttpRequest", FakeXhr);
}

/** A preview of a file without problems, as the import route answers it; `counts` are what the test is about. */
const problemFree = (counts: { total: number; valid: number; newItems: number; updatedItems: number; unchangedItems: number }) => ({
  importId: "0a000000-0000-4000-8000-0000000000fd",
  ...counts,
  skippedRows: 0,
  problemCount: 0,
  errors: [],
});

async function pickFile() {
  renderWithQuery(<ImportFlow />);
  fireEvent.change(screen.getByLabelText("Catalog CSV file"), {
    target: { files: [new File(["x"], "catalog.csv", { type: "text/csv" })] },
  });
  return screen.findByTestId("import-summary");
}

describe("catalog import preview", () => {
  it("counts skipped rows and problems apart, and shows the rows as the file numbers them", async () => {
    answerUploadWith({
      importId: "0a000000-0000-4000-8000-0000000000ff",
      total: 12,
      valid: 3,
      newItems: 2,
      updatedItems: 1,
      unchangedItems: 0,
      skippedRows: 9,
      problemCount: 10,
      errors: [
        { row: 4, column: "price", message: "Price must be dollars like 249.99 (0 to 1,000,000), got “ten”." },
        { row: 4, column: "tire_size", message: "Enter the tire size, e.g. 35x12.50R17LT or LT285/70R17." },
        { row: 7, line: 8, column: "kind", message: "Kind must be tire, wheel or service." },
      ],
    });
    const summary = await pickFile();
    expect(summary.textContent).toBe("12 rows read · 3 ready (2 new, 1 updated) · 9 rows skipped, 10 problems");
    expect(screen.getAllByTestId("import-error").map((r) => r.firstElementChild?.textContent)).toEqual(["4", "4", "7 (line 8)"]);
    expect(screen.getByRole("button", { name: "Import 3 rows (skip 9 with problems)" })).toBeTruthy();
  });

  it("says one row and one problem in the singular", async () => {
    answerUploadWith({
      importId: "0a000000-0000-4000-8000-0000000000fe",
      total: 2,
      valid: 1,
      newItems: 1,
      updatedItems: 0,
      unchangedItems: 0,
      skippedRows: 1,
      problemCount: 1,
      errors: [{ row: 3, column: "sku", message: "Enter a SKU." }],
    });
    const summary = await pickFile();
    expect(summary.textContent).toBe("2 rows read · 1 ready (1 new, 0 updated) · 1 row skipped, 1 problem");
    expect(screen.getByRole("button", { name: "Import 1 row (skip 1 with problems)" })).toBeTruthy();
  });

  it("counts the rows equal to the shop's items apart from the ones that change something", async () => {
    // A file of four rows, all valid: one changes an item the shop has, three repeat what it has.
    answerUploadWith(problemFree({ total: 4, valid: 4, newItems: 0, updatedItems: 1, unchangedItems: 3 }));
    const summary = await pickFile();
    expect(summary.textContent).toBe("4 rows read · 4 ready (0 new, 1 updated, 3 unchanged)");
  });
});
