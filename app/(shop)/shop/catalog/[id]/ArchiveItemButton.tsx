"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";

/** Archives the item (it leaves the catalog's lists and pickers, quotes keep it) or brings it back. */
export function ArchiveItemButton({ itemId, archived }: { itemId: string; archived: boolean }) {
  const router = useRouter();
  const qc = useQueryClient();
  const toggle = useMutation({
    mutationFn: () => api(`/api/shop/catalog/${itemId}/archived`, { method: "PUT", body: { archived: !archived } }),
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: queryKeys.shop.catalog.all });
      router.refresh();
    },
  });
  return (
    <div className="flex flex-col gap-2">
      <Button variant="secondary" pending={toggle.isPending} onClick={() => toggle.mutate()} className="self-start">
        {archived ? "Bring back into the catalog" : "Archive item"}
      </Button>
      <div aria-live="polite">{toggle.error && <Alert tone="error">{toggle.error.message}</Alert>}</div>
    </div>
  );
}
