import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { testDb } from "./support/db";
import { bookedInstallOfShopA } from "./support/bookedInstall";
import { drainQueue } from "./support/jobs";
import { setUpBookableShops, tearDownBookableShops } from "./support/openShop";
import { ageObject, withStoreFailingHalfway } from "./support/photoObjects";
import { startTestPhotoStore, type TestPhotoStore } from "./support/photoStore";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_A, U } from "./support/shopFixture";
import { bodyFor } from "./support/workOrderSteps";
import { workOrderRoutes } from "./support/workOrderRoutes";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const as = (u: (typeof U)[keyof typeof U] | null) => void (session.current = u ? sessionOf(u) : null);
let photos: TestPhotoStore;

const { open, read, sign, move } = await workOrderRoutes();
const collection = await import("@/app/api/shop/work-orders/[id]/photos/route");
const single = await import("@/app/api/shop/work-orders/[id]/photos/[photoId]/route");
const { requiredSteps } = await import("@/lib/shop/workOrders/api");
const { QUEUES, getBoss } = await import("@/lib/platform/jobs/boss");

beforeAll(async () => {
  await setUpBookableShops(db);
  photos = await startTestPhotoStore("step-photos");
});
afterAll(async () => {
  await photos.close();
  await tearDownBookableShops(db);
});

/** A work order of shop A, opened by its staff and (unless told) moved into the bay. */
async function workOrder(inBay = true): Promise<string> {
  as(U.staffA);
  const { quoteId } = await bookedInstallOfShopA(db, "Photo Customer");
  const id = (await (await open(req("POST", "/api/shop/work-orders", { quoteId }), ctx())).json()).id as string;
  if (inBay) expect((await moveTo(id, "in_bay")).status).toBe(200);
  return id;
}
const moveTo = (id: string, to: string) => move(req("POST", `/api/shop/work-orders/${id}/status`, { to }), ctx({ id }));
const signAs = (id: string, position: string, step: string) =>
  sign(req("PUT", `/api/shop/work-orders/${id}/steps`, bodyFor(position, step)), ctx({ id }));

/** A phone's JPEG: with its maker's tags and a GPS position, as a camera writes them. */
const phoneJpeg = () =>
  sharp({ create: { width: 160, height: 120, channels: 3, background: "#6b4f2a" } })
    .jpeg()
    .withExif({ IFD0: { Artist: "Bay 2 phone" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "39/1 44/1 0/1" } })
    .toBuffer();

function upload(id: string, bytes: Buffer | Uint8Array, name: string, at: Record<string, string>, headers: Record<string, string> = {}) {
  const form = new FormData();
  form.set("file", new File([new Uint8Array(bytes)], name, { type: "image/jpeg" }));
  for (const [k, v] of Object.entries(at)) form.set(k, v);
  return collection.POST(req("POST", `/api/shop/work-orders/${id}/photos`, form, headers), ctx({ id }));
}
const list = (id: string) => collection.GET(req("GET", `/api/shop/work-orders/${id}/photos`), ctx({ id }));
const fetchPhoto = (id: string, photoId: string, variant = "") =>
  single.GET(req("GET", `/api/shop/work-orders/${id}/photos/${photoId}${variant ? `?variant=${variant}` : ""}`), ctx({ id, photoId }));
const remove = (id: string, photoId: string) =>
  single.DELETE(req("DELETE", `/api/shop/work-orders/${id}/photos/${photoId}`), ctx({ id, photoId }));
const rowCount = async () => Number((await db("work_order_step_photos").count({ n: "*" }))[0]!.n);
const LF_TORQUE = { position: "LF", step: "lug_torque" };

/** Refused with this status and message, and nothing stored: no new row, no new object. */
async function refused(res: Response, status: number, message: RegExp, before: { rows: number; objects: number }) {
  expect(res.status).toBe(status);
  expect((await res.json()).error).toMatch(message);
  expect(await rowCount()).toBe(before.rows);
  expect(await photos.objectKeys()).toHaveLength(before.objects);
}
const snapshot = async () => ({ rows: await rowCount(), objects: (await photos.objectKeys()).length });

