import { notFound } from "@/lib/http/errors";
import { json, route } from "@/lib/http/route";
import { comparisonQueries } from "@/lib/server/comparisons";
import { comparisonIdParams } from "@/lib/validation/comparisons";

/** A copy of one of the caller's comparisons, named "… (copy)", without a share link. */
export const POST = route({ access: "signed-in", params: comparisonIdParams, idempotent: true }, async ({ caller, params }) => {
  const comparison = await comparisonQueries.duplicateComparison(caller.userId, params.id);
  if (!comparison) throw notFound("That comparison");
  return json({ comparison }, 201);
});
