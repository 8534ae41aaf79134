import { z } from "zod";
import { GARAGE_ACCESS } from "@/lib/garage/access";
import { loadQueries } from "@/lib/garage/loadQueries";
import { loadProfileSchema } from "@/lib/garage/loadSchema";
import { route } from "@/lib/platform/http/route";

const params = z.object({ id: z.uuid() });

/** The vehicle's placard, scale weights and body points (SI), or `profile: null` when none is stored. */
export const GET = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => ({
  profile: await loadQueries.getLoadProfile(caller.userId, params.id),
}));

/** Stores the whole profile; a refused figure is a 422 with a message per field and nothing stored. */
export const PUT = route({ access: GARAGE_ACCESS, params, body: loadProfileSchema }, async ({ caller, params, body }) => ({
  profile: await loadQueries.saveLoadProfile(caller.userId, params.id, body),
}));

export const DELETE = route({ access: GARAGE_ACCESS, params }, async ({ caller, params }) => {
  await loadQueries.deleteLoadProfile(caller.userId, params.id);
  return { ok: true };
});
