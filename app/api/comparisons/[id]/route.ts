import { notFound } from "@/lib/platform/http/errors";
import { json, route } from "@/lib/platform/http/route";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { dropCachedShare } from "@/lib/comparisons/shareCache";
import { comparisonIdParams, updateComparisonSchema } from "@/lib/comparisons/savedSchema";

const NOT_FOUND = "That comparison";

export const GET = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const comparison = await comparisonQueries.getComparison(caller.userId, params.id);
  if (!comparison) throw notFound(NOT_FOUND);
  return json({ comparison }, { headers: { "Cache-Control": "private, no-store" } });
});

/** Rename, change the setups (figures recomputed) or tie it to a vehicle. */
export const PATCH = route({ access: "signed-in", params: comparisonIdParams, body: updateComparisonSchema }, async ({ caller, params, body }) => {
  const comparison = await comparisonQueries.updateComparison(caller.userId, params.id, body);
  if (!comparison) throw notFound(NOT_FOUND);
  await dropCachedShare(comparison.share?.slug);
  return { comparison };
});

export const DELETE = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const deleted = await comparisonQueries.deleteComparison(caller.userId, params.id);
  if (!deleted) throw notFound(NOT_FOUND);
  await dropCachedShare(deleted.liveSlug);
  return { ok: true };
});
