import { json, route } from "@/lib/platform/http/route";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { RATE_LIMITS } from "@/lib/platform/limits/limits";
import { rateLimitQueries } from "@/lib/platform/limits/rateLimit";
import { dropCachedShare } from "@/lib/comparisons/shareCache";
import { comparisonIdParams } from "@/lib/comparisons/savedSchema";

/** Makes a new public link /s/<slug>; a live one is revoked (and stays dead). */
export const POST = route({ access: "signed-in", params: comparisonIdParams, idempotent: true }, async ({ caller, params }) => {
  // Every new link is a public page (and its Open Graph image): a cap per user stops link farming.
  await rateLimitQueries.consumeOrRefuse([{ spec: RATE_LIMITS.shareLinks, key: caller.userId }], "Too many new share links.");
  const { replaced, ...share } = await comparisonQueries.createShare(caller.userId, params.id);
  await dropCachedShare(replaced);
  return json({ share, replaced }, 201);
});

/** Revokes the live link: /s/<slug> answers 404 from then on. */
export const DELETE = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const result = await comparisonQueries.revokeShare(caller.userId, params.id);
  await dropCachedShare(result.revoked);
  return { revoked: result.revoked !== null };
});
