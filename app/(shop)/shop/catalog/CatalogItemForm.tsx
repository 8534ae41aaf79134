"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { labelOptions } from "@/components/ui/labelOptions";
import { SelectField } from "@/components/ui/SelectField";
import { TextField } from "@/components/ui/TextField";
import { fieldBinder } from "@/components/ui/fieldProps";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import { CATALOG_KIND_FILTERS, type CatalogItem } from "@/lib/shop/catalog/api";
import {
  CATALOG_ITEM_FIELDS,
  type CatalogItemFormValues,
  type CatalogItemSave,
  LOW_STOCK_LABEL,
  catalogItemSchema,
} from "@/lib/shop/catalog/itemSchema";
import { SERVICE_LABEL, UNIT_LABEL } from "@/lib/shop/catalog/labels";
import { BACKSPACING_REFERENCE_LABEL } from "@/lib/setup/fields";

const FIELDS = [...(Object.keys(CATALOG_ITEM_FIELDS) as (keyof typeof CATALOG_ITEM_FIELDS)[]), "lowStockAt"] as const;
const L = Object.fromEntries(Object.entries(CATALOG_ITEM_FIELDS).map(([k, f]) => [k, f.label])) as Record<
  keyof typeof CATALOG_ITEM_FIELDS,
  string
>;
/** Optional: "—" leaves the backspacing's reference unsaid. */
const BACKSPACING_REFERENCES = [{ value: "", label: "—" }, ...labelOptions(BACKSPACING_REFERENCE_LABEL, { capitalize: true })];
const NO_YES = labelOptions({ no: "No", yes: "Yes" });

/**
 * The owner's single-item editor: one tire, wheel or service, checked by the catalog CSV's own
 * rules (the same messages, naming these fields). `itemId` edits that item; without it, adds one.
 */
export function CatalogItemForm({ itemId, initial }: { itemId?: string; initial: CatalogItemFormValues }) {
  const router = useRouter();
  const qc = useQueryClient();
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const form = useForm<CatalogItemFormValues, unknown, CatalogItemSave>({
    resolver: zodResolver(catalogItemSchema),
    defaultValues: { ...initial, kind: initial.kind || "tire" },
  });
  const { handleSubmit, setError, formState, getValues } = form;
  const field = fieldBinder(form);
  const kind = useWatch({ control: form.control, name: "kind" });
  const onSubmit = handleSubmit(async () => {
    setMessage(null);
    // The text as typed goes to the server, which checks it with the same schema.
    const body = getValues();
    try {
      const { item } = await api<{ item: CatalogItem }>(itemId ? `/api/shop/catalog/${itemId}` : "/api/shop/catalog", {
        method: itemId ? "PUT" : "POST",
        body,
      });
      await qc.invalidateQueries({ queryKey: queryKeys.shop.catalog.all });
      if (itemId) {
        setMessage({ tone: "success", text: `${item.sku} saved.` });
        router.refresh();
      } else router.push(`/shop/catalog/${item.id}`);
    } catch (e) {
      const rest = applyFieldErrors(e, setError, FIELDS);
      if (rest) setMessage({ tone: "error", text: rest });
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3" aria-label={itemId ? "Edit item" : "Add an item"}>
      <div aria-live="polite">{message && <Alert tone={message.tone}>{message.text}</Alert>}</div>
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label={L.kind} options={CATALOG_KIND_FILTERS.map((k) => ({ value: k.kind, label: k.label }))} {...field("kind")} />
        <TextField label={L.sku} {...field("sku")} hint="Letters, digits and . _ / - (at most 64)." />
        <TextField label={L.description} className="sm:col-span-2" {...field("description")} />
        <TextField label={L.price} inputMode="decimal" {...field("price")} hint="e.g. 249.99" />
        {kind !== "service" && (
          <>
            <TextField label={L.qtyOnHand} inputMode="numeric" {...field("qtyOnHand")} hint="Units on the shelf; blank counts 0." />
            <TextField
              label={LOW_STOCK_LABEL}
              inputMode="numeric"
              {...field("lowStockAt")}
              hint="Warn at the counter when this many or fewer are left to sell; blank: never."
            />
          </>
        )}
      </div>
      {kind === "tire" && <TextField label={L.tireSize} {...field("tireSize")} hint="e.g. 35x12.50R17LT or LT285/70R17" />}
      {kind === "wheel" && (
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField label={L.wheelDiameterIn} inputMode="decimal" {...field("wheelDiameterIn")} />
          <TextField label={L.wheelWidthIn} inputMode="decimal" {...field("wheelWidthIn")} />
          <TextField label={L.wheelOffsetMm} inputMode="decimal" {...field("wheelOffsetMm")} hint="Give the offset or the backspacing." />
          <TextField label={L.wheelBackspacingIn} inputMode="decimal" {...field("wheelBackspacingIn")} />
          <SelectField label={L.wheelBackspacingReference} options={BACKSPACING_REFERENCES} {...field("wheelBackspacingReference")} />
          <TextField label={L.boltPattern} {...field("boltPattern")} hint="e.g. 6x5.5 or 8x165.1" />
          <TextField label={L.centerBoreMm} inputMode="decimal" {...field("centerBoreMm")} />
          <SelectField label={L.beadlock} options={NO_YES} {...field("beadlock")} />
        </div>
      )}
      {kind === "service" && (
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label={L.serviceType}
            options={[{ value: "", label: "—" }, ...labelOptions(SERVICE_LABEL)]}
            {...field("serviceType")}
          />
          <SelectField
            label={L.serviceUnit}
            options={[{ value: "", label: "The service's usual unit" }, ...labelOptions(UNIT_LABEL)]}
            {...field("serviceUnit")}
          />
        </div>
      )}
      <Button type="submit" pending={formState.isSubmitting} className="self-start">
        {itemId ? "Save item" : "Add item"}
      </Button>
    </form>
  );
}
