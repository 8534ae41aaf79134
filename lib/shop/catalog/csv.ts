/**
 * The Hubface catalog CSV (format v1, documented in docs/catalog-csv.md): parsing with
 * papaparse, row-by-row validation through the fitment engine, and export. Pure: no database.
 */
import Papa from "papaparse";
import { FitmentInputError, parseTireSize } from "@/lib/fitment";
import {
  type CatalogItemRow,
  type CatalogKind,
  SERVICE_TYPES,
  SERVICE_UNITS,
  type ServiceType,
  type ServiceUnit,
} from "@/lib/platform/db/types";
import { formatCents, parseMoneyToCents } from "@/lib/shop/quotes/money";
import { readCsvRecords } from "./records";
import { readWheelCells } from "./wheelCells";

/** Every column of the format, in the order export and the template write them. */
export const CSV_COLUMNS = [
  "kind",
  "sku",
  "description",
  "price",
  "qty_on_hand",
  "tire_size",
  "wheel_diameter_in",
  "wheel_width_in",
  "wheel_offset_mm",
  "wheel_backspacing_in",
  "wheel_backspacing_reference",
  "bolt_pattern",
  "center_bore_mm",
  "beadlock",
  "service_type",
  "service_unit",
] as const;
export type CsvColumn = (typeof CSV_COLUMNS)[number];

/**
 * Header names of earlier files, still read: each stands for the column it was renamed to, and
 * problems in it are reported under the name the file uses.
 */
export const OLD_CSV_HEADERS: Readonly<Record<string, CsvColumn>> = { backspacing_from: "wheel_backspacing_reference" };
export const REQUIRED_COLUMNS: readonly CsvColumn[] = ["kind", "sku", "description", "price"];

/** Largest file accepted, bytes (a 10,000-row catalog is about 1.5 MB). */
export const CSV_MAX_BYTES = 5 * 1024 * 1024;
export const CSV_MAX_ROWS = 20_000;

/** The default unit a service is priced in when the column is empty. */
export const DEFAULT_SERVICE_UNIT: Record<ServiceType, ServiceUnit> = {
  mount_balance: "per_wheel",
  beadlock_assembly: "per_wheel",
  valve_stem: "per_wheel",
  tpms: "per_wheel",
  alignment: "per_vehicle",
  fender_trim: "per_hour",
  disposal: "per_wheel",
  other: "per_vehicle",
};

/** A validated row, ready to upsert (columns as stored, without ids and timestamps). */
/** Stock held by quotes, the low-stock mark and archiving are kept by the app, never by a file. */
export type CatalogInput = Omit<
  CatalogItemRow,
  "id" | "shop_id" | "created_at" | "updated_at" | "qty_reserved" | "low_stock_at" | "archived_at"
>;

/** A row with no cell read yet; its keys are every stored field a file sets, listed only here. */
function blankCatalogInput(): CatalogInput {
  return {
    kind: "service",
    sku: "",
    description: "",
    price_cents: 0,
    qty_on_hand: null,
    tire_size: null,
    tire_rim_in: null,
    tire_diameter_mm: null,
    wheel_diameter_in: null,
    wheel_width_in: null,
    wheel_offset_mm: null,
    wheel_backspacing_in: null,
    wheel_backspacing_reference: null,
    bolt_pattern: null,
    center_bore_mm: null,
    beadlock: false,
    service_type: null,
    service_unit: null,
  };
}

/** The stored fields an import replaces on an item the shop already has (the SKU is what matched it). */
export const IMPORTED_FIELDS = (Object.keys(blankCatalogInput()) as (keyof CatalogInput)[]).filter((f) => f !== "sku");

/**
 * Whether an import row would leave the stored item as it is: every imported field equal (numbers
 * as numbers, a missing value as null). The preview counts such rows "unchanged", and confirming
 * does not touch them.
 *
 * @example
 * importChanges({ ...row, price_cents: 38900 }, { ...stored, price_cents: 38900 }); // false
 * importChanges({ ...row, price_cents: 39900 }, { ...stored, price_cents: 38900 }); // true
 */
export function importChanges(row: CatalogInput, stored: Readonly<Record<string, unknown>>): boolean {
  return IMPORTED_FIELDS.some((f) => {
    const [a, b] = [row[f] ?? null, stored[f] ?? null];
    return a !== b && !(typeof a === "number" && typeof b === "number" && Math.abs(a - b) < 1e-9);
  });
}

