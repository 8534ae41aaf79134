import { z } from "zod";
import { HttpError, notFound } from "@/lib/platform/http/errors";
import { route } from "@/lib/platform/http/route";
import { catalogQueries } from "@/lib/shop/catalog/queries";
import { SHOP_OWNER, shopIdOf } from "@/lib/shop/queries";

/**
 * Step 2: confirm a previewed import. Upserts by SKU in one transaction and streams progress
 * as NDJSON lines: {"done":n,"total":m} … then {"imported":m} or {"error":"…"} (rolled back).
 */
export const POST = route({ access: SHOP_OWNER, params: z.object({ id: z.uuid() }) }, async ({ caller, params }) => {
  const shopId = shopIdOf(caller);
  const staged = await catalogQueries.findStagedImport(shopId, params.id);
  if (!staged) throw notFound("That import preview");
  if (staged.status !== "staged") throw new HttpError(409, "This import was already confirmed.");
  const enc = new TextEncoder();
  const stream = new ReadableStream<Uint8Array>({
    async start(controller) {
      const line = (o: unknown) => controller.enqueue(enc.encode(JSON.stringify(o) + "\n"));
      try {
        const result = await catalogQueries.commitImport(shopId, params.id, (done, total) => line({ done, total }));
        line(result ?? { error: "This import was already confirmed." });
      } catch (e) {
        console.error("catalog import failed, rolled back:", e);
        line({ error: "The import failed and nothing was changed. Try again." });
      }
      controller.close();
    },
  });
  return new Response(stream, { headers: { "Content-Type": "application/x-ndjson; charset=utf-8", "Cache-Control": "no-store" } });
});
