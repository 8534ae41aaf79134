import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { DEFAULT_INPUT, type ComparisonInput } from "@/lib/comparisons/schema";
import { internalKeys } from "./support/apiKeys";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { insertVehicleRow } from "./support/garageFixture";
import { req } from "./support/requests";

// The session is whoever the test says; revalidatePath is recorded (no Next server here).
const session = vi.hoisted(() => ({ current: null as unknown }));
const revalidated = vi.hoisted(() => [] as string[]);
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
vi.mock("next/cache", () => ({ revalidatePath: (p: string) => void revalidated.push(p) }));

const db = testDb();
const OWNER = "b2000000-0000-4000-8000-000000000001";
const OTHER = "b2000000-0000-4000-8000-000000000002";
const as = (id: string | null) => {
  session.current = id ? { user: { id, role: "member", shopId: null, name: "Tester", email: `${id.slice(-2)}@example.test` } } : null;
};

beforeAll(async () => {
  await rebuild(db);
  await db("users").insert([
    { id: OWNER, email: "owner@example.test", name: "Odile Varga", password_hash: "x", role: "member" },
    { id: OTHER, email: "other@example.test", name: "Piet Lorne", password_hash: "x", role: "member" },
  ]);
});
afterAll(() => closeDatabases(db));
beforeEach(() => {
  as(OWNER);
  revalidated.length = 0;
});

const list = await import("@/app/api/comparisons/route");
const one = await import("@/app/api/comparisons/[id]/route");
const dup = (await import("@/app/api/comparisons/[id]/duplicate/route")).POST;
const share = await import("@/app/api/comparisons/[id]/share/route");
const me = (await import("@/app/api/me/route")).GET;
const { findSharedComparison } = await import("@/lib/comparisons/queries");
const { computeComparison } = await import("@/lib/comparisons/compute");

const noParams = { params: Promise.resolve({}) };
const idParams = (id: string) => ({ params: Promise.resolve({ id }) });
async function create(name: string, input: ComparisonInput = DEFAULT_INPUT, extra: object = {}) {
  const res = await list.POST(req("POST", "/api/comparisons", { name, input, ...extra }), noParams);
  expect(res.status).toBe(201);
  return (await res.json()).comparison as { id: string; name: string; figures: Record<string, number | string>; share: unknown };
}

