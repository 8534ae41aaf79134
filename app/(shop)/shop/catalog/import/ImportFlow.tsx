"use client";
import { useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useRef, useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { FailureRegion } from "@/components/ui/FailureRegion";
import { Card } from "@/components/ui/Card";
import { Table, type TableColumn } from "@/components/ui/Table";
import { ImportProgress } from "./ImportProgress";
import { CSV_MAX_BYTES } from "@/lib/shop/catalog/csv";
import { queryKeys } from "@/lib/platform/query/keys";
import { countOf } from "@/lib/platform/text";

interface Preview {
  importId: string | null;
  total: number;
  valid: number;
  newItems: number;
  updatedItems: number;
  /** Rows equal to the item the shop already has: confirming leaves those items as they are. */
  unchangedItems: number;
  /** Rows left out (a row with several problems counts once). */
  skippedRows: number;
  /** Problems found, the length of `errors` before it was cut at 500. */
  problemCount: number;
  errors: { row: number; line?: number; column: string; message: string }[];
}
type Phase =
  | { at: "pick" }
  | { at: "uploading"; pct: number }
  | { at: "preview"; preview: Preview; file: string }
  | { at: "importing"; done: number; total: number }
  | { at: "done"; imported: number; skipped: number };

function upload(file: File, onProgress: (pct: number) => void): Promise<{ status: number; body: Record<string, unknown> }> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/shop/catalog/import?filename=${encodeURIComponent(file.name)}`);
    xhr.setRequestHeader("Content-Type", "text/csv");
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(Math.round((e.loaded / e.total) * 100));
    xhr.onload = () => {
      let body: Record<string, unknown> = {};
      try {
        body = JSON.parse(xhr.responseText) as Record<string, unknown>;
      } catch {}
      resolve({ status: xhr.status, body });
    };
    xhr.onerror = () => resolve({ status: 0, body: { error: "The upload failed. Check your connection and try again." } });
    xhr.send(file);
  });
}

type ImportProblem = Preview["errors"][number];
/** In the file's order: row by row, as the spreadsheet shows them. */
const ERROR_COLUMNS: TableColumn<ImportProblem>[] = [
  {
    id: "row",
    header: "Row",
    cell: (e) => `${e.row}${e.line ? ` (line ${e.line})` : ""}`,
    className: "whitespace-nowrap pl-3 tabular-nums",
  },
  { id: "column", header: "Column", cell: (e) => <span className="font-mono text-xs">{e.column || "—"}</span> },
  { id: "problem", header: "Problem", cell: (e) => e.message },
];

/** "1 row", "9 rows": the preview counts rows and problems, never one for the other. */

export function ImportFlow() {
  const qc = useQueryClient();
  const input = useRef<HTMLInputElement>(null);
  const [phase, setPhase] = useState<Phase>({ at: "pick" });
  const [failure, setFailure] = useState<string | null>(null);

  async function onPick(file: File | undefined) {
    setFailure(null);
    if (!file) return;
    if (file.size > CSV_MAX_BYTES) {
      setFailure(`The file is larger than ${CSV_MAX_BYTES / 1024 / 1024} MB. Split the catalog into smaller files.`);
      return;
    }
    setPhase({ at: "uploading", pct: 0 });
    const res = await upload(file, (pct) => setPhase({ at: "uploading", pct }));
    if (res.status !== 200) {
      setFailure(String(res.body.error ?? `The upload failed (${res.status}).`));
      setPhase({ at: "pick" });
      if (input.current) input.current.value = "";
      return;
    }
    setPhase({ at: "preview", preview: res.body as unknown as Preview, file: file.name });
  }

  async function onConfirm(importId: string, total: number, skipped: number) {
    setFailure(null);
    setPhase({ at: "importing", done: 0, total });
    const res = await fetch(`/api/shop/catalog/import/${importId}`, { method: "POST" }).catch(() => null);
    if (!res?.ok || !res.body) {
      const body = (await res?.json().catch(() => ({}))) as { error?: string } | undefined;
      setFailure(body?.error ?? "The import could not start. Nothing was changed.");
      setPhase({ at: "pick" });
      return;
    }
    const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
    let buf = "";
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      buf += value;
      let nl: number;
      while ((nl = buf.indexOf("\n")) >= 0) {
        const msg = JSON.parse(buf.slice(0, nl)) as { done?: number; total?: number; imported?: number; error?: string };
        buf = buf.slice(nl + 1);
        if (msg.error) {
          setFailure(msg.error);
          setPhase({ at: "pick" });
          return;
        }
        if (msg.imported !== undefined) {
          setPhase({ at: "done", imported: msg.imported, skipped });
          await qc.invalidateQueries({ queryKey: queryKeys.shop.catalog.all });
        } else if (msg.done !== undefined) setPhase({ at: "importing", done: msg.done, total: msg.total ?? total });
      }
    }
  }

  return (
    <Card className="flex flex-col gap-4">
      <FailureRegion message={failure} title="Nothing was imported" />
      {(phase.at === "pick" || phase.at === "uploading") && (
        <div className="flex flex-col gap-1">
          <label htmlFor="catalog-file" className="text-sm font-medium">
            Catalog CSV file
          </label>
          <input
            ref={input}
            id="catalog-file"
            type="file"
            accept=".csv,text/csv"
            disabled={phase.at === "uploading"}
            onChange={(e) => void onPick(e.target.files?.[0])}
            className="text-sm file:mr-3 file:rounded-lg file:border-0 file:bg-basalt-900 file:px-4 file:py-2 file:font-semibold file:text-white"
          />
        </div>
      )}
      {phase.at === "uploading" && <ImportProgress label="Uploading and checking" value={phase.pct} max={100} />}
      {phase.at === "preview" && (
        <>
          <div>
            <h2 className="text-lg font-semibold">Preview of {phase.file}</h2>
            <p className="mt-1 text-sm" data-testid="import-summary">
              {countOf(phase.preview.total, "row")} read · {phase.preview.valid.toLocaleString("en-US")} ready (
              {phase.preview.newItems.toLocaleString("en-US")} new, {phase.preview.updatedItems.toLocaleString("en-US")} updated
              {phase.preview.unchangedItems > 0 && `, ${phase.preview.unchangedItems.toLocaleString("en-US")} unchanged`})
              {phase.preview.skippedRows > 0 &&
                ` · ${countOf(phase.preview.skippedRows, "row")} skipped, ${countOf(phase.preview.problemCount, "problem")}`}
            </p>
          </div>
          {phase.preview.problemCount > 0 && (
            <div
              className="max-h-96 overflow-auto rounded-lg ring-1 ring-basalt-200"
              tabIndex={0}
              role="region"
              aria-label="Problems by row"
            >
              <Table
                caption="Problems by row; row numbers as a spreadsheet shows them, the header being row 1"
                headClassName="sticky top-0 bg-basalt-50"
                columns={ERROR_COLUMNS}
                rows={phase.preview.errors}
                rowKey={(_e, i) => String(i)}
                rowTestId="import-error"
              />
              {phase.preview.problemCount > phase.preview.errors.length && (
                <p className="p-3 text-sm text-basalt-600">
                  … and {countOf(phase.preview.problemCount - phase.preview.errors.length, "more problem")}.
                </p>
              )}
            </div>
          )}
          <div className="flex flex-wrap gap-2">
            {phase.preview.importId ? (
              <Button onClick={() => void onConfirm(phase.preview.importId!, phase.preview.valid, phase.preview.skippedRows)}>
                Import {countOf(phase.preview.valid, "row")}
                {phase.preview.skippedRows ? ` (skip ${phase.preview.skippedRows.toLocaleString("en-US")} with problems)` : ""}
              </Button>
            ) : (
              <Alert tone="warning">No row can be imported. Fix the file and upload it again.</Alert>
            )}
            <Button variant="secondary" onClick={() => setPhase({ at: "pick" })}>
              Choose another file
            </Button>
          </div>
        </>
      )}
      {phase.at === "importing" && (
        <ImportProgress label="Importing (one transaction: all rows or none)" value={phase.done} max={phase.total} />
      )}
      {phase.at === "done" && (
        <Alert tone="success" title="Import finished">
          {phase.imported.toLocaleString("en-US")} items imported.
          {phase.skipped ? ` ${countOf(phase.skipped, "row")} with problems skipped.` : ""}{" "}
          <Link className="underline" href="/shop/catalog">
            Back to the catalog
          </Link>
        </Alert>
      )}
    </Card>
  );
}
