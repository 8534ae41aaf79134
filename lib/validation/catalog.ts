import { z } from "zod";
import { CATALOG_KINDS } from "@/lib/db/types";

export const CATALOG_SORT_KEYS = ["sku", "description", "price_cents", "qty_on_hand", "kind", "tire_diameter_mm", "updated_at"] as const;

/** The catalog table's server-side paging, sorting and filtering. */
export const catalogQuerySchema = z.object({
  kind: z.enum(CATALOG_KINDS).optional().or(z.literal("").transform(() => undefined)),
  q: z.string().trim().max(100).optional(),
  sort: z.enum(CATALOG_SORT_KEYS).optional(),
  dir: z.enum(["asc", "desc"]).optional(),
  page: z.coerce.number().int().min(1).max(100000).optional(),
  pageSize: z.coerce.number().int().min(1).max(200).optional(),
});
export type CatalogQueryInput = z.infer<typeof catalogQuerySchema>;
