import { z } from "zod";
import { ConflictError } from "@/lib/platform/errors";
import { route } from "@/lib/platform/http/route";
import { catalogQueries } from "@/lib/shop/catalog/queries";
import { SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

/**
 * Step 2: confirm a previewed import. Upserts by SKU in one transaction and streams progress
 * as NDJSON lines: {"done":n,"total":m} … then {"imported":m} or {"error":"…"} (rolled back).
 */
export const POST = route({ access: SHOP_OWNER, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  const shopId = shopIdOf(caller);
  // A missing preview is a 404, one already confirmed a 409 (domain errors, answered by route()).
  await catalogQueries.getStagedImport(shopId, params.id);
  const enc = new TextEncoder();
  const stream = new ReadableStream<Uint8Array>({
    async start(controller) {
      const line = (o: unknown) => controller.enqueue(enc.encode(JSON.stringify(o) + "\n"));
      try {
        line(await catalogQueries.commitImport(shopId, params.id, (done, total) => line({ done, total })));
      } catch (e) {
        // The answer's status went out with the first line: a confirmation that lost the race says so here.
        if (e instanceof ConflictError) line({ error: e.message });
        else {
          console.error("catalog import failed, rolled back:", e);
          line({ error: "The import failed and nothing was changed. Try again." });
        }
      }
      controller.close();
    },
  });
  return new Response(stream, { headers: { "Content-Type": "application/x-ndjson; charset=utf-8", "Cache-Control": "no-store" } });
});
