import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { psiToKpa } from "@/lib/fitment";
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import { DEMO_PROFILE } from "@/lib/garage/loadTestUtil";
import { rebuild, testDb } from "./support/db";
import { ctx, req } from "./support/requests";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const USERS = {
  ada: { id: "b4000000-0000-4000-8000-000000000001", email: "ada@example.test", name: "Ada Quillfeather", role: "member" },
  bo: { id: "b4000000-0000-4000-8000-000000000002", email: "bo@example.test", name: "Bo Tarrant", role: "member" },
} as const;
type Who = keyof typeof USERS;
function as(who: Who | null) {
  const u = who ? USERS[who] : null;
  session.current = u ? { user: { id: u.id, role: u.role, shopId: null, name: u.name, email: u.email } } : null;
}

const vehicles = await import("@/app/api/vehicles/route");
const vehicle = await import("@/app/api/vehicles/[id]/route");
const load = await import("@/app/api/vehicles/[id]/load/route");
const comparisons = await import("@/app/api/comparisons/route");
const share = await import("@/app/api/comparisons/[id]/share/route");
const { sharedLoadTrail } = await import("@/app/(share)/s/[slug]/loadTrail");

const SETUP = { tire: "265/70R17 113T", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };
const PROFILE = DEMO_PROFILE;

let id: string;
beforeAll(async () => {
  await rebuild(db);
  for (const u of Object.values(USERS)) await db("users").insert({ ...u, password_hash: "x" });
  as("ada");
  const res = await vehicles.POST(
    req("POST", "/api/vehicles", {
      name: "Ridge runner",
      frontSuspension: "independent",
      boltPattern: "6x5.5",
      stockSetup: SETUP,
      currentSetup: SETUP,
    }),
    ctx(),
  );
  expect(res.status).toBe(201);
  id = (await res.json()).vehicle.id;
});
afterAll(async () => {
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});

const put = (body: object, vid = id) => load.PUT(req("PUT", `/api/vehicles/${vid}/load`, body), ctx({ id: vid }));
const get = (vid = id) => load.GET(req("GET", `/api/vehicles/${vid}/load`), ctx({ id: vid }));

