/**
 * Reads CSV text into records numbered the way a person finds them again: `row` is the row a
 * spreadsheet shows (the first record is row 1, blank rows keep their numbers, a quoted cell with
 * a line break stays inside its row) and `line` is the line a text editor shows where the record
 * starts. The two differ only after a cell that holds a line break.
 */
import Papa from "papaparse";

export interface CsvRecord {
  cells: string[];
  /** Spreadsheet row, 1-based. */
  row: number;
  /** Text line where the record starts, 1-based. */
  line: number;
  /** Every cell empty or spaces: a blank row, skipped but still counted. */
  blank: boolean;
  /** Why the record could not be read, in words for the person who made the file. */
  problem?: string;
}

/** papaparse's error codes in plain words; its own messages are written for programmers. */
const PROBLEM: Record<string, string> = {
  MissingQuotes: 'A quoted cell is never closed: a " opens it and no " ends it, so the rest of the file may have been read into this cell.',
  InvalidQuotes: 'A quote mark inside a quoted cell must be written twice ("").',
};

const LINE_BREAK = /\r\n|\n|\r/g;

export function readCsvRecords(text: string): CsvRecord[] {
  const records: CsvRecord[] = [];
  let start = 0;
  let line = 1;
  Papa.parse<string[]>(text, {
    header: false,
    skipEmptyLines: false,
    // A step per record is what gives each record its place in the text (meta.cursor).
    step: (result) => {
      const cells = result.data;
      // "Delimiter" only says the comma was assumed (a file of one column, or a short one): not a problem of the row.
      const error = result.errors.find((e) => e.type !== "Delimiter");
      records.push({
        cells,
        row: records.length + 1,
        line,
        blank: cells.every((c) => c.trim() === ""),
        ...(error
          ? { problem: PROBLEM[error.code] ?? "The cells of this row could not be told apart. Check its quote marks and commas." }
          : {}),
      });
      const end = result.meta.cursor;
      line += (text.slice(start, end).match(LINE_BREAK) ?? []).length;
      start = end;
    },
  });
  return records;
}