describe("saved comparisons API", () => {
  it("computes the key figures on the server and ignores figures sent by the client", async () => {
    const c = await create("Trail build", DEFAULT_INPUT, {
      figures: { diameterChangeMm: 9999 },
      diameter_change_mm: 9999,
      warning_count: 0,
    });
    const row = await db("comparisons").where({ id: c.id }).first();
    // ISO 4000-1: overall diameter = rim diameter + 2 × section width × aspect ratio:
    // 265/70R17 → 431.8 + 2 × 265 × 0.70 = 802.8 mm. 37x12.50R17LT flotation: 37 in = 939.8 mm.
    expect(row.diameter_change_mm).toBeCloseTo(939.8 - 802.8, 6);
    expect(c.figures.diameterChangeMm).toBeCloseTo(137, 6);
    expect(row.current_tire).toBe(computeComparison(DEFAULT_INPUT).current.tireText);
    expect(row.planned_tire).toMatch(/^37x12\.50R17/);
    const r = computeComparison(DEFAULT_INPUT);
    expect(row.poke_change_mm).toBeCloseTo(r.changes.outerPokeMm, 9);
    expect(row.suggested_ratio).toBe(r.gearing.suggestedRatio);
    expect(row.warning_count).toBe(r.warnings.length);
    // Speedometer error = ratio of overall diameters − 1 (the engine's own assumption, unloaded): 939.8 / 802.8 − 1.
    expect(row.speedometer_error_pct).toBeCloseTo((939.8 / 802.8 - 1) * 100, 6);
    // Stored JSONB is the validated input, nothing else.
    expect(row.input).toEqual(DEFAULT_INPUT);
  });

  it("moves poke out by exactly the offset given up (offset definition; same tire, same rim width)", async () => {
    const planned = { ...DEFAULT_INPUT.current, position: { mode: "offset" as const, offsetMm: 0 } };
    const c = await create("Zero offset", { ...DEFAULT_INPUT, planned });
    expect(c.figures.pokeChangeMm).toBeCloseTo(25, 9);
    expect(c.figures.diameterChangeMm).toBeCloseTo(0, 9);
  });

  it("answers 422 with field errors at the input's paths, and writes nothing", async () => {
    const before = await db("comparisons").count<{ count: string }[]>();
    const bad = { ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, tire: "37x12.5", wheelWidthIn: 2 } };
    const res = await list.POST(req("POST", "/api/comparisons", { name: "  ", input: bad }), noParams);
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(Object.keys(body.fieldErrors).sort()).toEqual(["input.planned.tire", "input.planned.wheelWidthIn", "name"]);
    expect(body.fieldErrors.name[0]).toMatch(/name/);
    expect(body.fieldErrors["input.planned.wheelWidthIn"][0]).toMatch(/between 3 and 20 in/);
    expect(await db("comparisons").count()).toEqual(before);

    const c = await create("Rename me");
    const patch = await one.PATCH(req("PATCH", `/api/comparisons/${c.id}`, { name: "x".repeat(121) }), idParams(c.id));
    expect(patch.status).toBe(422);
    expect((await patch.json()).fieldErrors.name[0]).toMatch(/120 characters/);
    const empty = await one.PATCH(req("PATCH", `/api/comparisons/${c.id}`, {}), idParams(c.id));
    expect(empty.status).toBe(422);
  });

  it("scopes every route by owner: another member's id is a 404, and nothing changes", async () => {
    const c = await create("Mine only");
    as(OTHER);
    expect((await one.GET(req("GET", `/api/comparisons/${c.id}`), idParams(c.id))).status).toBe(404);
    expect((await one.PATCH(req("PATCH", `/api/comparisons/${c.id}`, { name: "Taken" }), idParams(c.id))).status).toBe(404);
    expect((await one.DELETE(req("DELETE", `/api/comparisons/${c.id}`), idParams(c.id))).status).toBe(404);
    expect((await dup(req("POST", `/api/comparisons/${c.id}/duplicate`), idParams(c.id))).status).toBe(404);
    expect((await share.POST(req("POST", `/api/comparisons/${c.id}/share`), idParams(c.id))).status).toBe(404);
    expect((await share.DELETE(req("DELETE", `/api/comparisons/${c.id}/share`), idParams(c.id))).status).toBe(404);
    const theirs = await (await list.GET(req("GET", "/api/comparisons"), noParams)).json();
    expect(theirs.comparisons).toEqual([]);
    expect((await db("comparisons").where({ id: c.id }).first()).name).toBe("Mine only");
    expect(await db("comparison_shares").where({ comparison_id: c.id })).toEqual([]);
    // A malformed id is a 404 too (no hint about the id format).
    expect((await one.GET(req("GET", "/api/comparisons/nope"), idParams("nope"))).status).toBe(404);
    as(null);
    expect((await list.GET(req("GET", "/api/comparisons"), noParams)).status).toBe(401);
  });

  it("renames, recomputes on a new input, duplicates and deletes", async () => {
    const c = await create("First name");
    const renamed = await (await one.PATCH(req("PATCH", `/api/comparisons/${c.id}`, { name: "  Second name " }), idParams(c.id))).json();
    expect(renamed.comparison.name).toBe("Second name");
    const input = { ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, tire: "35x12.50R17LT" } };
    const changed = await (await one.PATCH(req("PATCH", `/api/comparisons/${c.id}`, { input }), idParams(c.id))).json();
    // 35 in = 889 mm (flotation designation): 889 − 802.8.
    expect(changed.comparison.figures.diameterChangeMm).toBeCloseTo(889 - 802.8, 6);
    const copy = await dup(req("POST", `/api/comparisons/${c.id}/duplicate`), idParams(c.id));
    expect(copy.status).toBe(201);
    const copied = (await copy.json()).comparison;
    expect(copied.name).toBe("Second name (copy)");
    expect(copied.id).not.toBe(c.id);
    expect(copied.input).toEqual(input);
    expect((await one.DELETE(req("DELETE", `/api/comparisons/${c.id}`), idParams(c.id))).status).toBe(200);
    expect((await one.GET(req("GET", `/api/comparisons/${c.id}`), idParams(c.id))).status).toBe(404);
  });

  it("round-trips the crawl-ratio inputs, and loads a comparison saved before they existed with both as not entered", async () => {
    const input = { ...DEFAULT_INPUT, vehicle: { ...DEFAULT_INPUT.vehicle, firstGearRatio: 4.03, transferLowRatio: 2.72 } };
    const c = await create("Crawler gears", input);
    expect((await db("comparisons").where({ id: c.id }).first()).input.vehicle).toMatchObject({
      firstGearRatio: 4.03,
      transferLowRatio: 2.72,
    });
    const got = await (await one.GET(req("GET", `/api/comparisons/${c.id}`), idParams(c.id))).json();
    expect(got.comparison.input).toEqual(input);
    // A row written before the fields existed: its JSON has no firstGearRatio / transferLowRatio.
    const { firstGearRatio: _f, transferLowRatio: _l, ...olderVehicle } = DEFAULT_INPUT.vehicle;
    await db("comparisons")
      .where({ id: c.id })
      .update({ input: JSON.stringify({ ...DEFAULT_INPUT, vehicle: olderVehicle }) });
    const old = await (await one.GET(req("GET", `/api/comparisons/${c.id}`), idParams(c.id))).json();
    expect(old.comparison.input).toEqual(DEFAULT_INPUT);
    const listed = await (await list.GET(req("GET", "/api/comparisons"), noParams)).json();
    expect(listed.comparisons.find((x: { id: string }) => x.id === c.id).input.vehicle).toMatchObject({
      firstGearRatio: null,
      transferLowRatio: null,
    });
  });

  it("searches names and tire sizes and sorts", async () => {
    await db("comparisons").where({ owner_id: OWNER }).del();
    await create("Beta camp rig");
    await create("alpha daily", { ...DEFAULT_INPUT, planned: { ...DEFAULT_INPUT.planned, tire: "35x12.50R17LT" } });
    await create("Gamma 100%_off");
    const get = async (qs: string) =>
      ((await (await list.GET(req("GET", `/api/comparisons?${qs}`), noParams)).json()).comparisons as { name: string }[]).map(
        (x) => x.name,
      );
    expect(await get("sort=name")).toEqual(["alpha daily", "Beta camp rig", "Gamma 100%_off"]);
    expect(await get("sort=updated")).toEqual(["Gamma 100%_off", "alpha daily", "Beta camp rig"]);
    expect(await get("q=35x12")).toEqual(["alpha daily"]);
    expect(await get("q=CAMP")).toEqual(["Beta camp rig"]);
    expect(await get("q=%25_")).toEqual(["Gamma 100%_off"]); // % and _ are literal
    expect((await get("sort=diameter"))[0]).not.toBe("alpha daily"); // 37 in grows more than 35 in
    expect((await list.GET(req("GET", "/api/comparisons?sort=size"), noParams)).status).toBe(400);
  });

  it("tie only to one of the owner's own garage vehicles", async () => {
    const vehicleId = "c3000000-0000-4000-8000-00000000000a";
    await insertVehicleRow(db, { id: vehicleId, user_id: OWNER, name: "Wagon" });
    const c = await create("For the wagon", DEFAULT_INPUT, { vehicleId });
    expect((await db("comparisons").where({ id: c.id }).first()).vehicle_id).toBe(vehicleId);
    const res = await list.POST(
      req("POST", "/api/comparisons", { name: "Bad vehicle", input: DEFAULT_INPUT, vehicleId: "wagon" }),
      noParams,
    );
    expect((await res.json()).fieldErrors.vehicleId).toBeDefined();
    const unknown = await list.POST(
      req("POST", "/api/comparisons", { name: "Not mine", input: DEFAULT_INPUT, vehicleId: "c3000000-0000-4000-8000-00000000000b" }),
      noParams,
    );
    expect(unknown.status).toBe(422);
    expect((await unknown.json()).fieldErrors.vehicleId[0]).toMatch(/not in your garage/);
  });
});

