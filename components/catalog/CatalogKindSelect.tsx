import { SelectOptions } from "@/components/ui/SelectOptions";
import type { CatalogKind } from "@/lib/platform/db/types";
import { CATALOG_KIND_FILTERS } from "@/lib/shop/catalog/api";
import { CATALOG_QUERY_LABELS } from "@/lib/shop/catalog/schema";

/**
 * The "Kind" filter of a catalog search (all, tires, wheels or services): the catalog page's table
 * and the quote's item picker filter by the same kinds under the same label.
 */
export function CatalogKindSelect({ value, onChange }: { value: "" | CatalogKind; onChange: (kind: "" | CatalogKind) => void }) {
  return (
    <label className="flex flex-col gap-1 text-sm font-medium">
      {CATALOG_QUERY_LABELS.kind}
      <select
        className="min-h-10 rounded-lg border border-basalt-300 px-3"
        value={value}
        onChange={(e) => onChange(e.target.value as "" | CatalogKind)}
      >
        <SelectOptions options={[{ value: "", label: "All" }, ...CATALOG_KIND_FILTERS.map((k) => ({ value: k.kind, label: k.label }))]} />
      </select>
    </label>
  );
}