export interface RowError {
  /** The row a spreadsheet shows: the header is row 1, blank rows keep their numbers. */
  row: number;
  /** The text line where the row starts, given only when it differs from `row` (a cell above held a line break). */
  line?: number;
  column: string;
  message: string;
}

export interface CsvReport {
  /** Problems with the file as a whole (encoding, headers, size): nothing can be imported. */
  fileErrors: string[];
  items: (CatalogInput & { row: number })[];
  /** Every problem found; a row can have several. */
  errors: RowError[];
  /** Item rows read (valid or not; blank rows are not items). */
  total: number;
  /** Item rows left out because they have at least one problem. */
  skippedRows: number;
}

const SKU_RE = /^[A-Za-z0-9][A-Za-z0-9._/-]{0,63}$/;

/**
 * Columns written as numbers by export. Their cells are never neutralized: a spreadsheet reads
 * "-12" as the number −12 (a wheel's offset), not a formula, and export only ever writes plain
 * decimal numbers there. Every other column is text and is neutralized.
 */
const NUMERIC_COLUMNS: ReadonlySet<CsvColumn> = new Set([
  "price",
  "qty_on_hand",
  "wheel_diameter_in",
  "wheel_width_in",
  "wheel_offset_mm",
  "wheel_backspacing_in",
  "center_bore_mm",
]);

/** A text cell a spreadsheet would run as a formula (=, +, -, @, tab, CR), behind any quotes neutralization added. */
const FORMULA_START = /^'*[=+\-@\t\r]/;

/**
 * CSV injection defence for a text cell (OWASP "CSV Injection": prefix a single quote to a
 * cell starting with = + - @ tab or CR). A cell that already starts with quotes before such a
 * character gets one more, so import's unquoteTextCell gives back exactly what was stored.
 *
 * @example neutralizeTextCell("=HYPERLINK(\"x\")"); // "'=HYPERLINK(\"x\")"
 * @example neutralizeTextCell("Mount and balance"); // unchanged
 */
