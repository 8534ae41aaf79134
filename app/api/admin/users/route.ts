import { parseLabelledQuery } from "@/lib/platform/http/labelledQuery";
import { route } from "@/lib/platform/http/route";
import { userQueries } from "@/lib/accounts/queries";
import { USERS_SEARCH_LABEL, adminUsersQuerySchema } from "@/lib/accounts/adminSchema";

export const GET = route({ access: ["admin"] }, async ({ req }) => {
  // The page shows only the message, beside its search box.
  const query = parseLabelledQuery(adminUsersQuerySchema, req, { q: USERS_SEARCH_LABEL });
  const users = await userQueries.listUsers({ search: query.q });
  return { users };
});
