import { z } from "zod";
import { CSV_MAX_BYTES, decodeCsvBytes, parseCatalogCsv } from "@/lib/shop/catalog/csv";
import { readCappedBytes } from "@/lib/platform/http/body";
import { InvalidError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { catalogQueries } from "@/lib/shop/catalog/queries";
import { SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

const MAX_ERRORS_SHOWN = 500;
/** The picked file's name, kept for the import's record: a long one is cut, never a reason to refuse the upload. */
const FILENAME = z.object({
  filename: z
    .string()
    .transform((f) => f.slice(0, 200))
    .optional(),
});

/**
 * Step 1 of an import: the CSV file as the request body → a preview with a row-by-row report.
 * Valid rows are staged (nothing touches the catalog until the owner confirms).
 */
export const POST = route({ access: SHOP_OWNER, query: FILENAME }, async ({ caller, req, query }) => {
  const bytes = await readCappedBytes(req, CSV_MAX_BYTES);
  const decoded = decodeCsvBytes(bytes);
  if ("error" in decoded) throw new InvalidError(decoded.error);
  const report = parseCatalogCsv(decoded.text);
  if (report.fileErrors.length) throw new InvalidError(report.fileErrors.join(" "), undefined, { fileErrors: report.fileErrors });
  if (report.total === 0) throw new InvalidError("The file has a header row but no items.");
  const staged = report.items.length
    ? await catalogQueries.stageImport(shopIdOf(caller), caller.userId, query.filename ?? "", report)
    : null;
  return {
    importId: staged?.id ?? null,
    total: report.total,
    valid: report.items.length,
    newItems: staged?.newItems ?? 0,
    updatedItems: staged?.updatedItems ?? 0,
    unchangedItems: staged?.unchangedItems ?? 0,
    // Rows and problems are counted apart: one row can have several problems, and it is rows that are skipped.
    skippedRows: report.skippedRows,
    problemCount: report.errors.length,
    errors: report.errors.slice(0, MAX_ERRORS_SHOWN),
  };
});
