import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DuplicateEmailError, createUser, findUserByEmail, setUserRole } from "@/lib/accounts/queries";
import { consumeResetToken, issueResetToken } from "@/lib/accounts/passwordResetQueries";
import { rebuild, testDb } from "./support/db";

const db = testDb();
beforeAll(() => rebuild(db));
afterAll(() => db.destroy());

describe("users", () => {
  it("treats e-mail addresses case-insensitively and refuses duplicates", async () => {
    await createUser(db, { email: "Rowan@Example.test", name: "Rowan", passwordHash: "h" });
    expect((await findUserByEmail(db, "rowan@example.TEST"))?.name).toBe("Rowan");
    await expect(createUser(db, { email: "ROWAN@example.test", name: "Other", passwordHash: "h" })).rejects.toBeInstanceOf(
      DuplicateEmailError,
    );
    expect(await db("users").whereRaw("lower(email) = 'rowan@example.test'").count<{ count: string }[]>()).toEqual([{ count: "1" }]);
  });

  it("drops the shop when a role change leaves the shop roles", async () => {
    const [shop] = await db("shops").insert({ name: "Test Shop" }).returning("id");
    const u = await createUser(db, { email: "staff@example.test", name: "Staff", passwordHash: "h" });
    expect((await setUserRole(db, u.id, "shop_staff", shop.id))?.shop_id).toBe(shop.id);
    expect((await setUserRole(db, u.id, "member", shop.id))?.shop_id).toBeNull();
  });
});

describe("password reset tokens", () => {
  it("work once, and only the newest one works", async () => {
    const u = await createUser(db, { email: "reset@example.test", name: "Reset", passwordHash: "h" });
    const first = await issueResetToken(db, u.id);
    const second = await issueResetToken(db, u.id);
    expect(first).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(await consumeResetToken(db, first)).toBeNull();
    expect(await consumeResetToken(db, second)).toBe(u.id);
    expect(await consumeResetToken(db, second)).toBeNull();
  });

  it("expire", async () => {
    const u = await createUser(db, { email: "expired@example.test", name: "Late", passwordHash: "h" });
    const token = await issueResetToken(db, u.id);
    await db("password_resets")
      .where({ user_id: u.id })
      .update({ expires_at: db.raw("now() - interval '1 minute'") });
    expect(await consumeResetToken(db, token)).toBeNull();
  });

  it("store only a hash of the token", async () => {
    const u = await createUser(db, { email: "hash@example.test", name: "Hash", passwordHash: "h" });
    const token = await issueResetToken(db, u.id);
    const rows = await db("password_resets").where({ user_id: u.id });
    expect(rows.every((r) => r.token_hash !== token && /^[0-9a-f]{64}$/.test(r.token_hash))).toBe(true);
  });
});
