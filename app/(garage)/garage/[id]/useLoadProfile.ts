"use client";
import { useQuery } from "@tanstack/react-query";
import type { LoadProfile } from "@/lib/garage/loadProfile";
import { api } from "@/lib/platform/client/api";
import { queryKeys } from "@/lib/platform/query/keys";

/** The vehicle's load profile as the page reads it (the vehicle page and the finder; one request, shared through the query cache). */
export function useLoadProfile(vehicleId: string) {
  return useQuery({
    queryKey: queryKeys.garage.loadProfile(vehicleId),
    queryFn: () => api<{ profile: LoadProfile | null }>(`/api/vehicles/${vehicleId}/load`),
  });
}
