import type { Metadata } from "next";
import { z } from "zod";
import { PageHeader } from "@/components/ui/PageHeader";
import { decodeComparison, workspaceParam } from "@/lib/comparisons/url";
import { admits, currentCaller } from "@/lib/platform/auth/session";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { garageQueries } from "@/lib/garage/queries";
import { SaveSlot } from "./SaveSlot";
import { Workspace } from "./Workspace";

export const metadata: Metadata = {
  title: "Comparison workspace",
  description:
    "Your current wheel and tire setup beside the one you plan: diameter, clearance, poke, scrub, track, speedometer and engine speed, with a to-scale drawing.",
};

/** `saved=<id>`: the saved comparison this link was opened from (the caller's own; anything else is ignored). */
async function openedFrom(userId: string | undefined, raw: string | null) {
  const id = z.uuid().safeParse(raw);
  if (!userId || !id.success) return null;
  const c = await comparisonQueries.findComparison(userId, id.data).catch(() => undefined);
  return c ? { id: c.id, name: c.name, vehicleId: c.vehicleId, input: c.input } : null;
}

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
      <PageHeader
        title="Comparison workspace"
        lead="Enter what you run and what you plan. Every figure updates as you type, in your browser; the link in the address bar reproduces this comparison."
      />
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
