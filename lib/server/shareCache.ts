import "server-only";
import { revalidatePath } from "next/cache";

/**
 * Share pages are rendered once and cached (see app/(share)/s/[slug]/page.tsx: `revalidate`).
 * When a link dies (revoked, replaced, comparison deleted) or its comparison changes, the
 * cached page and its Open Graph image are dropped here so the next visit renders afresh — a
 * revoked link answers 404 on the very next request on this server.
 */
export function dropCachedShare(slug: string | null | undefined): void {
  if (!slug) return;
  revalidatePath(`/s/${slug}`);
  revalidatePath(`/s/${slug}`, "layout");
}
