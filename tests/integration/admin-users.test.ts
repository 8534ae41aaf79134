import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { internalKeys } from "./support/apiKeys";
import { rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const ADMIN = { id: "ad000000-0000-4000-8000-000000000001", role: "admin", shop_id: null, email: "root@example.test", name: "Root" };
const MEMBER = { id: "ad000000-0000-4000-8000-000000000002", role: "member", shop_id: null, email: "m@example.test", name: "Member" };
const users = await import("@/app/api/admin/users/route");
const user = await import("@/app/api/admin/users/[id]/route");

beforeAll(async () => {
  await rebuild(db);
  await db("users").insert([ADMIN, MEMBER].map((u) => ({ ...u, password_hash: "x" })));
  session.current = sessionOf(ADMIN);
});
afterAll(async () => {
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});

describe("admin users: refusals name the field as the page does", () => {
  it("a too-long search names the search box", async () => {
    const res = await users.GET(req("GET", `/api/admin/users?q=${"a".repeat(101)}`), ctx());
    expect(res.status).toBe(400);
    expect((await res.json()).error).toBe("Search by name or e-mail: use at most 100 characters.");
  });

  it("an unknown role and a shop role without a shop come back as words, per field", async () => {
    const patch = (body: object) => user.PATCH(req("PATCH", `/api/admin/users/${MEMBER.id}`, body), ctx({ id: MEMBER.id }));
    const unknown = await patch({ role: "owner" });
    expect(unknown.status).toBe(422);
    expect((await unknown.json()).fieldErrors).toEqual({ role: ["Pick one of the roles in the list."] });
    const noShop = await patch({ role: "shop_staff", shopId: null });
    expect((await noShop.json()).fieldErrors).toEqual({ shopId: ["Shop roles need a shop."] });
  });
});

describe("admin users: answers are the API shape", () => {
  it("the list and a role change carry camelCase fields and ISO dates, never the password hash", async () => {
    const shop = (await db("shops").insert({ name: "Admin Test Shop" }).returning("id"))[0].id as string;
    const list = await (await users.GET(req("GET", "/api/admin/users?q=example"), ctx())).json();
    expect(list.users.map((u: { email: string }) => u.email)).toEqual([ADMIN.email, MEMBER.email]);
    expect(internalKeys(list)).toEqual([]);
    const res = await user.PATCH(
      req("PATCH", `/api/admin/users/${MEMBER.id}`, { role: "shop_staff", shopId: shop }),
      ctx({ id: MEMBER.id }),
    );
    expect(res.status).toBe(200);
    const changed = await res.json();
    expect(internalKeys(changed)).toEqual([]);
    // camelCase on purpose: lib/accounts/api.ts.
    expect(changed.user).toMatchObject({ id: MEMBER.id, role: "shop_staff", shopId: shop, updatedAt: expect.stringMatching(/Z$/) });
    const again = await (await users.GET(req("GET", "/api/admin/users?q=m%40example"), ctx())).json();
    expect(again.users).toEqual([expect.objectContaining({ email: MEMBER.email, shopId: shop, shopName: "Admin Test Shop" })]);
  });
});
