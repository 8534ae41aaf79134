import type { Who } from "../support/http";

/**
 * One row of the role matrix: a route handler (or the HTTP face of a server action), called as
 * each kind of caller, and the status each must get. Every area adds a file beside this one
 * exporting `cases`; roleMatrix.test.ts loads them all and checks that every route.ts in app/
 * has at least one row per exported method.
 */
export interface MatrixCase {
  /** The file's route pattern as Next names it, e.g. "/api/admin/users/[id]". */
  route: string;
  method: "GET" | "POST" | "PATCH" | "PUT" | "DELETE";
  /** The concrete path to call (ids filled in); may be computed once before the calls. */
  path: string | (() => Promise<string>);
  body?: unknown | (() => Promise<unknown>);
  expect: Record<Who, number>;
  note?: string;
}

/** The usual shapes. */
export const publicRoute = (status = 200): Record<Who, number> => ({
  anonymous: status,
  member: status,
  shop_staff: status,
  shop_owner: status,
  admin: status,
});
export const signedIn = (status = 200): Record<Who, number> => ({
  anonymous: 401,
  member: status,
  shop_staff: status,
  shop_owner: status,
  admin: status,
});
export const only = (roles: Exclude<Who, "anonymous">[], status = 200): Record<Who, number> => ({
  anonymous: 401,
  member: roles.includes("member") ? status : 403,
  shop_staff: roles.includes("shop_staff") ? status : 403,
  shop_owner: roles.includes("shop_owner") ? status : 403,
  admin: roles.includes("admin") ? status : 403,
});
