import { type MatrixCase, only, publicRoute, signedIn } from "./types";

const MEMBER_ID = "a1000000-0000-4000-8000-000000000001";

export const cases: MatrixCase[] = [
  { route: "/api/health", method: "GET", path: "/api/health", expect: publicRoute(200) },
  { route: "/api/health/live", method: "GET", path: "/api/health/live", expect: publicRoute(200) },
  { route: "/api/health/ready", method: "GET", path: "/api/health/ready", expect: publicRoute(200) },
  {
    route: "/api/internal/share-purge",
    method: "POST",
    path: "/api/internal/share-purge",
    body: "*",
    expect: publicRoute(404),
    note: "only the server itself, holding its per-process token, gets past the 404",
  },
  { route: "/api/me", method: "GET", path: "/api/me", expect: signedIn(200) },
  {
    route: "/api/account/sessions/end-all",
    method: "POST",
    path: "/api/account/sessions/end-all",
    body: {},
    expect: signedIn(422),
    note: "without the confirmation nothing ends (the real call is in accounts.test.ts: it would end the matrix's own sessions)",
  },
  {
    route: "/api/account/signup",
    method: "POST",
    path: "/api/account/signup",
    body: { name: "", email: "bad", password: "x" },
    expect: publicRoute(422),
    note: "public; invalid input gives field errors for everyone",
  },
  {
    route: "/api/account/signup/confirm",
    method: "POST",
    path: "/api/account/signup/confirm",
    body: { token: "x".repeat(43), password: "long enough pass" },
    expect: publicRoute(422),
    note: "public; an unknown link is a field error on token for everyone",
  },
  {
    route: "/api/account/password/forgot",
    method: "POST",
    path: "/api/account/password/forgot",
    body: { email: "nobody@example.test" },
    expect: publicRoute(200),
  },
  {
    route: "/api/account/password/reset",
    method: "POST",
    path: "/api/account/password/reset",
    body: { token: "x".repeat(43), password: "long enough pass", confirm: "long enough pass" },
    expect: publicRoute(422),
  },
  { route: "/api/admin/users", method: "GET", path: "/api/admin/users", expect: only(["admin"]) },
  {
    route: "/api/admin/users/[id]",
    method: "PATCH",
    path: `/api/admin/users/${MEMBER_ID}`,
    body: { role: "member" },
    expect: only(["admin"]),
  },
  { route: "/api/admin/outbox", method: "GET", path: "/api/admin/outbox", expect: only(["admin"]) },
  { route: "/api/admin/jobs", method: "GET", path: "/api/admin/jobs", expect: only(["admin"]) },
  {
    route: "/api/admin/jobs/[id]/retry",
    method: "POST",
    path: "/api/admin/jobs/00000000-0000-4000-8000-00000000f00d/retry",
    body: {},
    expect: only(["admin"], 404),
    note: "no such job: the admin gets 404, everyone else is refused before the lookup",
  },
];

// next-auth's own handler: the session endpoint answers everyone; sign-out without its CSRF
// token is refused with a redirect to the confirmation page, never performed.
cases.push(
  { route: "/api/auth/[...nextauth]", method: "GET", path: "/api/auth/session", expect: publicRoute(200) },
  {
    route: "/api/auth/[...nextauth]",
    method: "POST",
    path: "/api/auth/signout",
    body: {},
    expect: publicRoute(302),
    note: "no CSRF token",
  },
);
