import { z } from "zod";
import { route } from "@/lib/platform/http/route";
import { sessionQueries } from "@/lib/accounts/sessionQueries";

// The explicit confirmation keeps a stray or replayed empty POST from signing a person out everywhere.
const body = z.object({ confirm: z.literal(true, { error: "Confirm that every session should end." }) });

/** "Sign out everywhere": ends every session of the caller, on every device, this one included. */
export const POST = route({ access: "signed-in", body }, async ({ caller }) => {
  await sessionQueries.endAllSessions(caller.userId);
  return { ok: true };
});
