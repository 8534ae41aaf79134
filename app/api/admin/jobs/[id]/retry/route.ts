import { z } from "zod";
import { db } from "@/lib/db";
import { route } from "@/lib/http/route";
import { retryJob } from "@/lib/server/jobs";

/** Runs a failed (or backing-off) job again now. */
export const POST = route({ access: ["admin"], params: z.object({ id: z.uuid() }) }, async ({ params }) => {
  await retryJob(db, params.id);
  return { ok: true };
});