describe("share links", () => {
  it("make a URL-safe slug of at least 128 bits that finds the comparison in one lookup", async () => {
    const c = await create("Shared build");
    const res = await share.POST(req("POST", `/api/comparisons/${c.id}/share`), idParams(c.id));
    expect(res.status).toBe(201);
    const { share: s } = await res.json();
    expect(s.slug).toMatch(/^[A-Za-z0-9_-]{24}$/); // base64url of 18 bytes = 144 bits
    expect(s.path).toBe(`/s/${s.slug}`);
    const found = await findSharedComparison(db, s.slug);
    expect(found).toMatchObject({ name: "Shared build", input: DEFAULT_INPUT });
    expect(found).not.toHaveProperty("owner_id");
    const listed = await (await one.GET(req("GET", `/api/comparisons/${c.id}`), idParams(c.id))).json();
    expect(listed.comparison.share.slug).toBe(s.slug);
  });

  it("slugs do not repeat (1000 draws)", async () => {
    const { newShareSlug } = await import("@/lib/comparisons/queries");
    const seen = new Set(Array.from({ length: 1000 }, () => newShareSlug()));
    expect(seen.size).toBe(1000);
  });

  it("revoke: the lookup fails, the cached page is dropped; a new link works and the old one stays dead", async () => {
    const c = await create("Revocable");
    const first = (await (await share.POST(req("POST", `/api/comparisons/${c.id}/share`), idParams(c.id))).json()).share.slug as string;
    revalidated.length = 0;
    const del = await share.DELETE(req("DELETE", `/api/comparisons/${c.id}/share`), idParams(c.id));
    expect(await del.json()).toEqual({ revoked: true });
    expect(await findSharedComparison(db, first)).toBeUndefined();
    expect(revalidated).toContain(`/s/${first}`);
    // Revoking again is harmless.
    expect(await (await share.DELETE(req("DELETE", `/api/comparisons/${c.id}/share`), idParams(c.id))).json()).toEqual({ revoked: false });

    const second = (await (await share.POST(req("POST", `/api/comparisons/${c.id}/share`), idParams(c.id))).json()).share.slug as string;
    expect(second).not.toBe(first);
    expect(await findSharedComparison(db, second)).toBeDefined();
    expect(await findSharedComparison(db, first)).toBeUndefined();

    // A third link replaces the second, which dies at once.
    revalidated.length = 0;
    const third = await (await share.POST(req("POST", `/api/comparisons/${c.id}/share`), idParams(c.id))).json();
    expect(third.replaced).toBe(second);
    expect(revalidated).toContain(`/s/${second}`);
    expect(await findSharedComparison(db, second)).toBeUndefined();
    expect(await db("comparison_shares").where({ comparison_id: c.id }).whereNull("revoked_at")).toHaveLength(1);

    // Deleting the comparison kills its link too.
    revalidated.length = 0;
    await one.DELETE(req("DELETE", `/api/comparisons/${c.id}`), idParams(c.id));
    expect(revalidated).toContain(`/s/${third.share.slug}`);
    expect(await findSharedComparison(db, third.share.slug)).toBeUndefined();
  });

  it("renaming a shared comparison drops its cached page", async () => {
    const c = await create("Before");
    const slug = (await (await share.POST(req("POST", `/api/comparisons/${c.id}/share`), idParams(c.id))).json()).share.slug as string;
    revalidated.length = 0;
    await one.PATCH(req("PATCH", `/api/comparisons/${c.id}`, { name: "After" }), idParams(c.id));
    expect(revalidated).toContain(`/s/${slug}`);
    expect((await findSharedComparison(db, slug))?.name).toBe("After");
  });

  it("the database keeps one live link per comparison and URL-safe slugs only", async () => {
    const c = await create("Constraints");
    await db("comparison_shares").insert({ comparison_id: c.id, slug: "A".repeat(24) });
    await expect(db("comparison_shares").insert({ comparison_id: c.id, slug: "B".repeat(24) })).rejects.toThrow(
      /comparison_shares_one_live/,
    );
    await expect(
      db("comparison_shares").insert({ comparison_id: c.id, slug: "has space in it and is long", revoked_at: new Date() }),
    ).rejects.toThrow(/slug_urlsafe/);
  });
});

