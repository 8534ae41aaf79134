/**
 * Test helper (the catalog CSV's and the single-item editor's tests): one invented 17x9 steel
 * wheel as catalog cells, and the same cells as the editor's fields, so both ways in are fed the
 * same item.
 * @example formFieldsOf({ ...INVENTED_WHEEL, wheel_width_in: "9" }).wheelWidthIn; // "9"
 */
import type { CsvColumn } from "./csv";
import { CATALOG_ITEM_FIELDS, type CatalogItemFormValues } from "./itemSchema";

type Cells = Partial<Record<CsvColumn, string>>;

/** Every cell a valid wheel needs except its width and offset or backspacing (the cases' own). */
export const INVENTED_WHEEL = {
  kind: "wheel",
  sku: "WH-T1",
  description: "Invented 17x9 wheel",
  price: "189",
  wheel_diameter_in: "17",
  bolt_pattern: "6x5.5",
} as const satisfies Cells;

/** The editor's fields holding `cells` (each field stands for one column: CATALOG_ITEM_FIELDS). */
export function formFieldsOf(cells: Cells): Partial<CatalogItemFormValues> {
  return Object.fromEntries(
    Object.entries(CATALOG_ITEM_FIELDS)
      .filter(([, f]) => cells[f.column] !== undefined)
      .map(([field, f]) => [field, cells[f.column]]),
  );
}
