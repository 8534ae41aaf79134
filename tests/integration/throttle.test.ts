import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { THROTTLE, accountKey, clearKey, lockState, recordFailure } from "@/lib/auth/throttle";
import { rebuild, testDb } from "./support/db";

const db = testDb();
beforeAll(() => rebuild(db));
afterAll(() => db.destroy());

describe("sign-in throttle (state in PostgreSQL)", () => {
  it("locks an account after the limit of failures and says for how long", async () => {
    const key = accountKey("Lock@Example.test");
    expect(key).toBe("acct:lock@example.test");
    for (let i = 1; i < THROTTLE.accountLimit; i++) {
      const row = await recordFailure(db, key, THROTTLE.accountLimit);
      expect(row.failures).toBe(i);
      expect(row.locked_until).toBeNull();
    }
    expect((await lockState(db, [key])).locked).toBe(false);
    const last = await recordFailure(db, key, THROTTLE.accountLimit);
    expect(last.locked_until).not.toBeNull();
    const state = await lockState(db, [key, "addr:203.0.113.9"]);
    expect(state.locked).toBe(true);
    expect(state.minutesLeft).toBe(THROTTLE.lockMinutes);
  });

  it("counts concurrent failures exactly (one atomic upsert per failure)", async () => {
    const key = "addr:198.51.100.7";
    await Promise.all(Array.from({ length: 12 }, () => recordFailure(db, key, 100)));
    expect((await db("sign_in_throttle").where({ key }).first()).failures).toBe(12);
  });

  it("starts a new window once the old one has passed", async () => {
    const key = accountKey("window@example.test");
    await recordFailure(db, key, 5);
    await recordFailure(db, key, 5);
    await db("sign_in_throttle").where({ key }).update({ window_started_at: db.raw("now() - interval '16 minutes'") });
    expect((await recordFailure(db, key, 5)).failures).toBe(1);
  });

  it("is cleared by a successful sign-in", async () => {
    const key = accountKey("clear@example.test");
    await recordFailure(db, key, 1);
    expect((await lockState(db, [key])).locked).toBe(true);
    await clearKey(db, key);
    expect((await lockState(db, [key])).locked).toBe(false);
  });
});
