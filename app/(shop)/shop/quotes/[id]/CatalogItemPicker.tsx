"use client";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { CatalogKindSelect } from "@/components/catalog/CatalogKindSelect";
import { StockLevel } from "@/components/catalog/StockLevel";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { SearchField } from "@/components/ui/SearchField";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";
import type { CatalogItem } from "@/lib/shop/catalog/api";
import type { CatalogKind } from "@/lib/platform/db/types";
import { checkWheelOnHub, hubRefusal } from "@/lib/shop/quotes/hubFit";
import { formatUsd } from "@/lib/shop/quotes/money";

/**
 * Finds any item of the shop's catalog (tires, wheels, every service) and adds it as a line.
 * A wheel is checked against the quoted vehicle's hub first: one that does not go on says why
 * and cannot be added; one that needs rings says so.
 */
export function CatalogItemPicker({
  vehicle,
  onAdd,
}: {
  vehicle: { boltPattern: string; hubBoreMm: number | null };
  onAdd: (item: CatalogItem) => void;
}) {
  const [text, setText] = useState("");
  const [kind, setKind] = useState<"" | CatalogKind>("");
  const [asked, setAsked] = useState<{ q: string; kind: string } | null>(null);
  const found = useQuery({
    queryKey: queryKeys.shop.catalog.pick(asked),
    queryFn: () =>
      api<{ items: CatalogItem[]; total: number }>(
        `/api/shop/catalog?${new URLSearchParams({ q: asked!.q, kind: asked!.kind, pageSize: "10" })}`,
      ),
    enabled: asked !== null,
  });
  return (
    <div className="mt-4 border-t border-basalt-100 pt-3">
      <form
        className="flex flex-wrap items-end gap-2"
        role="search"
        aria-label="Add from the catalog"
        onSubmit={(e) => {
          e.preventDefault();
          setAsked({ q: text.trim(), kind });
        }}
      >
        <SearchField
          label="Add from the catalog"
          className="min-w-48 flex-1"
          inputClassName="py-2"
          placeholder="SKU, description, size or bolt pattern"
          value={text}
          onValue={setText}
        />
        <CatalogKindSelect value={kind} onChange={setKind} />
        <Button type="submit" variant="secondary" pending={found.isFetching}>
          Find
        </Button>
      </form>
      <div aria-live="polite">
        {found.isError && (
          <Alert tone="error" className="mt-2">
            {(found.error as Error).message}
          </Alert>
        )}
        {found.data && found.data.items.length === 0 && <p className="mt-2 text-sm text-basalt-600">Nothing in the catalog matches.</p>}
      </div>
      {found.data && found.data.items.length > 0 && (
        <ul className="mt-2 divide-y divide-basalt-100 text-sm" aria-label="Catalog items found">
          {found.data.items.map((it) => {
            const hub = it.kind === "wheel" ? checkWheelOnHub(vehicle, { boltPattern: it.boltPattern, centerBoreMm: it.centerBoreMm }) : [];
            const refusal = hubRefusal(hub);
            const rings = hub.find((f) => f.code === "needs-rings");
            return (
              <li key={it.id} className="flex flex-wrap items-center justify-between gap-2 py-2" data-testid="catalog-pick">
                <span className="min-w-0 flex-1">
                  <span className="font-medium">{it.description}</span>
                  <span className="block text-basalt-600">
                    {it.sku} · {formatUsd(it.priceCents)}
                    {it.kind === "wheel" && ` · ${it.boltPattern}${it.centerBoreMm ? ` · bore ${it.centerBoreMm} mm` : ""}`}
                    {it.serviceUnit === "per_hour" && " · per hour"}
                  </span>
                  {it.kind !== "service" && (
                    <span className="block text-basalt-700">
                      <StockLevel item={it} />
                    </span>
                  )}
                  {refusal && <span className="block text-contact-800">Does not fit: {refusal}</span>}
                  {rings && <span className="block text-tight-800">Check: {rings.message}</span>}
                </span>
                {!refusal && (
                  <Button variant="secondary" className="min-h-8 py-1" aria-label={`Add ${it.description}`} onClick={() => onAdd(it)}>
                    Add
                  </Button>
                )}
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
