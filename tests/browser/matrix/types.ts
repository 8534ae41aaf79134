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

/** The demo shop's staff and owner both get `status`. */
export const shopTeam = (status = 200): Record<Who, number> => only(["shop_staff", "shop_owner"], status);
/** The shop's owner gets `status`; its staff `staffStatus` (a 403 before any parsing, unless told). */
export const ownerOnly = (status = 200, staffStatus = 403): Record<Who, number> => ({
  ...only(["shop_owner"], status),
  shop_staff: staffStatus,
});

/**
 * The demo draft quote (db/seeds/05_demo_shop.ts), written by the demo staff member so staff and
 * owner both see it: in the demo shop, not done, not booked, no deposit paid.
 */
export const DRAFT = "d0000000-0000-4000-8000-000000000001";

/**
 * Rows for the routes under `${base}/[id]`, each called with `id` in the path: `leaf` names the
 * route below the id ("" for `${base}/[id]` itself).
 */
export function rowsOn(base: string, id: string) {
  return (
    leaf: string,
    method: MatrixCase["method"],
    expect: Record<Who, number>,
    more: Pick<MatrixCase, "body" | "note"> = {},
  ): MatrixCase => {
    const tail = leaf ? `/${leaf}` : "";
    return { route: `${base}/[id]${tail}`, method, path: `${base}/${id}${tail}`, expect, ...more };
  };
}
/** Rows for the routes under /api/shop/quotes/[id], called on the demo draft quote. */
export const onDraftQuote = rowsOn("/api/shop/quotes", DRAFT);

/** An owner's settings form (path = route) saved with an invalid `body`. */
export const invalidOwnerForm = (route: string, body: unknown): MatrixCase => ({
  route,
  method: "PUT",
  path: route,
  body,
  expect: ownerOnly(422),
  note: "invalid body: owners get field errors, staff a 403 before any parsing",
});
