import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { insertVehicleRow } from "./support/garageFixture";
import { sessionOf } from "./support/requests";

// A vehicle page for a vehicle that is missing or someone else's must answer HTTP 404. Next
// sends the status with the page shell: a notFound() raised below a loading.tsx (a Suspense
// boundary) comes after the shell went out with 200. So the check sits in the vehicle's layout,
// with no loading boundary above it. The browser suite fetches the pages over HTTP
// (tests/browser/page-status.test.ts); here the layout runs on its own (the tree: page-guard-tree.test.ts).
const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const OWNER = { id: "b2000000-0000-4000-8000-0000000000e1", role: "member", shop_id: null };
const OTHER = { id: "b2000000-0000-4000-8000-0000000000e2", role: "member", shop_id: null };
const VEHICLE = "c3000000-0000-4000-8000-0000000000e1";
const MISSING = "c3000000-0000-4000-8000-0000000000ff";

beforeAll(async () => {
  await rebuild(db);
  await db("users").insert([
    { id: OWNER.id, email: "owner-e1@example.test", name: "Olga Veer", password_hash: "x", role: "member" },
    { id: OTHER.id, email: "other-e2@example.test", name: "Per Strand", password_hash: "x", role: "member" },
  ]);
  await insertVehicleRow(db, { id: VEHICLE, user_id: OWNER.id, name: "Wagon" });
});
afterAll(() => closeDatabases(db));

const VehicleLayout = (await import("@/app/(garage)/garage/[id]/layout")).default;
const render = (id: string) => VehicleLayout({ children: "the page", params: Promise.resolve({ id }) });
/** "404" when Next's notFound() was raised, "rendered" when the children come back. */
async function outcome(id: string): Promise<string> {
  try {
    return (await render(id)) === "the page" ? "rendered" : "something else";
  } catch (e) {
    const digest = (e as { digest?: string }).digest ?? "";
    return digest === "NEXT_HTTP_ERROR_FALLBACK;404" ? "404" : `threw ${String(e)}`;
  }
}

describe("the vehicle pages' guard", () => {
  it("renders the owner's vehicle", async () => {
    session.current = sessionOf(OWNER);
    expect(await outcome(VEHICLE)).toBe("rendered");
  });

  it("answers 404 for another owner's vehicle, a missing one and an id that cannot be one", async () => {
    session.current = sessionOf(OTHER);
    expect(await outcome(VEHICLE)).toBe("404");
    session.current = sessionOf(OWNER);
    expect(await outcome(MISSING)).toBe("404");
    expect(await outcome("not-a-vehicle")).toBe("404");
  });

  it("leaves an anonymous visitor to the page, which sends them to sign-in and back", async () => {
    session.current = null;
    expect(await outcome(VEHICLE)).toBe("rendered");
  });
});
