import type { Metadata } from "next";
import { z } from "zod";
import { PageHeader } from "@/components/ui/PageHeader";
import { workspaceParam } from "@/lib/comparisons/url";
import { decodeComparison } from "@/lib/comparisons/urlRead";
import { admits, currentCaller } from "@/lib/platform/auth/session";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { garageQueries } from "@/lib/garage/queries";
import { SaveSlot } from "./SaveSlot";
import { WORKSPACE_LEAD, WORKSPACE_METADATA } from "./pageText";
import { Workspace } from "./Workspace";

export const metadata: Metadata = WORKSPACE_METADATA;

/** `saved=<id>`: the saved comparison this link was opened from (the caller's own; anything else is ignored). */
async function openedFrom(userId: string | undefined, raw: string | null) {
  const id = z.uuid().safeParse(raw);
  if (!userId || !id.success) return null;
  const c = await comparisonQueries.findComparison(userId, id.data).catch(() => undefined);
  return c ? { id: c.id, name: c.name, vehicleId: c.vehicleId, input: c.input } : null;
}

/**
 * The workspace rendered for the request: members (their garage, their saved comparison) and
 * links carrying a comparison. A visitor's bare /workspace is the prerendered ./visitor page (proxy.ts).
 */
export default async function WorkspacePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const sp = await searchParams;
  const { input, problems } = decodeComparison(sp);
  const caller = await currentCaller().catch(() => null);
  const saved = await openedFrom(caller?.userId, workspaceParam(sp, "saved"));
  // Members see their garage: `v` (or the saved comparison's vehicle) picks one of their own vehicles.
  const vehicles = caller && admits(GARAGE_ACCESS, caller) ? await garageQueries.workspaceVehicles(caller.userId) : null;
  const wanted = workspaceParam(sp, "vehicle") ?? saved?.vehicleId ?? null;
  const garage = vehicles ? { vehicles, initialVehicleId: vehicles.some((v) => v.id === wanted) ? wanted : null } : null;
  return (
    <>
      <PageHeader title="Comparison workspace" lead={WORKSPACE_LEAD} />
      <Workspace
        initialInput={input}
        initialProblems={problems}
        garage={garage}
        savedId={saved?.id ?? null}
        saveSlot={<SaveSlot signedIn={caller !== null} saved={saved} />}
      />
    </>
  );
}
