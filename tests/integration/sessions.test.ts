import type { JWT } from "next-auth/jwt";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { authOptions } from "@/lib/platform/auth/options";
import { endAllSessions } from "@/lib/accounts/sessionQueries";
import { createUser, setPassword, setUserRole } from "@/lib/accounts/queries";
import { rebuild, testDb } from "./support/db";

/**
 * Ending sessions early (security review: a copied session cookie kept working for up to 14
 * days after sign-out or a password reset, and a role change took 60 s to reach it). These call
 * next-auth's own callbacks as it calls them when it reads a session token.
 */
const db = testDb();
beforeAll(() => rebuild(db));
afterAll(() => db.destroy());

const jwt = authOptions.callbacks!.jwt! as unknown as (p: { token: JWT; user?: unknown }) => Promise<JWT>;
const signOutEvent = authOptions.events!.signOut! as unknown as (m: { token: JWT }) => Promise<void>;

async function member(email: string) {
  return createUser(db, { email, name: "Session Tester", passwordHash: "h" });
}
/** What sign-in puts in a new session token. */
async function signIn(u: { id: string }): Promise<JWT> {
  const row = await db("users").where({ id: u.id }).first();
  return jwt({
    token: { exp: Math.floor(Date.now() / 1000) + 3600 },
    user: { id: row.id, role: row.role, shopId: row.shop_id, sessionVersion: row.session_version },
  });
}
const alive = async (token: JWT) => Boolean((await jwt({ token })).uid);

describe("sessions end when they should", () => {
  it("a new session names its user, a session id and the user's session version", async () => {
    const u = await member("fresh@example.test");
    const token = await signIn(u);
    expect(token).toMatchObject({ uid: u.id, role: "member", sv: 0 });
    expect(token.sid).toMatch(/^[0-9a-f-]{36}$/);
    expect(await alive(token)).toBe(true);
  });

  it("signing out ends that session, even a copy of its cookie, and no other", async () => {
    const u = await member("signout@example.test");
    const laptop = await signIn(u);
    const phone = await signIn(u);
    await signOutEvent({ token: laptop });
    expect(await alive(laptop)).toBe(false);
    expect(await alive(phone)).toBe(true);
  });

  it("a password change or reset ends every session made with the old password", async () => {
    const u = await member("reset-sessions@example.test");
    const a = await signIn(u);
    const b = await signIn(u);
    await setPassword(db, u.id, "new-hash");
    expect(await alive(a)).toBe(false);
    expect(await alive(b)).toBe(false);
    expect(await alive(await signIn(u))).toBe(true);
  });

  it("a role change reaches the next request: the demoted staff member's session ends at once", async () => {
    const [shop] = await db("shops").insert({ name: "Session Shop" }).returning("id");
    const u = await member("demoted@example.test");
    await setUserRole(db, u.id, "shop_staff", shop.id);
    const token = await signIn(u);
    expect(token).toMatchObject({ role: "shop_staff", shopId: shop.id });
    // Saving the same role again ends nothing.
    await setUserRole(db, u.id, "shop_staff", shop.id);
    expect(await alive(token)).toBe(true);
    await setUserRole(db, u.id, "member", null);
    const after = await jwt({ token });
    expect(after.uid).toBeUndefined();
    expect(after.role).toBeUndefined();
  });

  it("'sign out everywhere' ends every session of the user and no one else's", async () => {
    const u = await member("everywhere@example.test");
    const other = await member("bystander@example.test");
    const mine = [await signIn(u), await signIn(u)];
    const theirs = await signIn(other);
    await endAllSessions(db, u.id);
    for (const t of mine) expect(await alive(t)).toBe(false);
    expect(await alive(theirs)).toBe(true);
  });

  it("a deleted user's session ends", async () => {
    const u = await member("gone@example.test");
    const token = await signIn(u);
    await db("users").where({ id: u.id }).delete();
    expect(await alive(token)).toBe(false);
  });
});
