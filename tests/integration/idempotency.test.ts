import { createHash } from "node:crypto";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { VEHICLE } from "./support/garageFixture";
import { drainQueue, startTestBoss, stopBoss } from "./support/jobs";
import { ageObject } from "./support/photoObjects";
import { startTestPhotoStore, type TestPhotoStore } from "./support/photoStore";
import { ctx, req } from "./support/requests";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
let photos: TestPhotoStore;

const ADA = { id: "e1000000-0000-4000-8000-000000000001", email: "ada@example.test", name: "Ada Quillfeather", role: "member" };
const BO = { id: "e1000000-0000-4000-8000-000000000002", email: "bo@example.test", name: "Bo Tarrant", role: "member" };
const as = (u: typeof ADA) => (session.current = { user: { id: u.id, role: u.role, shopId: null, name: u.name, email: u.email } });

beforeAll(async () => {
  await rebuild(db);
  await db("users").insert([ADA, BO].map((u) => ({ ...u, password_hash: "x" })));
  photos = await startTestPhotoStore("idem-photos");
  await startTestBoss();
});
afterAll(async () => {
  await stopBoss();
  await photos.close();
  await closeDatabases(db);
});

const vehicles = await import("@/app/api/vehicles/route");
const uploads = await import("@/app/api/vehicles/[id]/photos/route");
const photo = await import("@/app/api/photos/[id]/route");
const { QUEUES, getBoss } = await import("@/lib/platform/jobs/boss");

const createVehicle = (body: unknown, key?: string) =>
  vehicles.POST(req("POST", "/api/vehicles", body as object, key === undefined ? {} : { "idempotency-key": key }), ctx());
const vehicleCount = async (userId = ADA.id) =>
  Number((await db("vehicles").where({ user_id: userId }).count<{ count: string }[]>())[0]!.count);

describe("Idempotency-Key on creates", () => {
  it("replays a create sent again with the same key and body: the same id, one row, marked as a replay", async () => {
    as(ADA);
    const before = await vehicleCount();
    const first = await createVehicle(VEHICLE, "veh-1");
    expect(first.status).toBe(201);
    expect(first.headers.get("idempotent-replayed")).toBeNull();
    const second = await createVehicle(VEHICLE, "veh-1");
    expect(second.status).toBe(201);
    expect(second.headers.get("idempotent-replayed")).toBe("true");
    const [a, b] = [await first.json(), await second.json()];
    expect(b.vehicle.id).toBe(a.vehicle.id);
    expect(b).toEqual(a);
    expect(await vehicleCount()).toBe(before + 1);
  });

  it("refuses the same key with another body (422) and creates nothing", async () => {
    as(ADA);
    const before = await vehicleCount();
    const res = await createVehicle({ ...VEHICLE, name: "Other truck" }, "veh-1");
    expect(res.status).toBe(422);
    expect((await res.json()).error).toBe("This Idempotency-Key was used for a different request.");
    expect(await vehicleCount()).toBe(before);
  });

  it("refuses a malformed key with 400 naming the header", async () => {
    as(ADA);
    const before = await vehicleCount();
    for (const bad of ["", "x".repeat(201), "caf\u00e9"]) {
      const res = await createVehicle(VEHICLE, bad);
      expect(res.status, JSON.stringify(bad)).toBe(400);
      expect((await res.json()).error).toMatch(/Idempotency-Key header/);
    }
    expect((await createVehicle(VEHICLE, "k".repeat(200))).status).toBe(201);
    expect(await vehicleCount()).toBe(before + 1);
  });

  it("creates once when requests with one key arrive together; the others wait (409) or replay", async () => {
    as(ADA);
    const before = await vehicleCount();
    const all = await Promise.all(Array.from({ length: 6 }, () => createVehicle(VEHICLE, "veh-race")));
    const statuses = all.map((r) => r.status);
    expect(statuses.every((s) => s === 201 || s === 409)).toBe(true);
    const fresh = all.filter((r) => r.status === 201 && r.headers.get("idempotent-replayed") === null);
    expect(fresh).toHaveLength(1);
    expect(await vehicleCount()).toBe(before + 1);
  });

  it("treats a key past its 24 hours as new", async () => {
    as(ADA);
    const before = await vehicleCount();
    await db("idempotency_keys")
      .where({ user_id: ADA.id, key: "veh-1" })
      .update({ expires_at: db.raw("now() - interval '1 second'") });
    const res = await createVehicle({ ...VEHICLE, name: "Next day truck" }, "veh-1");
    expect(res.status).toBe(201);
    expect(res.headers.get("idempotent-replayed")).toBeNull();
    expect(await vehicleCount()).toBe(before + 1);
  });

  it("keeps each caller's keys apart: another person's same key creates their own", async () => {
    as(BO);
    const res = await createVehicle(VEHICLE, "veh-1");
    expect(res.status).toBe(201);
    expect(res.headers.get("idempotent-replayed")).toBeNull();
    expect(await vehicleCount(BO.id)).toBe(1);
  });

  it("answers 409 while a reservation is fresh, and takes over one left pending for over a minute (a server that died mid-create)", async () => {
    as(ADA);
    await db("idempotency_keys").insert({
      user_id: ADA.id,
      route: "POST /api/vehicles",
      key: "veh-crash",
      request_hash: createHash("sha256").update(JSON.stringify(VEHICLE)).digest("hex"),
      attempt: "e1000000-0000-4000-8000-0000000000aa",
    });
    const before = await vehicleCount();
    const busy = await createVehicle(VEHICLE, "veh-crash");
    expect(busy.status).toBe(409);
    expect((await busy.json()).error).toMatch(/still in progress/);
    await db("idempotency_keys")
      .where({ key: "veh-crash" })
      .update({ locked_at: db.raw("now() - interval '2 minutes'") });
    const taken = await createVehicle(VEHICLE, "veh-crash");
    expect(taken.status).toBe(201);
    expect(await vehicleCount()).toBe(before + 1);
    expect((await createVehicle(VEHICLE, "veh-crash")).headers.get("idempotent-replayed")).toBe("true");
  });
});

