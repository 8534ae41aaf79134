"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/Button";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";

/** Removes one measured point; the vehicle's view reloads without it. */
export function DeletePoint({ vehicleId, clearanceId, label }: { vehicleId: string; clearanceId: string; label: string }) {
  const qc = useQueryClient();
  const m = useMutation({
    mutationFn: () => api(`/api/vehicles/${vehicleId}/clearances/${clearanceId}`, { method: "DELETE" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: queryKeys.garage.vehicle(vehicleId) }),
  });
  return (
    <Button
      variant="ghost"
      className="no-print min-h-8 px-2 py-1 text-xs"
      pending={m.isPending}
      onClick={() => m.mutate()}
      aria-label={`Delete point ${label}`}
    >
      Delete point
    </Button>
  );
}
