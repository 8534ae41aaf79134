import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { ConflictError, DomainError, GoneError, InvalidError, NotFoundError, UnknownReferenceError } from "@/lib/platform/errors";
import { rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";

// Domain errors thrown by a handler (as the query modules throw them) and the answers route()
// makes of them: the statuses and JSON bodies the handlers used to build by hand.
const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const USER = { id: "b2000000-0000-4000-8000-0000000000d1", role: "member", shop_id: null };

beforeAll(async () => {
  await rebuild(db);
  await db("users").insert({ id: USER.id, email: "domain@example.test", name: "Dora Main", password_hash: "x", role: "member" });
});
afterAll(async () => {
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});

const { route } = await import("@/lib/platform/http/route");
const throwing = (error: unknown) => route({ access: "public" }, async () => Promise.reject(error));
const answer = async (error: unknown) => {
  const res = await throwing(error)(req("GET", "/api/test"), ctx());
  return { status: res.status, body: await res.json() };
};

describe("route() answers domain errors", () => {
  it("NotFoundError: 404 with the record named", async () => {
    expect(await answer(new NotFoundError("That vehicle"))).toEqual({ status: 404, body: { error: "That vehicle was not found." } });
  });

  it("ConflictError: 409, with what it carries beside the message", async () => {
    expect(await answer(new ConflictError("This import was already confirmed."))).toEqual({
      status: 409,
      body: { error: "This import was already confirmed." },
    });
    const existing = {
      id: "c1",
      name: "Ann Brook",
      phone: "555 0100",
      email: "",
      createdAt: "2026-01-01T00:00:00.000Z",
      updatedAt: "2026-01-01T00:00:00.000Z",
    };
    expect(
      await answer(new ConflictError("Ann Brook already has this phone number or e-mail. Pick the existing customer.", { existing })),
    ).toEqual({
      status: 409,
      body: { error: "Ann Brook already has this phone number or e-mail. Pick the existing customer.", existing },
    });
  });

  it("ConflictError about a field: 409 with the message beside that field too (a booking time taken a moment ago)", async () => {
    const taken = "Re-check time: that time is already taken in the shop's bays. Pick another time.";
    expect(await answer(ConflictError.onField("start", taken))).toEqual({
      status: 409,
      body: { error: taken, fieldErrors: { start: [taken] } },
    });
  });

  it("InvalidError: 422 with field errors, rows counted from 1 as for schema errors", async () => {
    expect(await answer(InvalidError.fields({ vehicleId: ["That vehicle is not in your garage."] }))).toEqual({
      status: 422,
      body: { error: "Some fields need attention.", fieldErrors: { vehicleId: ["That vehicle is not in your garage."] } },
    });
    const lines = await answer(new InvalidError("Some lines need attention.", { "lines.2.quantity": ["Count whole items."] }));
    expect(lines).toEqual({
      status: 422,
      body: { error: "Some lines need attention.", fieldErrors: { "lines.2.quantity": ["Line 3: Count whole items."] } },
    });
    expect(await answer(new InvalidError("The customer has no e-mail address. Add one before sending."))).toEqual({
      status: 422,
      body: { error: "The customer has no e-mail address. Add one before sending." },
    });
  });

  it("GoneError: 410; UnknownReferenceError: 400", async () => {
    expect(await answer(new GoneError("This invitation has expired."))).toEqual({
      status: 410,
      body: { error: "This invitation has expired." },
    });
    expect(await answer(new UnknownReferenceError("Unknown checkout session."))).toEqual({
      status: 400,
      body: { error: "Unknown checkout session." },
    });
  });

  it("a kind of domain error route() has no status for is a 500 with a reference, its message never shown", async () => {
    class Unmapped extends DomainError {}
    const { status, body } = await answer(new Unmapped("internal wording"));
    expect(status).toBe(500);
    expect(body.error).toMatch(/^Something went wrong on our side\. Reference /);
    expect(JSON.stringify(body)).not.toMatch(/internal wording/);
  });

  it("keeps the order session → role → input → handler: an anonymous caller gets 401 before the handler's 404", async () => {
    const guarded = route({ access: "signed-in" }, async () => Promise.reject(new NotFoundError("That vehicle")));
    session.current = null;
    expect((await guarded(req("GET", "/api/test"), ctx())).status).toBe(401);
    session.current = sessionOf(USER);
    expect((await guarded(req("GET", "/api/test"), ctx())).status).toBe(404);
  });

  it("a refused create frees its Idempotency-Key: the retry runs again", async () => {
    session.current = sessionOf(USER);
    let calls = 0;
    const create = route({ access: "signed-in", idempotent: true }, async () => {
      calls += 1;
      if (calls === 1) throw new ConflictError("Busy with another change.");
      return Response.json({ ok: true }, { status: 201 });
    });
    const post = () => create(req("POST", "/api/test", {}, { "idempotency-key": "domain-errors-retry" }), ctx());
    expect((await post()).status).toBe(409);
    expect((await post()).status).toBe(201);
    expect(calls).toBe(2);
  });
});
