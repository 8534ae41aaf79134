import { z } from "zod";
import { db } from "@/lib/db";
import { route } from "@/lib/http/route";
import { listUsers } from "@/lib/server/users";

const query = z.object({ q: z.string().trim().max(100).optional() });

export const GET = route({ access: ["admin"], query }, async ({ query }) => {
  const users = await listUsers(db, { search: query.q });
  return { users };
});