describe("answers in API shape (camelCase, ISO dates, no owner id)", () => {
  const ISO = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

  it("every comparisons route", async () => {
    const created = await list.POST(req("POST", "/api/comparisons", { name: "Shape check", input: DEFAULT_INPUT }), noParams);
    const body = await created.json();
    expect(internalKeys(body)).toEqual([]);
    const id = body.comparison.id as string;
    expect(body.comparison.createdAt).toMatch(ISO);
    expect(body.comparison).not.toHaveProperty("ownerId");
    const answers = {
      list: await (await list.GET(req("GET", "/api/comparisons"), noParams)).json(),
      get: await (await one.GET(req("GET", `/api/comparisons/${id}`), idParams(id))).json(),
      patch: await (await one.PATCH(req("PATCH", `/api/comparisons/${id}`, { name: "Shape check 2" }), idParams(id))).json(),
      duplicate: await (await dup(req("POST", `/api/comparisons/${id}/duplicate`), idParams(id))).json(),
      share: await (await share.POST(req("POST", `/api/comparisons/${id}/share`), idParams(id))).json(),
      shareRow: await db("comparison_shares").where({ comparison_id: id }).whereNull("revoked_at").first(),
      shared: await (await one.GET(req("GET", `/api/comparisons/${id}`), idParams(id))).json(),
      revoke: await (await share.DELETE(req("DELETE", `/api/comparisons/${id}/share`), idParams(id))).json(),
      delete: await (await one.DELETE(req("DELETE", `/api/comparisons/${id}`), idParams(id))).json(),
    };
    const { shareRow, ...answered } = answers;
    for (const [route, answer] of Object.entries(answered)) expect(internalKeys(answer), route).toEqual([]);
    expect(answers.share.share.createdAt).toMatch(ISO);
    expect(answers.share.share.slug).toBe(shareRow.slug);
    expect(answers.share.share.createdAt).toBe(new Date(shareRow.created_at).toISOString());
    expect(answers.shared.comparison.share).toEqual({ slug: answers.share.share.slug, createdAt: answers.share.share.createdAt });
  });

  it("the public share lookup", async () => {
    const c = await create("Shared shape");
    const { share: s } = await (await share.POST(req("POST", `/api/comparisons/${c.id}/share`), idParams(c.id))).json();
    const found = await findSharedComparison(db, s.slug);
    expect(internalKeys(found)).toEqual([]);
    expect(found!.sharedAt).toMatch(ISO);
  });

  it("/api/me: who the session says, nothing more", async () => {
    const res = await me(req("GET", "/api/me"), noParams);
    const body = await res.json();
    expect(internalKeys(body)).toEqual([]);
    expect(body).toEqual({ id: OWNER, name: "Tester", email: `${OWNER.slice(-2)}@example.test`, role: "member", shopId: null });
  });
});
