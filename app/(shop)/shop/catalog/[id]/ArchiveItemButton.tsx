"use client";
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";

/** Archives the item (it leaves the catalog's lists and pickers, quotes keep it) or brings it back. */
export function ArchiveItemButton({ itemId, archived }: { itemId: string; archived: boolean }) {
  const router = useRouter();
  const qc = useQueryClient();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const toggle = async () => {
    setPending(true);
    setError(null);
    try {
      await api(`/api/shop/catalog/${itemId}/archived`, { method: "PUT", body: { archived: !archived } });
      await qc.invalidateQueries({ queryKey: queryKeys.shop.catalog.all });
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setPending(false);
    }
  };
  return (
    <div className="flex flex-col gap-2">
      <Button variant="secondary" pending={pending} onClick={toggle} className="self-start">
        {archived ? "Bring back into the catalog" : "Archive item"}
      </Button>
      <div aria-live="polite">{error && <Alert tone="error">{error}</Alert>}</div>
    </div>
  );
}
