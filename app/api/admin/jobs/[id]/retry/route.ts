import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { jobQueries } from "@/lib/platform/jobs/queries";

/** Runs a failed (or backing-off) job again now. */
export const POST = route({ access: ["admin"], params: z.object({ id: z.uuid() }) }, async ({ params }) => {
  await jobQueries.retryJob(params.id);
  return { ok: true };
});
