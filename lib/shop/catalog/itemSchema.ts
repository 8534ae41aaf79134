/**
 * The single-item editor's schema (add or edit one catalog item without a file). The fields are
 * the catalog CSV's columns as text, checked by the CSV's own row rules (validateCatalogCells), so
 * an item typed on screen and one read from a file pass the same checks with the same messages;
 * each message names the field as the form labels it. Shared by the form and the route handlers.
 */
import { z } from "zod";
import type { CatalogItem } from "@/lib/shop/catalog/api";
import { type CatalogInput, type CsvColumn, validateCatalogCells } from "@/lib/shop/catalog/csv";

/** Each form field, the CSV column it stands for, and its label on the screen. */
export const CATALOG_ITEM_FIELDS = {
  kind: { column: "kind", label: "Kind" },
  sku: { column: "sku", label: "SKU" },
  description: { column: "description", label: "Description" },
  price: { column: "price", label: "Price ($)" },
  qtyOnHand: { column: "qty_on_hand", label: "On hand" },
  tireSize: { column: "tire_size", label: "Tire size" },
  wheelDiameterIn: { column: "wheel_diameter_in", label: "Wheel diameter (in)" },
  wheelWidthIn: { column: "wheel_width_in", label: "Wheel width (in)" },
  wheelOffsetMm: { column: "wheel_offset_mm", label: "Offset (mm)" },
  wheelBackspacingIn: { column: "wheel_backspacing_in", label: "Backspacing (in)" },
  wheelBackspacingReference: { column: "wheel_backspacing_reference", label: "Backspacing measured to" },
  boltPattern: { column: "bolt_pattern", label: "Bolt pattern" },
  centerBoreMm: { column: "center_bore_mm", label: "Centre bore (mm)" },
  beadlock: { column: "beadlock", label: "Beadlock" },
  serviceType: { column: "service_type", label: "Service type" },
  serviceUnit: { column: "service_unit", label: "Priced" },
} as const satisfies Record<string, { column: CsvColumn; label: string }>;

export const LOW_STOCK_LABEL = "Low stock at";

const FIELD_OF_LABEL = new Map(Object.entries(CATALOG_ITEM_FIELDS).map(([field, f]) => [f.label as string, field]));
const LABEL_OF_COLUMN = new Map(Object.values(CATALOG_ITEM_FIELDS).map((f) => [f.column as CsvColumn, f.label as string]));

const cell = z.string("Enter text.").max(200, "Use at most 200 characters.").optional().default("");
const shape = Object.fromEntries(Object.keys(CATALOG_ITEM_FIELDS).map((k) => [k, cell])) as Record<
  keyof typeof CATALOG_ITEM_FIELDS,
  typeof cell
>;

/** What the editor sends: every field as typed. */
export const catalogItemInputSchema = z.object({ ...shape, lowStockAt: cell });
export type CatalogItemFormValues = z.input<typeof catalogItemInputSchema>;

/** A checked item: the row's columns, and the low-stock mark (null: never warn). */
export interface CatalogItemSave {
  item: CatalogInput;
  lowStockAt: number | null;
}

/** The form's text → a checked item, or an issue on each field at fault, worded as the CSV import words it. */
export const catalogItemSchema = catalogItemInputSchema.transform((v, ctx): CatalogItemSave => {
  const cells = Object.fromEntries(Object.entries(CATALOG_ITEM_FIELDS).map(([k, f]) => [f.column, v[k as keyof typeof shape]]));
  const { item, errors } = validateCatalogCells(cells, (c) => LABEL_OF_COLUMN.get(c) ?? c);
  for (const e of errors) ctx.addIssue({ code: "custom", path: [FIELD_OF_LABEL.get(e.label) ?? "kind"], message: e.message });
  const low = v.lowStockAt.trim();
  let lowStockAt: number | null = null;
  if (low && !/^\d{1,7}$/.test(low))
    ctx.addIssue({
      code: "custom",
      path: ["lowStockAt"],
      message: `${LOW_STOCK_LABEL} must be a whole number 0 or more, or blank for never.`,
    });
  else if (low) lowStockAt = Number(low);
  return { item: item!, lowStockAt };
});

/** The editor's fields for a new item: a tire, everything else blank. */
export const EMPTY_CATALOG_ITEM: CatalogItemFormValues = {
  ...(Object.fromEntries([...Object.keys(CATALOG_ITEM_FIELDS), "lowStockAt"].map((f) => [f, ""])) as CatalogItemFormValues),
  kind: "tire",
  lowStockAt: "4",
};

/** An item as the editor's fields show it (the inverse of catalogItemSchema for a stored item). */
export function catalogItemFormValues(i: CatalogItem): CatalogItemFormValues {
  const n = (x: number | null) => (x === null ? "" : String(x));
  return {
    kind: i.kind,
    sku: i.sku,
    description: i.description,
    price: (i.priceCents / 100).toFixed(2),
    qtyOnHand: n(i.qtyOnHand),
    tireSize: i.tireSize ?? "",
    wheelDiameterIn: n(i.wheelDiameterIn),
    wheelWidthIn: n(i.wheelWidthIn),
    // A wheel entered by backspacing keeps it: the offset was computed from it.
    wheelOffsetMm: i.kind === "wheel" && i.wheelBackspacingIn === null ? n(i.wheelOffsetMm) : "",
    wheelBackspacingIn: n(i.wheelBackspacingIn),
    wheelBackspacingReference: i.wheelBackspacingReference ?? "",
    boltPattern: i.boltPattern ?? "",
    centerBoreMm: n(i.centerBoreMm),
    beadlock: i.kind === "wheel" ? (i.beadlock ? "yes" : "no") : "",
    serviceType: i.serviceType ?? "",
    serviceUnit: i.serviceUnit ?? "",
    lowStockAt: n(i.lowStockAt),
  };
}

/** PUT /api/shop/catalog/[id]/archived: archive an item or bring it back. */
export const archiveSchema = z.object({ archived: z.boolean("Say whether the item is archived (true or false).") });