describe("vehicle load profile", () => {
  it("is null before anything is stored", async () => {
    as("ada");
    const res = await get();
    expect(res.status).toBe(200);
    expect((await res.json()).profile).toBeNull();
  });

  it("stores the placard, scale weights and body points in SI and reads them back", async () => {
    as("ada");
    const res = await put(PROFILE);
    expect(res.status).toBe(200);
    const { profile } = await res.json();
    // 35 psi = 241.3165 kPa; 3150 lb = 1428.818 kg (NIST SP 811)
    expect(profile.placardFrontKpa).toBeCloseTo(241.3165, 3);
    expect(profile.frontAxleKg).toBeCloseTo(1428.818, 2);
    const row = await db("vehicle_load_profiles").where({ vehicle_id: id }).first();
    expect(row.wheelbase_mm).toBe(2896);
    expect((await (await get()).json()).profile).toEqual(profile);
  });

  const refused = [
    {
      why: "a scale weight above what two placard tires carry (load index 113 = 1150 kg, ÷ 1.10 on a light truck)",
      patch: { frontAxleKg: 2200 },
      field: "frontAxleKg",
      // In the field's unit first: 1100 kg = 1100 / 0.45359237 = 2425.1 lb (NIST SP 811 B.8, 1 lb = 0.45359237 kg exactly).
      message:
        /^Front axle weight, scale ticket \(lb\): one tire carries half the axle, and 2,425 lb \(1,100 kg\) is above the maximum load/,
    },
    {
      why: "a negative weight",
      patch: { rearAxleKg: -10 },
      field: "rearAxleKg",
      message: /^Rear axle weight, scale ticket \(lb\): must be between 221 and 44092 lb/,
    },
    {
      why: "an absurd height",
      patch: { rearCornerHeightMm: 9000, units: "metric" },
      field: "rearCornerHeightMm",
      message: /^Rear corner height \(mm\): must be between 1 and 3000 mm/,
    },
    {
      why: "a body point inside the current tire",
      patch: { frontCornerHeightMm: 300, frontCornerAheadMm: 100 },
      field: "frontCornerHeightMm",
      message: /inside the tire's circle/,
    },
    {
      why: "a placard pressure above the sidewall maximum",
      patch: { placardRearKpa: psiToKpa(60) },
      field: "placardRearKpa",
      message: /^Placard cold pressure, rear \(psi\): .*never inflate above the sidewall maximum/,
    },
  ];
  for (const r of refused) {
    it(`refuses ${r.why} with a field error, storing nothing`, async () => {
      as("ada");
      const before = await db("vehicle_load_profiles").where({ vehicle_id: id }).first();
      const res = await put({ ...PROFILE, ...r.patch });
      expect(res.status).toBe(422);
      const body = await res.json();
      expect(body.fieldErrors[r.field][0]).toMatch(r.message);
      expect(await db("vehicle_load_profiles").where({ vehicle_id: id }).first()).toEqual(before);
    });
  }

  it("refuses a field of the wrong type by the zod shape", async () => {
    as("ada");
    const res = await put({ ...PROFILE, wheelbaseMm: "114 in" });
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors.wheelbaseMm[0]).toBe("wheelbaseMm: a number in mm or null.");
  });

  it("gives a shared comparison of the vehicle the pressure to set and the angle changes, nothing of the profile itself", async () => {
    as("ada");
    const made = await comparisons.POST(req("POST", "/api/comparisons", { name: "Big tires", input: DEFAULT_INPUT, vehicleId: id }), ctx());
    expect(made.status).toBe(201);
    const cid = (await made.json()).comparison.id;
    const shared = await share.POST(req("POST", `/api/comparisons/${cid}/share`), ctx({ id: cid }));
    const { slug } = (await shared.json()).share;
    const f = await sharedLoadTrail(slug, DEFAULT_INPUT.planned);
    // 37x12.50R17LT LRD: the flotation road minimum 0.5833 × 50 psi = 29.2 psi = 201.1 kPa (above the equivalent pressure).
    expect(f?.load?.plan?.axles.map((a) => a.pressureToSetKpa)).toEqual([expect.closeTo(201.1, 0), expect.closeTo(201.1, 0)]);
    expect(f?.angles.map((a) => a.kind)).toEqual(["approach", "departure", "breakover"]);
    expect(f?.angles.every((a) => a.plannedDeg > a.currentDeg)).toBe(true);
    expect(JSON.stringify(f)).not.toContain("frontCornerHeightMm");
    const unlinked = await comparisons.POST(req("POST", "/api/comparisons", { name: "No vehicle", input: DEFAULT_INPUT }), ctx());
    const uid = (await unlinked.json()).comparison.id;
    const s2 = (await (await share.POST(req("POST", `/api/comparisons/${uid}/share`), ctx({ id: uid }))).json()).share;
    expect(await sharedLoadTrail(s2.slug, DEFAULT_INPUT.planned)).toBeNull();
  });

  it("is another owner's 404, and anonymous callers are refused first", async () => {
    as("bo");
    expect((await get()).status).toBe(404);
    expect((await put(PROFILE)).status).toBe(404);
    as(null);
    expect((await put(PROFILE)).status).toBe(401);
  });

  it("clears with DELETE and goes with the vehicle", async () => {
    as("ada");
    const del = await load.DELETE(req("DELETE", `/api/vehicles/${id}/load`), ctx({ id }));
    expect(del.status).toBe(200);
    expect((await (await get()).json()).profile).toBeNull();
    await put(PROFILE);
    await vehicle.DELETE(req("DELETE", `/api/vehicles/${id}`), ctx({ id }));
    expect(await db("vehicle_load_profiles").where({ vehicle_id: id })).toHaveLength(0);
  });
});
