import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { call } from "../support/http";
import type { MatrixCase } from "./types";

/**
 * Saved comparisons are personal: every signed-in role has its own, and another caller's id is
 * a 404. Rows that change data work on a fresh comparison owned by the admin, which the other
 * roles (called first) must not see.
 */
const JUNO_COMPARISON = "c4000000-0000-4000-8000-000000000003"; // db/seeds/03_demo_comparisons.ts
const STRANGER = "d5000000-0000-4000-8000-00000000abcd";

async function adminComparison(): Promise<string> {
  const res = await call("admin", "POST", "/api/comparisons", { name: "Role matrix scratch", input: DEFAULT_INPUT });
  if (res.status !== 201) throw new Error(`could not create the admin's comparison (${res.status})`);
  return ((await res.json()) as { comparison: { id: string } }).comparison.id;
}
const adminOnly = (status: number) => ({ anonymous: 401, member: 404, shop_staff: 404, shop_owner: 404, admin: status });
const memberOnly = (status: number) => ({ anonymous: 401, member: status, shop_staff: 404, shop_owner: 404, admin: 404 });

export const cases: MatrixCase[] = [
  {
    route: "/api/comparisons",
    method: "GET",
    path: "/api/comparisons?q=rock&sort=name",
    expect: { anonymous: 401, member: 200, shop_staff: 200, shop_owner: 200, admin: 200 },
  },
  {
    route: "/api/comparisons",
    method: "POST",
    path: "/api/comparisons",
    body: { name: "", input: { ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, tire: "not a size" } } },
    expect: { anonymous: 401, member: 422, shop_staff: 422, shop_owner: 422, admin: 422 },
    note: "invalid body: field errors, nothing saved",
  },
  {
    route: "/api/comparisons/[id]",
    method: "GET",
    path: `/api/comparisons/${JUNO_COMPARISON}`,
    expect: memberOnly(200),
    note: "the demo member's comparison",
  },
  { route: "/api/comparisons/[id]", method: "GET", path: `/api/comparisons/${STRANGER}`, expect: memberOnly(404), note: "unknown id" },
  {
    route: "/api/comparisons/[id]",
    method: "PATCH",
    path: async () => `/api/comparisons/${await adminComparison()}`,
    body: { name: "Role matrix renamed" },
    expect: adminOnly(200),
  },
  {
    route: "/api/comparisons/[id]",
    method: "DELETE",
    path: async () => `/api/comparisons/${await adminComparison()}`,
    expect: adminOnly(200),
  },
  {
    route: "/api/comparisons/[id]/duplicate",
    method: "POST",
    path: async () => `/api/comparisons/${await adminComparison()}/duplicate`,
    expect: adminOnly(201),
  },
  {
    route: "/api/comparisons/[id]/share",
    method: "POST",
    path: async () => `/api/comparisons/${await adminComparison()}/share`,
    expect: adminOnly(201),
  },
  {
    route: "/api/comparisons/[id]/share",
    method: "DELETE",
    path: async () => `/api/comparisons/${await adminComparison()}/share`,
    expect: adminOnly(200),
  },
  {
    route: "/s/[slug]",
    method: "GET",
    path: "/s/AAAAAAAAAAAAAAAAAAAAAAAA",
    expect: { anonymous: 404, member: 404, shop_staff: 404, shop_owner: 404, admin: 404 },
    note: "page: unknown slug",
  },
];
