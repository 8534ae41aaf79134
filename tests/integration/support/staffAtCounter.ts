import { afterAll, beforeAll } from "vitest";
import { closeDatabases, rebuild, testDb } from "./db";
import { sessionOf } from "./requests";
import { U, seedShops } from "./shopFixture";

/**
 * A fresh database with the two test shops, shop A's staff member signed in through the test's
 * mocked session (`session.current`), closed after the file.
 * @example const db = staffAtCounter(session); // in a file that mocks next-auth's getServerSession with session.current
 */
export function staffAtCounter(session: { current: unknown }) {
  const db = testDb();
  beforeAll(async () => {
    await rebuild(db);
    await seedShops(db);
    session.current = sessionOf(U.staffA);
  });
  afterAll(() => closeDatabases(db));
  return db;
}
