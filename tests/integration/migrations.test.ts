import { afterAll, describe, expect, it } from "vitest";
import { testDb } from "./support/db";

const db = testDb();
afterAll(() => db.destroy());

async function tables(): Promise<string[]> {
  const r = await db.raw<{ rows: { tablename: string }[] }>("select tablename from pg_tables where schemaname = 'public' order by 1");
  return r.rows.map((x) => x.tablename).filter((t) => !t.startsWith("knex_"));
}

describe("migrations", () => {
  it("go all the way up, all the way down, and up again", async () => {
    await db.migrate.latest();
    const up = await tables();
    expect(up).toEqual(expect.arrayContaining(["users", "shops", "password_resets", "rate_limits"]));
    await db.migrate.rollback(undefined, true);
    expect(await tables()).toEqual([]);
    await db.migrate.latest();
    expect(await tables()).toEqual(up);
  });

  it("keep shop roles tied to a shop", async () => {
    await db("users").del();
    await expect(
      db("users").insert({ email: "x@example.test", name: "X", password_hash: "h", role: "shop_staff", shop_id: null }),
    ).rejects.toThrow(/users_shop_role_has_shop/);
    await expect(db("users").insert({ email: "y@example.test", name: "Y", password_hash: "h", role: "owner" })).rejects.toThrow(
      /users_role_known/,
    );
  });
});
