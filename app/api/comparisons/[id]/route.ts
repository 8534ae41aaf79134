import { json, route } from "@/lib/platform/http/route";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { dropCachedShare } from "@/lib/comparisons/shareCache";
import { comparisonIdParams, updateComparisonSchema } from "@/lib/comparisons/savedSchema";

// Another owner's comparison is a 404 (NotFoundError from the queries), like a missing one.

export const GET = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const comparison = await comparisonQueries.getComparison(caller.userId, params.id);
  return json({ comparison }, { headers: { "Cache-Control": "private, no-store" } });
});

/** Rename, change the setups (figures recomputed) or tie it to a vehicle. */
export const PATCH = route(
  { access: "signed-in", params: comparisonIdParams, body: updateComparisonSchema },
  async ({ caller, params, body }) => {
    const comparison = await comparisonQueries.updateComparison(caller.userId, params.id, body);
    await dropCachedShare(comparison.share?.slug);
    return { comparison };
  },
);

export const DELETE = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const deleted = await comparisonQueries.deleteComparison(caller.userId, params.id);
  await dropCachedShare(deleted.liveSlug);
  return { ok: true };
});
