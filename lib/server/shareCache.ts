import "server-only";
import { revalidatePath } from "next/cache";
import { purgeSharedMicrocache } from "@/lib/http/microcache";

/**
 * Share pages are rendered once and cached (see app/(share)/s/[slug]/page.tsx: `revalidate`).
 * When a link dies (revoked, replaced, comparison deleted) or its comparison changes, the
 * cached page and its Open Graph image are dropped here so the next visit renders afresh — a
 * revoked link answers 404 on the very next request on this server. The server's micro-cache in
 * front of Next (scripts/serve.ts) drops its copy too.
 */
export function dropCachedShare(slug: string | null | undefined): void {
  if (!slug) return;
  revalidatePath(`/s/${slug}`);
  revalidatePath(`/s/${slug}`, "layout");
  purgeSharedMicrocache(`/s/${slug}`);
}
