import { z } from "zod";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { setupFromQuery } from "@/lib/setup/urlRead";
import { InvalidError } from "@/lib/platform/errors";
import { HttpError } from "@/lib/platform/http/errors";
import { route } from "@/lib/platform/http/route";
import { type NoPlannedSetup, type ResolvedChecklist, checklistQueries } from "@/lib/garage/checklistQueries";
import { checklistUpdateSchema, marginMmParam } from "@/lib/garage/schema";

const params = z.object({ id: z.uuid() });

/** A missing vehicle or comparison is a NotFoundError from the query; no planned setup is a bad query (400). */
function resolved(r: ResolvedChecklist | NoPlannedSetup): ResolvedChecklist {
  if (r.ok) return r;
  throw new HttpError(
    400,
    "Give the planned setup as pt, pd, pw and po (or pb and pr) query parameters, e.g. ?pt=35x12.50R17LT&pd=17&pw=9&po=-12, or a saved comparison as ?comparison=<id>.",
  );
}

/**
 * The checklist of a vehicle + planned setup, with its ticks. Query: `comparison=<id>` (a saved
 * comparison tied to this vehicle) or the planned setup as p* parameters; `m` a margin in mm
 * other than the vehicle's.
 */
export const GET = route({ access: GARAGE_ACCESS, params }, async ({ caller, params, req }) => {
  const q = req.nextUrl.searchParams;
  const comparisonId = z.uuid().safeParse(q.get("comparison")).data;
  if (q.get("comparison") !== null && !comparisonId) throw new HttpError(400, "comparison must be a saved comparison's id.");
  const r = resolved(
    await checklistQueries.resolveChecklist(caller.userId, params.id, {
      comparisonId,
      planned: setupFromQuery("p", q),
      marginMm: marginMmParam.parse(q.get("m") ?? undefined),
    }),
  );
  return {
    items: r.checklist.items,
    ticked: await checklistQueries.checklistTicks(r),
    marginMm: r.marginMm,
    comparisonId: r.comparison?.id ?? null,
  };
});

/** Saves which items are ticked. Ids must be items of this checklist. */
export const PUT = route({ access: GARAGE_ACCESS, params, body: checklistUpdateSchema }, async ({ caller, params, body }) => {
  const r = resolved(await checklistQueries.resolveChecklist(caller.userId, params.id, body));
  const known = new Set(r.checklist.items.map((i) => i.id));
  const unknown = body.ticked.filter((t) => !known.has(t));
  if (unknown.length)
    throw new InvalidError("Some ticked items are not on this checklist.", {
      ticked: [`Not on this checklist: ${unknown.slice(0, 5).join(", ")}`],
    });
  return { ticked: await checklistQueries.saveChecklistTicks(r, body.ticked) };
});
