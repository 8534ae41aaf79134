import { z } from "zod";
import { CATALOG_KINDS } from "@/lib/platform/db/types";
import { pagingFields } from "@/lib/platform/validation/paging";

export const CATALOG_SORT_KEYS = ["sku", "description", "price_cents", "qty_on_hand", "kind", "tire_diameter_mm", "updated_at"] as const;

/** The catalog table's server-side paging, sorting and filtering; messages for the table's controls. */
export const catalogQuerySchema = z.object({
  kind: z.union([z.enum(CATALOG_KINDS), z.literal("").transform(() => undefined)], "Pick tires, wheels or services.").optional(),
  q: z.string().trim().max(100, "Use at most 100 characters.").optional(),
  sort: z.enum(CATALOG_SORT_KEYS, "Sort by one of the table's columns.").optional(),
  dir: z.enum(["asc", "desc"], "Sort ascending or descending.").optional(),
  /** `archived=1`: the archived items only, to find one and bring it back. */
  archived: z
    .literal("1", "Show archived items with 1, or leave it out.")
    .transform(() => true)
    .optional(),
  ...pagingFields(200),
});

/** What the catalog table calls each control, so a refused query names it (CatalogTable.tsx). */
export const CATALOG_QUERY_LABELS = {
  q: "Search SKU, description, size or bolt pattern",
  kind: "Kind",
  sort: "Sort",
  dir: "Sort",
  archived: "Archived items only",
  page: "Page",
  pageSize: "Rows per page",
} as const;
