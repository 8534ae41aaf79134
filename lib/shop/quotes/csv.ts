import Papa from "papaparse";
import { neutralizeTextCell } from "@/lib/shop/catalog/csv";
import type { QuoteListItem } from "./api";
import { formatCents } from "./money";
import { STATUS_LABEL } from "./status";

/** The export's columns, in order; amounts in dollars with a decimal point and no thousands separator. */
export const QUOTE_CSV_COLUMNS = [
  "quote",
  "created",
  "customer",
  "phone",
  "vehicle",
  "status",
  "total",
  "deposit",
  "valid_until",
  "written_by",
] as const;

const amount = (cents: number) => formatCents(cents).replace(/,/g, "");

/**
 * The quotes list as CSV. Every text cell a spreadsheet would run as a formula is neutralized
 * (neutralizeTextCell: names, phones and vehicle descriptions are typed by people); dates are ISO 8601.
 *
 * @example
 * quotesToCsv([{ number: 1042, customerName: "=cmd", totalCents: 123450, … }]);
 * // "quote,created,…\r\nQ-1042,2026-12-01T15:04:05.000Z,'=cmd,…,1234.50,…"
 */
export function quotesToCsv(quotes: readonly QuoteListItem[]): string {
  return Papa.unparse({
    fields: [...QUOTE_CSV_COLUMNS],
    data: quotes.map((q) => [
      `Q-${q.number}`,
      q.createdAt,
      neutralizeTextCell(q.customerName),
      neutralizeTextCell(q.customerPhone),
      neutralizeTextCell(q.vehicleDescription),
      STATUS_LABEL[q.status],
      amount(q.totalCents),
      amount(q.depositCents),
      q.validUntil ?? "",
      neutralizeTextCell(q.createdByName ?? ""),
    ]),
  });
}