async function jpeg(): Promise<Buffer> {
  return sharp({ create: { width: 96, height: 64, channels: 3, background: "#5a7d3c" } })
    .jpeg()
    .toBuffer();
}

/** One multipart body, serialized once, so a retry sends the very same bytes (as a client replaying its request does). */
async function multipart(bytes: Buffer, name: string): Promise<{ body: Buffer; type: string }> {
  const form = new FormData();
  form.set("file", new File([new Uint8Array(bytes)], name, { type: "image/jpeg" }));
  const r = new Response(form);
  return { body: Buffer.from(await r.arrayBuffer()), type: r.headers.get("content-type")! };
}

describe("photo uploads", () => {
  let vehicleId: string;
  let keptKeys: string[] = [];

  it("replays an upload sent again with the same key and bytes: one row, one pair of objects", async () => {
    as(ADA);
    vehicleId = (await (await createVehicle({ ...VEHICLE, name: "Photo truck" })).json()).vehicle.id;
    const { body, type } = await multipart(await jpeg(), "door.jpg");
    const send = () =>
      uploads.POST(
        req("POST", `/api/vehicles/${vehicleId}/photos`, body, { "content-type": type, "idempotency-key": "photo-1" }),
        ctx({ id: vehicleId }),
      );
    const first = await send();
    expect(first.status).toBe(201);
    const second = await send();
    expect(second.status).toBe(201);
    expect(second.headers.get("idempotent-replayed")).toBe("true");
    expect((await second.json()).photo.id).toBe((await first.json()).photo.id);
    expect(await db("vehicle_photos").where({ vehicle_id: vehicleId }).count()).toEqual([{ count: "1" }]);
    keptKeys = await photos.objectKeys();
    expect(keptKeys).toHaveLength(2);
  });

  it("the sweep job deletes an old object no row points to, keeps a fresh one and every object that has its row", async () => {
    const image = await jpeg();
    const oldOrphan = `vehicles/${vehicleId}/e1000000-0000-4000-8000-0000000000b1.jpg`;
    const freshOrphan = `vehicles/${vehicleId}/e1000000-0000-4000-8000-0000000000b2.jpg`;
    await photos.store.put(oldOrphan, image, "image/jpeg");
    await photos.store.put(freshOrphan, image, "image/jpeg");
    ageObject(photos, oldOrphan, 120);
    for (const k of keptKeys) ageObject(photos, k, 120); // old, but the photo's row points to them
    await (await getBoss()).send(QUEUES.photoSweep.name, {});
    const run = await drainQueue(QUEUES.photoSweep.name);
    expect(run.failed).toEqual([]);
    expect(run.completed).toHaveLength(1);
    expect(await photos.objectKeys()).toEqual([...keptKeys, freshOrphan].sort());
  });

  it("deleting the photo still deletes its objects", async () => {
    as(ADA);
    const id = (await db("vehicle_photos").where({ vehicle_id: vehicleId }).first("id")).id as string;
    const res = await photo.DELETE(req("DELETE", `/api/photos/${id}`), ctx({ id }));
    expect(res.status).toBeLessThan(300);
    expect((await photos.objectKeys()).filter((k) => keptKeys.includes(k))).toEqual([]);
  });
});
