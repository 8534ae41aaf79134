import { notFound } from "@/lib/platform/http/errors";
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
  const share = await comparisonQueries.createShare(caller.userId, params.id);
  if (!share) throw notFound("That comparison");
  await dropCachedShare(share.replaced);
  return json({ share: { slug: share.slug, createdAt: share.createdAt, path: `/s/${share.slug}` }, replaced: share.replaced }, 201);
});

/** Revokes the live link: /s/<slug> answers 404 from then on. */
export const DELETE = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const result = await comparisonQueries.revokeShare(caller.userId, params.id);
  if (!result) throw notFound("That comparison");
  await dropCachedShare(result.revoked);
  return { revoked: result.revoked !== null };
});
