import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { SETUP, VEHICLE as STOCK_VEHICLE } from "./support/garageFixture";
import { withStoreFailingHalfway } from "./support/photoObjects";
import { startTestPhotoStore, type TestPhotoStore } from "./support/photoStore";
import { ctx, req } from "./support/requests";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
let photos: TestPhotoStore;

const USERS = {
  ada: { id: "b2000000-0000-4000-8000-000000000001", email: "ada@example.test", name: "Ada Quillfeather", role: "member" },
  bo: { id: "b2000000-0000-4000-8000-000000000002", email: "bo@example.test", name: "Bo Tarrant", role: "member" },
  root: { id: "b2000000-0000-4000-8000-000000000003", email: "root@example.test", name: "Rue Admin", role: "admin" },
  staff: { id: "b2000000-0000-4000-8000-000000000004", email: "staff@example.test", name: "Sy Counter", role: "shop_staff" },
} as const;
type Who = keyof typeof USERS;
const SHOP = "c3000000-0000-4000-8000-000000000001";

function as(who: Who | null) {
  const u = who ? USERS[who] : null;
  session.current = u
    ? { user: { id: u.id, role: u.role, shopId: u.role === "shop_staff" ? SHOP : null, name: u.name, email: u.email } }
    : null;
}

beforeAll(async () => {
  await rebuild(db);
  await db("shops").insert({ id: SHOP, name: "Test Shop" });
  for (const u of Object.values(USERS))
    await db("users").insert({ ...u, password_hash: "x", shop_id: u.role === "shop_staff" ? SHOP : null });
  photos = await startTestPhotoStore("test-photos");
});
afterAll(async () => {
  await photos.close();
  await closeDatabases(db);
});

const vehicles = await import("@/app/api/vehicles/route");
const vehicle = await import("@/app/api/vehicles/[id]/route");
const clearances = await import("@/app/api/vehicles/[id]/clearances/route");
const clearance = await import("@/app/api/vehicles/[id]/clearances/[clearanceId]/route");
const uploads = await import("@/app/api/vehicles/[id]/photos/route");
const photo = await import("@/app/api/photos/[id]/route");

// Moved off stock: 5-3/4 in backspacing to the bead seat, 1/2 in flange.
const VEHICLE = {
  ...STOCK_VEHICLE,
  currentSetup: { ...SETUP, position: { mode: "backspacing", backspacingIn: "5-3/4", reference: "bead-seat", flangeIn: "1/2" } },
};

async function createAs(who: Who, body: object = VEHICLE) {
  as(who);
  const res = await vehicles.POST(req("POST", "/api/vehicles", body), ctx());
  return { res, body: await res.json() };
}

