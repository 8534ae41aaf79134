import { json, route } from "@/lib/platform/http/route";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { createComparisonSchema, listComparisonsQuery } from "@/lib/comparisons/savedSchema";

/** The caller's saved comparisons, searched (name or tire size) and sorted. */
export const GET = route({ access: "signed-in", query: listComparisonsQuery }, async ({ caller, query }) => {
  const comparisons = await comparisonQueries.listComparisons(caller.userId, { q: query.q, sort: query.sort });
  return json({ comparisons }, { headers: { "Cache-Control": "private, no-store" } });
});

/** Saves a comparison; its key figures are computed here from the validated input. */
export const POST = route({ access: "signed-in", body: createComparisonSchema, idempotent: true }, async ({ caller, body }) => {
  const comparison = await comparisonQueries.createComparison(caller.userId, body);
  return json({ comparison }, 201);
});
