import { json, route } from "@/lib/platform/http/route";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { comparisonIdParams } from "@/lib/comparisons/savedSchema";

/** A copy of one of the caller's comparisons, named "… (copy)", without a share link. */
export const POST = route({ access: "signed-in", params: comparisonIdParams, idempotent: true }, async ({ caller, params }) => {
  const comparison = await comparisonQueries.duplicateComparison(caller.userId, params.id);
  return json({ comparison }, 201);
});