async function pngWithGps(width = 120, height = 80): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: "#2f72a8" } })
    .jpeg()
    .withExif({ IFD0: { Artist: "Someone" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1" } })
    .toBuffer();
}

function upload(
  vehicleId: string,
  bytes: Buffer | Uint8Array,
  name: string,
  extra: Record<string, string> = {},
  headers: Record<string, string> = {},
) {
  const form = new FormData();
  form.set("file", new File([new Uint8Array(bytes)], name, { type: "image/jpeg" }));
  for (const [k, v] of Object.entries(extra)) form.set(k, v);
  return uploads.POST(req("POST", `/api/vehicles/${vehicleId}/photos`, form, headers), ctx({ id: vehicleId }));
}

let adaVehicle: string;
let adaClearance: string;
let adaPhoto: string;

describe("vehicles", () => {
  it("creates a vehicle: bolt pattern normalized by the engine, fractions read as inches", async () => {
    const { res, body } = await createAs("ada");
    expect(res.status).toBe(201);
    adaVehicle = body.vehicle.id;
    expect(body.vehicle.boltPattern).toBe("6x5.5");
    // 2-1/2 in = 63.5 mm exactly (1 in = 25.4 mm, NIST SP 811)
    expect(body.vehicle.liftHeightMm).toBeCloseTo(63.5, 9);
    expect(body.vehicle.currentSetup.position).toEqual({ mode: "backspacing", backspacingIn: 5.75, reference: "bead-seat", flangeIn: 0.5 });
    const row = await db("vehicles").where({ id: adaVehicle }).first();
    expect(row.bolt_pcd_mm).toBeCloseTo(139.7, 9);
  });

  it("refuses a bad bolt pattern and a tire that does not fit the wheel with field errors, storing nothing", async () => {
    const before = await db("vehicles").count<{ count: string }[]>();
    const { res, body } = await createAs("ada", { ...VEHICLE, boltPattern: "6x5.5x2", currentSetup: { ...SETUP, wheelDiameterIn: 18 } });
    expect(res.status).toBe(422);
    expect(body.fieldErrors.boltPattern[0]).toMatch(/not a bolt pattern/);
    expect(body.fieldErrors["currentSetup.wheelDiameterIn"][0]).toMatch(/17 in tire needs a 17 in wheel/);
    expect(await db("vehicles").count()).toEqual(before);
  });

  it("lists only the caller's vehicles", async () => {
    await createAs("bo", { ...VEHICLE, name: "Bo's rig", boltPattern: "5x114.3" });
    as("ada");
    const ada = await (await vehicles.GET(req("GET", "/api/vehicles"), ctx())).json();
    expect(ada.vehicles.map((v: { name: string }) => v.name)).toEqual(["Gravel hauler"]);
  });

  it("gives 404 — never 403 — for another member's vehicle, on every method", async () => {
    as("bo");
    expect((await vehicle.GET(req("GET", `/api/vehicles/${adaVehicle}`), ctx({ id: adaVehicle }))).status).toBe(404);
    expect((await vehicle.PATCH(req("PATCH", `/api/vehicles/${adaVehicle}`, VEHICLE), ctx({ id: adaVehicle }))).status).toBe(404);
    expect((await vehicle.DELETE(req("DELETE", `/api/vehicles/${adaVehicle}`), ctx({ id: adaVehicle }))).status).toBe(404);
    const post = await clearances.POST(
      req("POST", `/api/vehicles/${adaVehicle}/clearances`, {
        label: "x",
        direction: "upward",
        distance: "1 in",
        suspensionState: "ride-height",
      }),
      ctx({ id: adaVehicle }),
    );
    expect(post.status).toBe(404);
    expect((await db("vehicles").where({ id: adaVehicle }).first()).name).toBe("Gravel hauler");
    expect(await db("vehicle_clearances").count()).toEqual([{ count: "0" }]);
    // admins keep their own garage; they cannot open a member's vehicle
    as("root");
    expect((await vehicle.GET(req("GET", `/api/vehicles/${adaVehicle}`), ctx({ id: adaVehicle }))).status).toBe(404);
    // shop staff keep a garage of their own, as every member does: theirs is empty, a member's vehicle is not theirs (404)
    as("staff");
    const staffList = await vehicles.GET(req("GET", "/api/vehicles"), ctx());
    expect(staffList.status).toBe(200);
    expect((await staffList.json()).vehicles).toEqual([]);
    expect((await vehicle.GET(req("GET", `/api/vehicles/${adaVehicle}`), ctx({ id: adaVehicle }))).status).toBe(404);
    // anonymous callers must sign in
    as(null);
    expect((await vehicles.GET(req("GET", "/api/vehicles"), ctx())).status).toBe(401);
    as("ada");
    expect((await vehicle.GET(req("GET", "/api/vehicles/not-a-uuid"), ctx({ id: "not-a-uuid" }))).status).toBe(404);
  });

  it("updates the owner's vehicle", async () => {
    as("ada");
    const res = await vehicle.PATCH(
      req("PATCH", `/api/vehicles/${adaVehicle}`, { ...VEHICLE, name: "Gravel hauler II", boltPattern: "6x139.7" }),
      ctx({ id: adaVehicle }),
    );
    expect(res.status).toBe(200);
    expect((await res.json()).vehicle).toMatchObject({ name: "Gravel hauler II", boltPattern: "6x139.7" });
  });
});

describe("measured clearances", () => {
  const post = (body: object) => clearances.POST(req("POST", `/api/vehicles/${adaVehicle}/clearances`, body), ctx({ id: adaVehicle }));

  it("refuses a distance with no unit, with a message, and stores nothing", async () => {
    as("ada");
    const res = await post({ label: "frame rail, full left lock", direction: "inboard", distance: "38", suspensionState: "full-lock" });
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors.distance[0]).toMatch(/Say which unit 38 is in/);
    expect(await db("vehicle_clearances").count()).toEqual([{ count: "0" }]);
  });

  it("stores inches with a fraction as mm (1-1/2 in = 38.1 mm), with the current setup as the measured setup", async () => {
    as("ada");
    const res = await post({
      label: "frame rail, full left lock",
      direction: "inboard",
      distance: "1-1/2 in",
      suspensionState: "full-lock",
    });
    expect(res.status).toBe(201);
    const c = (await res.json()).clearance;
    adaClearance = c.id;
    expect(c.distanceMm).toBeCloseTo(38.1, 9);
    expect(c.measuredSetup.position.mode).toBe("backspacing");
    const mm = await post({ label: "fender lip", direction: "outboard", distance: 22, unit: "mm", suspensionState: "ride-height" });
    expect((await mm.json()).clearance).toMatchObject({ distanceMm: 22, distanceText: "22 mm" });
  });

  it("refuses an unknown direction and a negative gap", async () => {
    as("ada");
    const res = await post({ label: "x", direction: "sideways", distance: "-3 mm", suspensionState: "ride-height" });
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(Object.keys(body.fieldErrors)).toContain("direction");
  });
});

describe("photo uploads", () => {
  it("stores a JPEG without its EXIF/GPS, with a thumbnail, visible to the owner and admins only", async () => {
    const original = await pngWithGps(640, 400);
    expect((await sharp(original).metadata()).exif).toBeDefined();
    as("ada");
    const res = await upload(adaVehicle, original, "driver side.jpg", { clearanceId: adaClearance });
    expect(res.status).toBe(201);
    const p = (await res.json()).photo;
    adaPhoto = p.id;
    expect(p).toMatchObject({ clearanceId: adaClearance, contentType: "image/jpeg", width: 640, height: 400, name: "driver side.jpg" });
    expect(p.url).toBe(`/api/photos/${p.id}`);

    const full = await photo.GET(req("GET", p.url), ctx({ id: p.id }));
    expect(full.status).toBe(200);
    expect(full.headers.get("content-type")).toBe("image/jpeg");
    const bytes = Buffer.from(await full.arrayBuffer());
    const meta = await sharp(bytes).metadata();
    expect(meta.exif).toBeUndefined();
    expect(bytes.includes(Buffer.from("Someone"))).toBe(false);
    const thumb = await photo.GET(req("GET", `${p.url}?variant=thumb`), ctx({ id: p.id }));
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    expect((await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).width).toBe(360);
    expect(await photos.objectKeys()).toHaveLength(2);

    as("bo");
    expect((await photo.GET(req("GET", p.url), ctx({ id: p.id }))).status).toBe(404);
    expect((await photo.DELETE(req("DELETE", p.url), ctx({ id: p.id }))).status).toBe(404);
    as("root");
    expect((await photo.GET(req("GET", p.url), ctx({ id: p.id }))).status).toBe(200);
    expect((await photo.DELETE(req("DELETE", p.url), ctx({ id: p.id }))).status).toBe(404);
    as(null);
    expect((await photo.GET(req("GET", p.url), ctx({ id: p.id }))).status).toBe(401);
    expect(await photos.objectKeys()).toHaveLength(2);
  });

  async function rejected(res: Response, status: number, message: RegExp) {
    expect(res.status).toBe(status);
    expect((await res.json()).error).toMatch(message);
    expect(await db("vehicle_photos").count()).toEqual([{ count: "1" }]);
    expect(await photos.objectKeys()).toHaveLength(2);
  }

  it("refuses a file whose bytes are not an image, whatever its name says", async () => {
    as("ada");
    await rejected(await upload(adaVehicle, Buffer.from("GIF89a not what it claims"), "sneaky.jpg"), 415, /not a JPEG, PNG or WebP/);
    await rejected(await upload(adaVehicle, Buffer.from([0xff, 0xd8, 0xff, 0x00, 1, 2, 3]), "broken.jpg"), 415, /could not be read/);
  });

  it("refuses an oversized file from its Content-Length before reading, and from its size", async () => {
    as("ada");
    const small = await pngWithGps();
    await rejected(await upload(adaVehicle, small, "a.jpg", {}, { "content-length": String(11 * 1024 * 1024) }), 413, /larger than 10 MB/);
    const big = Buffer.concat([small, Buffer.alloc(10 * 1024 * 1024 + 1 - small.length)]);
    await rejected(await upload(adaVehicle, big, "big.jpg"), 413, /larger than 10 MB/);
  });

  it("refuses a path-traversal file name", async () => {
    as("ada");
    const img = await pngWithGps();
    await rejected(await upload(adaVehicle, img, "../../etc/passwd.jpg"), 422, /must not contain folders/);
    await rejected(await upload(adaVehicle, img, "..\\windows.jpg"), 422, /must not contain folders/);
  });

  it("refuses uploads to another member's vehicle or clearance point, and object keys as ids", async () => {
    const img = await pngWithGps();
    as("bo");
    await rejected(await upload(adaVehicle, img, "x.jpg"), 404, /vehicle was not found/);
    const bos = (await db("vehicles").where({ user_id: USERS.bo.id }).first()).id as string;
    await rejected(await upload(bos, img, "x.jpg", { clearanceId: adaClearance }), 404, /clearance point was not found/);
    const key = (await db("vehicle_photos").first()).object_key as string;
    const enc = encodeURIComponent(key);
    expect((await photo.GET(req("GET", `/api/photos/${enc}`), ctx({ id: key }))).status).toBe(404);
    as("ada");
    expect((await photo.GET(req("GET", `/api/photos/${enc}`), ctx({ id: key }))).status).toBe(404);
  });

  it("refuses a body that is not multipart, and a form without a file", async () => {
    as("ada");
    const json = await uploads.POST(req("POST", `/api/vehicles/${adaVehicle}/photos`, { file: "x" }), ctx({ id: adaVehicle }));
    await rejected(json, 415, /multipart/);
    const form = new FormData();
    form.set("note", "nothing");
    await rejected(
      await uploads.POST(req("POST", `/api/vehicles/${adaVehicle}/photos`, form), ctx({ id: adaVehicle })),
      422,
      /Choose a photo/,
    );
  });

  it("leaves nothing behind when the store fails halfway", async () => {
    await withStoreFailingHalfway(photos, async () => {
      as("ada");
      const res = await upload(adaVehicle, await pngWithGps(), "half.jpg");
      expect(res.status).toBe(503);
      expect((await res.json()).error).toMatch(/nothing was saved/);
      expect(await db("vehicle_photos").count()).toEqual([{ count: "1" }]);
      expect(await photos.objectKeys()).toHaveLength(2);
    });
  });

  it("deleting a clearance point deletes its photos' objects; deleting a vehicle deletes all of them", async () => {
    as("ada");
    const second = await upload(adaVehicle, await pngWithGps(), "whole truck.png");
    expect(second.status).toBe(201);
    expect(await photos.objectKeys()).toHaveLength(4);
    const del = await clearance.DELETE(
      req("DELETE", `/api/vehicles/${adaVehicle}/clearances/${adaClearance}`),
      ctx({ id: adaVehicle, clearanceId: adaClearance }),
    );
    expect(del.status).toBe(200);
    expect(await db("vehicle_photos").where({ id: adaPhoto }).first()).toBeUndefined();
    expect(await photos.objectKeys()).toHaveLength(2);
    const res = await vehicle.DELETE(req("DELETE", `/api/vehicles/${adaVehicle}`), ctx({ id: adaVehicle }));
    expect(res.status).toBe(200);
    expect(await photos.objectKeys()).toEqual([]);
    expect(await db("vehicle_photos").count()).toEqual([{ count: "0" }]);
    expect(await db("vehicle_clearances").where({ vehicle_id: adaVehicle }).count()).toEqual([{ count: "0" }]);
  });
});

describe("install checklists", () => {
  const checklist = () => import("@/app/api/vehicles/[id]/checklist/route");
  const PLANNED = { tire: "35x12.50R17LT", wheelDiameterIn: 17, wheelWidthIn: 9, position: { mode: "offset", offsetMm: -12 }, spacerMm: 0 };
  const Q = "pt=35x12.50R17LT&pd=17&pw=9&po=-12";

  /** A vehicle of Ada's (signed in as her after) with one clearance point measured on it, and its checklist read for a query. */
  async function vehicleWithPoint(name: string, point: object) {
    const { body } = await createAs("ada", { ...VEHICLE, name });
    const id = body.vehicle.id as string;
    as("ada");
    const res = await clearances.POST(req("POST", `/api/vehicles/${id}/clearances`, point), ctx({ id }));
    const { GET } = await checklist();
    const checklistFor = async (query: string) => (await GET(req("GET", `/api/vehicles/${id}/checklist?${query}`), ctx({ id }))).json();
    return { id, pointId: (await res.json()).clearance.id as string, checklistFor };
  }

  it("saves ticks per vehicle + planned setup, refuses unknown items, and is owner-scoped", async () => {
    const { GET, PUT } = await checklist();
    const { body } = await createAs("ada");
    const id = body.vehicle.id as string;
    as("ada");
    const first = await (await GET(req("GET", `/api/vehicles/${id}/checklist?${Q}`), ctx({ id }))).json();
    expect(first.ticked).toEqual([]);
    expect(first.comparisonId).toBeNull();
    expect(first.items.map((i: { id: string }) => i.id)).toEqual(
      expect.arrayContaining(["regear", "speedometer", "lug-torque", "lug-recheck", "beadlock"]),
    );

    const bad = await PUT(req("PUT", `/api/vehicles/${id}/checklist`, { planned: PLANNED, ticked: ["regear", "made-up"] }), ctx({ id }));
    expect(bad.status).toBe(422);
    expect((await bad.json()).fieldErrors.ticked[0]).toMatch(/made-up/);
    expect(await db("install_checklists").count()).toEqual([{ count: "0" }]);

    const ok = await PUT(
      req("PUT", `/api/vehicles/${id}/checklist`, { planned: PLANNED, ticked: ["regear", "alignment", "regear"] }),
      ctx({ id }),
    );
    expect(ok.status).toBe(200);
    expect((await ok.json()).ticked).toEqual(["regear", "alignment"]);
    const again = await (await GET(req("GET", `/api/vehicles/${id}/checklist?${Q}`), ctx({ id }))).json();
    expect(again.ticked).toEqual(["regear", "alignment"]);
    const other = await (await GET(req("GET", `/api/vehicles/${id}/checklist?pt=37x12.50R17LT&pd=17&pw=9&po=-12`), ctx({ id }))).json();
    expect(other.ticked).toEqual([]);
    expect((await GET(req("GET", `/api/vehicles/${id}/checklist`), ctx({ id }))).status).toBe(400);

    as("bo");
    expect((await GET(req("GET", `/api/vehicles/${id}/checklist?${Q}`), ctx({ id }))).status).toBe(404);
    expect((await PUT(req("PUT", `/api/vehicles/${id}/checklist`, { planned: PLANNED, ticked: [] }), ctx({ id }))).status).toBe(404);
    expect((await db("install_checklists").where({ vehicle_id: id }).first()).ticked).toEqual(["regear", "alignment"]);
  });

  it("builds the checklist from a saved comparison tied to the vehicle, and stores the link", async () => {
    const { GET, PUT } = await checklist();
    const comparisons = await import("@/app/api/comparisons/route");
    const { DEFAULT_INPUT } = await import("@/lib/comparisons/schema");
    const { body: a } = await createAs("ada", { ...VEHICLE, name: "Comparison hauler" });
    const { body: b } = await createAs("ada", { ...VEHICLE, name: "Second hauler" });
    const { body: bos } = await createAs("bo", { ...VEHICLE, name: "Bo's other rig" });
    const A = a.vehicle.id as string;
    const saveFor = async (who: Who, vehicleId: string | null) => {
      as(who);
      const res = await comparisons.POST(
        req("POST", "/api/comparisons", { name: `35s for ${who}`, input: { ...DEFAULT_INPUT, planned: PLANNED }, vehicleId }),
        ctx(),
      );
      expect(res.status).toBe(201);
      return (await res.json()).comparison.id as string;
    };
    const tied = await saveFor("ada", A);
    const tiedToB = await saveFor("ada", b.vehicle.id);
    const untied = await saveFor("ada", null);
    const bosOwn = await saveFor("bo", bos.vehicle.id);

    as("ada");
    const get = (query: string) => GET(req("GET", `/api/vehicles/${A}/checklist?${query}`), ctx({ id: A }));
    const res = await get(`comparison=${tied}`);
    expect(res.status).toBe(200);
    const first = await res.json();
    expect(first.comparisonId).toBe(tied);
    expect(first.marginMm).toBeCloseTo(12.7, 9);
    // A comparison of the caller's tied to another vehicle, one tied to none, another member's:
    // none is this vehicle's checklist, and the answer does not say which case it was.
    for (const id of [tiedToB, untied, bosOwn]) {
      const r = await get(`comparison=${id}`);
      expect(r.status).toBe(404);
      expect((await r.json()).error).toMatch(/saved comparison/);
    }
    expect((await get("comparison=not-an-id")).status).toBe(400);

    const put = await PUT(req("PUT", `/api/vehicles/${A}/checklist`, { comparisonId: tied, ticked: ["alignment"] }), ctx({ id: A }));
    expect(put.status).toBe(200);
    expect((await db("install_checklists").where({ vehicle_id: A }).first()).comparison_id).toBe(tied);
    // The same planned setup opened from the vehicle page shows the same ticks.
    expect((await (await get(Q)).json()).ticked).toEqual(["alignment"]);
    const foreign = await PUT(req("PUT", `/api/vehicles/${A}/checklist`, { comparisonId: bosOwn, ticked: ["regear"] }), ctx({ id: A }));
    expect(foreign.status).toBe(404);
    expect((await db("install_checklists").where({ vehicle_id: A }).first()).ticked).toEqual(["alignment"]);

    // Deleting the comparison keeps the checklist and its ticks, without the link (ON DELETE SET NULL).
    await db("comparisons").where({ id: tied }).delete();
    const row = await db("install_checklists").where({ vehicle_id: A }).first();
    expect(row).toMatchObject({ comparison_id: null, ticked: ["alignment"] });
  });

  it("predicts a full-lock point by the tread corner's sweep about the vehicle's steering axis", async () => {
    const { pointId, checklistFor } = await vehicleWithPoint("Lock hauler", {
      label: "Frame rail",
      direction: "inboard",
      distance: "1-1/2 in",
      suspensionState: "full-lock",
    });
    const r = await checklistFor(Q);
    const trim = (r.items as { id: string; title: string; detail: string }[]).find((i) => i.id === `trim:${pointId}`);
    // Current 265/70R17 on 17x8, 5-3/4 in backspacing to the bead seat: offset 5.75 − 4 = 1.75 in = 44.45 mm;
    // inner reach 44.45 + 132.5 = 176.95 mm. Steering axis (KPI 8°, zero scrub assumed):
    // 44.45 + 401.4 × tan 8° = 100.863 mm inboard of the hub face. Inner tread corner at hub height:
    // √(401.4² + 76.087²) = 408.548 → 35x12.50R17LT on 17x9 −12 (inner 141.67): √(444.5² + 40.807²) = 446.369,
    // +37.822 mm: 38.1 − 37.822 = 0.28 mm, tight, needing 12.7 − 0.28 = 12.42 mm. The inner reach alone
    // (176.95 − 141.67 = 35.28 mm more room) called it clear; an axis at 0° KPI would leave 5.80 mm.
    expect(trim?.title).toBe("Tight at Frame rail: gain at least 12.4 mm (1/2 in)");
    expect(trim?.detail).toMatch(/^Predicted 0\.3 mm .*at full lock\)\. To fix: .*, or limit steering travel with the stops\.$/);
  });

  it("classes the points against the vehicle's margin, or the one tried with m", async () => {
    const { id, pointId, checklistFor } = await vehicleWithPoint("Margin hauler", {
      label: "fender lip, full stuff",
      direction: "upward",
      distance: "3 in",
      suspensionState: "full-stuff",
    });
    const trims = async (query: string) => {
      const r = await checklistFor(query);
      return { margin: r.marginMm as number, trims: (r.items as { id: string; title: string }[]).filter((i) => i.id.startsWith("trim:")) };
    };
    // 3 in = 76.2 mm measured; 265/70R17 → 35x12.50R17LT raises the tire's top by
    // (889.0 − 802.8) / 2 = 43.1 mm (ETRTO/TRA size designations), leaving 33.1 mm.
    expect(await trims(Q)).toEqual({ margin: 12.7, trims: [] });
    const tried = await trims(`${Q}&m=40`);
    expect(tried.margin).toBe(40);
    expect(tried.trims).toEqual([
      expect.objectContaining({ id: `trim:${pointId}`, title: expect.stringMatching(/^Tight at fender lip, full stuff/) }),
    ]);
    // An unusable m is ignored, not an error: the vehicle's margin applies.
    expect((await trims(`${Q}&m=-5`)).margin).toBe(12.7);

    const patch = await vehicle.PATCH(
      req("PATCH", `/api/vehicles/${id}`, { ...VEHICLE, name: "Margin hauler", clearanceMarginMm: "1-1/2 in" }),
      ctx({ id }),
    );
    expect(patch.status).toBe(200);
    // 1-1/2 in = 38.1 mm (NIST SP 811)
    expect((await patch.json()).vehicle.clearanceMarginMm).toBeCloseTo(38.1, 9);
    const now = await trims(Q);
    expect(now.margin).toBeCloseTo(38.1, 9);
    expect(now.trims.map((t) => t.id)).toEqual([`trim:${pointId}`]);
  });
});

describe("the vehicle's clearance margin", () => {
  it("defaults to 1/2 in (12.7 mm, common practice) and refuses a margin it cannot read or keep", async () => {
    const { res, body } = await createAs("ada", { ...VEHICLE, name: "Default margin" });
    expect(res.status).toBe(201);
    expect(body.vehicle.clearanceMarginMm).toBeCloseTo(12.7, 9);
    const mm = await createAs("ada", { ...VEHICLE, name: "Metric margin", clearanceMarginMm: "20 mm" });
    expect(mm.body.vehicle.clearanceMarginMm).toBe(20);
    const before = await db("vehicles").count();
    for (const bad of ["lots", "-1/4 in", "5 in"]) {
      const r = await createAs("ada", { ...VEHICLE, name: "Bad margin", clearanceMarginMm: bad });
      expect(r.res.status, bad).toBe(422);
      expect(r.body.fieldErrors.clearanceMarginMm[0]).toMatch(/margin/);
    }
    expect(await db("vehicles").count()).toEqual(before);
    const stored = await db("vehicles").where({ id: body.vehicle.id }).first();
    expect(stored.clearance_margin_mm).toBeCloseTo(12.7, 9);
  });
});