export function neutralizeTextCell(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

/** The inverse of neutralizeTextCell, applied to text columns on import. */
export function unquoteTextCell(value: string): string {
  return FORMULA_START.test(value) && value.startsWith("'") ? value.slice(1) : value;
}

/**
 * Bytes of an uploaded file → text, or a file error: it must be UTF-8 (a BOM is dropped) and
 * must not contain NUL bytes (a binary file renamed to .csv).
 */
export function decodeCsvBytes(bytes: Uint8Array): { text: string } | { error: string } {
  if (bytes.byteLength === 0) return { error: "The file is empty." };
  if (bytes.byteLength > CSV_MAX_BYTES) return { error: `The file is larger than ${CSV_MAX_BYTES / 1024 / 1024} MB.` };
  if (bytes.includes(0))
    return { error: "This is not a text file (it contains NUL bytes). Export the catalog as CSV (UTF-8) and try again." };
  try {
    const text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
    return { text: text.replace(/^\uFEFF/, "") };
  } catch {
    return { error: "The file is not UTF-8 text. Save it as “CSV UTF-8” and try again." };
  }
}

/** Parses and validates catalog CSV text. File-level problems stop before any row is read. */
export function parseCatalogCsv(text: string): CsvReport {
  const report: CsvReport = { fileErrors: [], items: [], errors: [], total: 0, skippedRows: 0 };
  const records = readCsvRecords(text);
  const headerAt = records.findIndex((r) => !r.blank);
  const header = records[headerAt];
  if (header?.problem) {
    report.fileErrors.push(`The header row (row ${header.row}) could not be read: ${header.problem}`);
    return report;
  }
  const written = (header?.cells ?? []).map((h) => h.trim().toLowerCase());
  const headers = written.map((h) => OLD_CSV_HEADERS[h] ?? h);
  /** A column as this file names it. */
  const asWritten = (c: string) => written[headers.indexOf(c)] ?? c;
  const unknown = headers.filter((h) => !(CSV_COLUMNS as readonly string[]).includes(h));
  const missing = REQUIRED_COLUMNS.filter((c) => !headers.includes(c));
  const dupHeaders = headers.filter((h, i) => headers.indexOf(h) !== i);
  if (unknown.length)
    report.fileErrors.push(
      `Unknown column${unknown.length > 1 ? "s" : ""}: ${unknown
        .slice(0, 8)
        .map((u) => JSON.stringify(u))
        .join(", ")}. The header row uses these names: ${CSV_COLUMNS.join(", ")}.`,
    );
  if (missing.length) report.fileErrors.push(`Missing column${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}.`);
  if (dupHeaders.length) {
    const dups = [...new Set(dupHeaders)];
    const renamed = written.filter((h) => OLD_CSV_HEADERS[h] && dups.includes(OLD_CSV_HEADERS[h]));
    report.fileErrors.push(
      `Column named twice: ${dups.join(", ")}.${renamed.map((h) => ` ${h} is the earlier name of ${OLD_CSV_HEADERS[h]}.`).join("")}`,
    );
  }
  if (report.fileErrors.length) return report;
  const rows = records.slice(headerAt + 1).filter((r) => !r.blank);
  if (rows.length > CSV_MAX_ROWS) {
    report.fileErrors.push(`The file has ${rows.length} rows; at most ${CSV_MAX_ROWS} are imported at once. Split it into several files.`);
    return report;
  }

  const firstRowOfSku = new Map<string, number>();
  for (const rec of rows) {
    const { row } = rec;
    const at = rec.line === row ? { row } : { row, line: rec.line };
    report.total++;
    const errs: RowError[] = [];
    if (rec.problem) errs.push({ ...at, column: "", message: rec.problem });
    else if (rec.cells.length !== headers.length) {
      // A missing or extra comma shifts every cell after it into the wrong column: refuse the row rather than guess.
      errs.push({
        ...at,
        column: "",
        message: `This row has ${rec.cells.length} cells; the header row has ${headers.length}. Check for a missing or extra comma.`,
      });
    } else {
      const raw = Object.fromEntries(headers.map((h, i) => [h, rec.cells[i] ?? ""]));
      const item = validateRow(raw, at, errs, asWritten);
      if (item) {
        const key = item.sku.toLowerCase();
        const first = firstRowOfSku.get(key);
        if (first !== undefined)
          errs.push({ ...at, column: "sku", message: `SKU ${item.sku} is also on row ${first}; each SKU appears once.` });
        else {
          firstRowOfSku.set(key, row);
          report.items.push({ ...item, row });
        }
      }
    }
    if (errs.length) {
      report.errors.push(...errs);
      report.skippedRows++;
    }
  }
  return report;
}

/**
 * One item's cells (named by CSV column, as text) checked by the same rules and messages as a
 * file's row: the single-item editor uses it so an item reads the same whichever way it came in.
 * `labelOf` names a column the way the caller's screen does, in messages and in `errors[].label`.
 *
 * @example
 * validateCatalogCells({ kind: "service", sku: "SV-X", description: "Valve stem", price: "5", service_type: "valve_stem" }).item?.service_unit; // "per_wheel"
 */
export function validateCatalogCells(
  cells: Partial<Record<CsvColumn, string>>,
  labelOf: (c: CsvColumn) => string = (c) => c,
): { item: CatalogInput | null; errors: { label: string; message: string }[] } {
  const errs: RowError[] = [];
  const item = validateRow(cells as Record<string, string>, { row: 1 }, errs, (c) => labelOf(c as CsvColumn));
  return { item, errors: errs.map((e) => ({ label: e.column, message: e.message })) };
}

function validateRow(
  raw: Record<string, string>,
  at: Pick<RowError, "row" | "line">,
  errs: RowError[],
  asWritten: (c: string) => string,
): CatalogInput | null {
  const v = (c: CsvColumn) => (NUMERIC_COLUMNS.has(c) ? (raw[c] ?? "") : unquoteTextCell(raw[c] ?? "")).trim();
  const fail = (column: CsvColumn | "", message: string) => void errs.push({ ...at, column: asWritten(column), message });
  const before = errs.length;

  const kindText = v("kind").toLowerCase();
  const kind = (["tire", "wheel", "service"] as const).find((k) => k === kindText) as CatalogKind | undefined;
  if (!kind) fail("kind", `Kind must be tire, wheel or service${kindText ? `, got “${v("kind")}”` : ""}.`);

  const sku = v("sku");
  if (!SKU_RE.test(sku)) fail("sku", sku ? "SKU uses letters, digits and . _ / - (at most 64 characters)." : "Enter a SKU.");

  const description = v("description");
  if (!description) fail("description", "Enter a description.");
  else if (description.length > 200) fail("description", "Use at most 200 characters.");

  const price = parseMoneyToCents(v("price"));
  if (price === null || price < 0 || price > 100_000_000)
    fail("price", `Price must be dollars like 249.99 (0 to 1,000,000)${v("price") ? `, got “${v("price")}”` : ""}.`);

  let qty: number | null = null;
  const qtyText = v("qty_on_hand");
  if (qtyText) {
    if (!/^\d{1,7}$/.test(qtyText)) fail("qty_on_hand", `Quantity on hand must be a whole number 0 or more, got “${qtyText}”.`);
    else qty = Number(qtyText);
  } else if (kind === "tire" || kind === "wheel") qty = 0;

  const item: CatalogInput = {
    ...blankCatalogInput(),
    kind: kind ?? "service",
    sku,
    description,
    price_cents: price ?? 0,
    qty_on_hand: qty,
  };

  if (kind === "tire") {
    const text = v("tire_size");
    if (!text) fail("tire_size", "Enter the tire size, e.g. 35x12.50R17LT or LT285/70R17.");
    else {
      try {
        const size = parseTireSize(text);
        item.tire_size = size.text;
        item.tire_rim_in = size.rimDiameterIn;
        item.tire_diameter_mm = size.overallDiameterMm;
      } catch (e) {
        fail("tire_size", e instanceof FitmentInputError ? e.message : "This tire size could not be read.");
      }
    }
  }

  if (kind === "wheel") readWheelCells(v, fail, item, asWritten);

  if (kind === "service") {
    const type = v("service_type").toLowerCase() as ServiceType;
    if (!(SERVICE_TYPES as readonly string[]).includes(type))
      fail("service_type", `Service type must be one of ${SERVICE_TYPES.join(", ")}.`);
    else {
      item.service_type = type;
      const unit = (v("service_unit").toLowerCase() || DEFAULT_SERVICE_UNIT[type]) as ServiceUnit;
      if (!(SERVICE_UNITS as readonly string[]).includes(unit))
        fail("service_unit", `Service unit must be one of ${SERVICE_UNITS.join(", ")}.`);
      else item.service_unit = unit;
    }
  }

  return errs.length > before ? null : item;
}

/**
 * Catalog items → CSV text in the documented format (round-trips through parseCatalogCsv).
 * Text cells that would start a formula are neutralized (neutralizeTextCell); numbers are not.
 */
export function catalogToCsv(items: readonly CatalogInput[]): string {
  const n = (x: number | null) => (x === null ? "" : String(Number(x.toFixed(3))));
  const safe = (row: (string | number)[]) =>
    row.map((cell, i) => (NUMERIC_COLUMNS.has(CSV_COLUMNS[i]!) ? cell : neutralizeTextCell(String(cell))));
  return Papa.unparse(
    {
      fields: [...CSV_COLUMNS],
      data: items.map((i) =>
        safe([
          i.kind,
          i.sku,
          i.description,
          formatCents(i.price_cents).replace(/,/g, ""),
          i.qty_on_hand ?? "",
          i.tire_size ?? "",
          n(i.wheel_diameter_in),
          n(i.wheel_width_in),
          i.kind === "wheel" && i.wheel_backspacing_in === null ? n(i.wheel_offset_mm) : "",
          n(i.wheel_backspacing_in),
          i.wheel_backspacing_reference ?? "",
          i.bolt_pattern ?? "",
          n(i.center_bore_mm),
          i.kind === "wheel" ? (i.beadlock ? "yes" : "no") : "",
          i.service_type ?? "",
          i.service_unit ?? "",
        ]),
      ),
    },
    { newline: "\r\n" },
  );
}

/** The downloadable template: the header and one example row of each kind (invented products). */
export const CSV_TEMPLATE = [
  CSV_COLUMNS.join(","),
  "tire,TR-EXAMPLE-35,Example all-terrain 35x12.50R17LT load range E,389.00,8,35x12.50R17LT 121Q E,,,,,,,,,,",
  "wheel,WH-EXAMPLE-17,Example 17x9 steel wheel -12 mm,189.00,12,,17,9,-12,,,6x5.5,108,no,,",
  "wheel,WH-EXAMPLE-BL,Example 17x9 beadlock 4.5 in backspacing,465.00,4,,17,9,,4.5,flange,6x139.7,108,yes,,",
  "service,SV-MOUNT,Mount and balance,30.00,,,,,,,,,,,mount_balance,per_wheel",
  "",
].join("\r\n");
