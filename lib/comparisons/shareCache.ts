import "server-only";
import { revalidatePath } from "next/cache";
import { db } from "@/lib/platform/db";
import { clearSharedMicrocache, purgeSharedMicrocache } from "@/lib/platform/http/microcache";
import { SHARE_PURGE_CHANNEL } from "@/lib/platform/http/sharePurge";
import { log } from "@/lib/platform/log";

/**
 * Share pages are rendered once and cached (see app/(share)/s/[slug]/page.tsx: `revalidate`).
 * When a link dies (revoked, replaced, comparison deleted) or its comparison changes, the
 * cached page and its Open Graph image are dropped here so the next visit renders afresh — a
 * revoked link answers 404 on the very next request on this server. The server's micro-cache in
 * front of Next (scripts/serve.ts) drops its copy too.
 *
 * Every other app server holds its own copies: a NOTIFY on {@link SHARE_PURGE_CHANNEL} tells
 * them (lib/platform/http/sharePurge.ts listens; scripts/serve.ts drops the copies). Awaited before the
 * route answers, so when the owner sees "revoked" every server has been told.
 */
export async function dropCachedShare(slug: string | null | undefined): Promise<void> {
  if (!slug) return;
  dropLocalCachedShare(slug);
  try {
    await db.raw("select pg_notify(?, ?)", [SHARE_PURGE_CHANNEL, slug]);
  } catch (error) {
    // The change itself is saved; other servers still drop their copy within the page's `revalidate`.
    log().error(
      { err: { message: (error as Error).message }, channel: SHARE_PURGE_CHANNEL },
      "could not tell the other servers to drop a share page",
    );
  }
}

/**
 * Drops this server's copies of /s/<slug> only (Next's page cache needs a request scope: a
 * route handler calls this). `null` drops every share page (after the listener reconnected and
 * may have missed purges).
 */
export function dropLocalCachedShare(slug: string | null): void {
  if (slug === null) {
    revalidatePath("/s/[slug]", "page");
    revalidatePath("/s/[slug]", "layout");
    clearSharedMicrocache();
    return;
  }
  revalidatePath(`/s/${slug}`);
  revalidatePath(`/s/${slug}`, "layout");
  purgeSharedMicrocache(`/s/${slug}`);
}
