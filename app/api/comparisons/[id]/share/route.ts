import { notFound } from "@/lib/http/errors";
import { json, route } from "@/lib/http/route";
import { comparisonQueries } from "@/lib/server/comparisons";
import { dropCachedShare } from "@/lib/server/shareCache";
import { comparisonIdParams } from "@/lib/validation/comparisons";

/** Makes a new public link /s/<slug>; a live one is revoked (and stays dead). */
export const POST = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const share = await comparisonQueries.createShare(caller.userId, params.id);
  if (!share) throw notFound("That comparison");
  dropCachedShare(share.replaced);
  return json({ share: { slug: share.slug, createdAt: share.createdAt, path: `/s/${share.slug}` }, replaced: share.replaced }, 201);
});

/** Revokes the live link: /s/<slug> answers 404 from then on. */
export const DELETE = route({ access: "signed-in", params: comparisonIdParams }, async ({ caller, params }) => {
  const result = await comparisonQueries.revokeShare(caller.userId, params.id);
  if (!result) throw notFound("That comparison");
  dropCachedShare(result.revoked);
  return { revoked: result.revoked !== null };
});
