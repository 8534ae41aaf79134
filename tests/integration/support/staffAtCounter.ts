import { afterAll, beforeAll } from "vitest";
import { closeDatabases, rebuild, testDb } from "./db";
import { setUpBookableShops, tearDownBookableShops } from "./openShop";
import { sessionOf } from "./requests";
import { U, seedShops } from "./shopFixture";

/**
 * A fresh database with the two test shops, shop A's staff member signed in through the test's
 * mocked session (`session.current`), closed after the file. `bookable`: with the job queue and
 * shop A open every day (support/openShop.ts), for quotes taken as far as a work order.
 * @example const db = staffAtCounter(session); // in a file that mocks next-auth's getServerSession with session.current
 */
export function staffAtCounter(session: { current: unknown }, { bookable = false } = {}) {
  const db = testDb();
  beforeAll(async () => {
    if (bookable) await setUpBookableShops(db);
    else {
      await rebuild(db);
      await seedShops(db);
    }
    session.current = sessionOf(U.staffA);
  });
  afterAll(() => (bookable ? tearDownBookableShops(db) : closeDatabases(db)));
  return db;
}
