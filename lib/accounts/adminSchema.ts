import { z } from "zod";

/** The admin users page's search box, as the page labels it (a refused search names it). */
export const USERS_SEARCH_LABEL = "Search by name or e-mail";

export const adminUsersQuerySchema = z.object({ q: z.string().trim().max(100, "Use at most 100 characters.").optional() });