describe("a step's photos", () => {
  let id = "";
  let first = "";
  beforeAll(async () => {
    id = await workOrder();
  });

  it("the shop's staff add photos to a step, list them, fetch each full size and as a thumbnail, without location data", async () => {
    as(U.staffA);
    const res = await upload(id, await phoneJpeg(), "lf-torque.jpg", LF_TORQUE);
    expect(res.status).toBe(201);
    const { photo } = await res.json();
    first = photo.id;
    expect(photo).toMatchObject({
      position: "LF",
      step: "lug_torque",
      name: "lf-torque.jpg",
      contentType: "image/jpeg",
      width: 160,
      height: 120,
      url: `/api/shop/work-orders/${id}/photos/${photo.id}`,
      thumbUrl: `/api/shop/work-orders/${id}/photos/${photo.id}?variant=thumb`,
    });
    expect(photo.takenBy).toBeTruthy();
    // A second one of the same step, after it is signed off: signing does not close the step to photos.
    expect((await signAs(id, "LF", "lug_torque")).status).toBe(200);
    expect((await upload(id, await phoneJpeg(), "lf-torque-2.jpg", LF_TORQUE)).status).toBe(201);

    const listed = (await (await list(id)).json()).photos as { id: string; name: string }[];
    expect(listed.map((p) => p.name)).toEqual(["lf-torque.jpg", "lf-torque-2.jpg"]);
    const sheet = (await (await read(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).json()).workOrder;
    expect(sheet.photos.map((p: { id: string }) => p.id)).toEqual(listed.map((p) => p.id));
    // Object keys are the server's business only.
    const keys = await photos.objectKeys();
    for (const k of keys) expect(JSON.stringify(listed)).not.toContain(k);

    const full = await fetchPhoto(id, first);
    expect(full.status).toBe(200);
    expect(full.headers.get("content-type")).toBe("image/jpeg");
    expect(full.headers.get("cache-control")).toBe("private, max-age=300");
    const meta = await sharp(Buffer.from(await full.arrayBuffer())).metadata();
    expect(meta.exif).toBeUndefined();
    const thumb = await fetchPhoto(id, first, "thumb");
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    expect((await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).width).toBe(360);
    expect(await photos.objectKeys()).toHaveLength(4);
    expect((await photos.objectKeys()).every((k) => k.startsWith(`work-orders/${id}/`))).toBe(true);
  });

  it("another shop's staff and owner get 404 for the list, the bytes, an upload and a removal; nothing changes", async () => {
    const before = await snapshot();
    for (const who of [U.staffB, U.ownerB]) {
      as(who);
      expect((await list(id)).status).toBe(404);
      expect((await fetchPhoto(id, first)).status).toBe(404);
      expect((await fetchPhoto(id, first, "thumb")).status).toBe(404);
      await refused(await upload(id, await phoneJpeg(), "x.jpg", LF_TORQUE), 404, /work order was not found/, before);
      await refused(await remove(id, first), 404, /not found/, before);
    }
    // A photo id under another work order of the same shop is not found either.
    as(U.staffA);
    const other = await workOrder();
    expect((await fetchPhoto(other, first)).status).toBe(404);
    await refused(await remove(other, first), 404, /photo was not found/, before);
  });

  it("refuses an oversized file (declared and actual), a file that is not an image, and a step the sheet lacks; nothing is stored", async () => {
    as(U.staffA);
    const before = await snapshot();
    const small = await phoneJpeg();
    await refused(
      await upload(id, small, "a.jpg", LF_TORQUE, { "content-length": String(11 * 1024 * 1024) }),
      413,
      /^That file is larger than 10 MB\. Resize it or pick a smaller one\.$/,
      before,
    );
    const big = Buffer.concat([small, Buffer.alloc(10 * 1024 * 1024 + 1 - small.length)]);
    await refused(await upload(id, big, "big.jpg", LF_TORQUE), 413, /larger than 10 MB/, before);
    await refused(
      await upload(id, Buffer.from("GIF89a not what it claims"), "sneaky.jpg", LF_TORQUE),
      415,
      /not a JPEG, PNG or WebP/,
      before,
    );
    await refused(await upload(id, small, "../../x.jpg", LF_TORQUE), 422, /must not contain folders/, before);
    const noSpare = await upload(id, small, "spare.jpg", { position: "spare", step: "fitted" });
    expect(noSpare.status).toBe(422);
    expect((await noSpare.json()).fieldErrors.position[0]).toBe("Spare: tire and wheel as fitted is not on this work order.");
    const unknown = await upload(id, small, "x.jpg", { position: "LF", step: "paint" });
    expect(unknown.status).toBe(422);
    expect((await unknown.json()).fieldErrors.step[0]).toBe("Step: pick a step of this work order.");
    expect(await snapshot()).toEqual(before);
  });

  it("refuses a thirteenth photo of one step, naming the step", async () => {
    const rows = Array.from({ length: 12 }, (_, i) => ({
      work_order_id: id,
      shop_id: SHOP_A,
      position: "RR",
      step: "pressure",
      object_key: `work-orders/${id}/cap-${i}.jpg`,
      thumb_key: `work-orders/${id}/cap-${i}-thumb.webp`,
      content_type: "image/jpeg",
      width: 1,
      height: 1,
      bytes: 1,
      original_name: `cap-${i}.jpg`,
      taken_by: "Sam Staff",
    }));
    await db("work_order_step_photos").insert(rows);
    try {
      as(U.staffA);
      const before = await snapshot();
      await refused(
        await upload(id, await phoneJpeg(), "13.jpg", { position: "RR", step: "pressure" }),
        409,
        /^Right rear: cold pressure set already has 12 photos: remove one before adding another\.$/,
        before,
      );
    } finally {
      await db("work_order_step_photos").where({ work_order_id: id, position: "RR", step: "pressure" }).del();
    }
  });

  it("any staff removes a photo of a step not yet signed; a signed step's photo only the owner removes", async () => {
    as(U.staffA2);
    const unsigned = (await (await upload(id, await phoneJpeg(), "rf.jpg", { position: "RF", step: "balance" })).json()).photo.id;
    const before = await snapshot();
    expect((await remove(id, unsigned)).status).toBe(200);
    expect(await rowCount()).toBe(before.rows - 1);
    expect(await photos.objectKeys()).toHaveLength(before.objects - 2);

    const kept = await snapshot();
    await refused(await remove(id, first), 409, /only the shop owner can remove it/, kept);
    as(U.ownerA);
    expect((await remove(id, first)).status).toBe(200);
    expect(await db("work_order_step_photos").where({ id: first }).first()).toBeUndefined();
    expect(await photos.objectKeys()).toHaveLength(kept.objects - 2);
    expect((await fetchPhoto(id, first)).status).toBe(404);
  });

  it("leaves nothing behind when the store fails halfway", async () => {
    as(U.staffA);
    const before = await snapshot();
    await withStoreFailingHalfway(photos, async () =>
      refused(await upload(id, await phoneJpeg(), "half.jpg", LF_TORQUE), 503, /nothing was saved/, before),
    );
  });
});

describe("photos and the work order's status", () => {
  it("a booked work order takes no photo until it is in the bay; a done one takes none, its photos stay for the owner to remove", async () => {
    const id = await workOrder(false);
    as(U.staffA);
    const before = await snapshot();
    await refused(await upload(id, await phoneJpeg(), "early.jpg", LF_TORQUE), 409, /before adding photos/, before);
    expect((await moveTo(id, "in_bay")).status).toBe(200);
    const res = await upload(id, await phoneJpeg(), "trim.jpg", { position: "vehicle", step: "trimming" });
    expect(res.status).toBe(201);
    const photoId = (await res.json()).photo.id as string;
    const w = (await (await read(req("GET", `/api/shop/work-orders/${id}`), ctx({ id }))).json()).workOrder;
    for (const s of requiredSteps(w)) expect((await signAs(id, s.position, s.step)).status).toBe(200);
    expect((await moveTo(id, "done")).status).toBe(200);

    const done = await snapshot();
    await refused(
      await upload(id, await phoneJpeg(), "late.jpg", LF_TORQUE),
      409,
      /work order is done: photos can no longer be added/,
      done,
    );
    await refused(await remove(id, photoId), 409, /only the shop owner/, done);
    expect((await fetchPhoto(id, photoId)).status).toBe(200);
    as(U.ownerA);
    expect((await remove(id, photoId)).status).toBe(200);
    expect(await rowCount()).toBe(done.rows - 1);
  });
});

describe("the orphan sweep", () => {
  it("deletes an old step-photo object no row names, keeps a fresh one and every object whose row is there", async () => {
    const id = await workOrder();
    as(U.staffA);
    expect((await upload(id, await phoneJpeg(), "kept.jpg", LF_TORQUE)).status).toBe(201);
    const kept = (await photos.objectKeys()).filter((k) => k.startsWith(`work-orders/${id}/`));
    expect(kept).toHaveLength(2);
    const image = await phoneJpeg();
    const oldOrphan = `work-orders/${id}/e2000000-0000-4000-8000-0000000000c1.jpg`;
    const freshOrphan = `work-orders/${id}/e2000000-0000-4000-8000-0000000000c2.jpg`;
    await photos.store.put(oldOrphan, image, "image/jpeg");
    await photos.store.put(freshOrphan, image, "image/jpeg");
    ageObject(photos, oldOrphan, 120);
    for (const k of kept) ageObject(photos, k, 120); // old, but the photo's row names them
    const others = (await photos.objectKeys()).filter((k) => !k.startsWith(`work-orders/${id}/`));

    await (await getBoss()).send(QUEUES.photoSweep.name, {});
    const run = await drainQueue(QUEUES.photoSweep.name);
    expect(run.failed).toEqual([]);
    expect(run.completed).toHaveLength(1);
    expect(await photos.objectKeys()).toEqual([...others, ...kept, freshOrphan].sort());
  });
});
