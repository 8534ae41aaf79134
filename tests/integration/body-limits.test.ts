import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { MAX_PHOTO_BYTES } from "@/lib/garage/photos/image";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx } from "./support/requests";

/**
 * Security review: a body sent without Content-Length (chunked) was read whole before the size
 * cap — a 300 MB photo upload took the server from 464 to 1,140 MB before its 413. These send
 * an endless chunked body and count what the server pulled before refusing it.
 */
const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const USER = { id: "e1000000-0000-4000-8000-000000000001", email: "uploader@example.test", name: "Una Loader", role: "member" };
beforeAll(async () => {
  await rebuild(db);
  await db("users").insert({ ...USER, password_hash: "x" });
  session.current = { user: { id: USER.id, role: "member", shopId: null, name: USER.name, email: USER.email } };
});
afterAll(() => closeDatabases(db));

const vehicles = await import("@/app/api/vehicles/route");
const uploads = await import("@/app/api/vehicles/[id]/photos/route");
const signup = await import("@/app/api/account/signup/route");

const CHUNK = 64 * 1024;
/** A chunked body of `total` bytes (no Content-Length), counting the bytes the reader pulled. */
function endlessBody(total: number, prefix = "") {
  const pulled = { bytes: 0 };
  let sent = 0;
  const chunk = new Uint8Array(CHUNK).fill(0x41);
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (sent >= total) return controller.close();
      const piece = sent === 0 && prefix ? new TextEncoder().encode(prefix) : chunk;
      sent += piece.byteLength;
      pulled.bytes = sent;
      controller.enqueue(piece);
    },
  });
  return { stream, pulled };
}

describe("request bodies are cut off at their cap, not read whole", () => {
  it("a chunked 300 MB photo upload is refused with 413 after reading at most the cap", async () => {
    const setup = { tire: "265/70R17", wheelDiameterIn: 17, wheelWidthIn: 8, position: { mode: "offset", offsetMm: 25 }, spacerMm: 0 };
    const created = await vehicles.POST(
      new NextRequest("http://127.0.0.1:3000/api/vehicles", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({
          name: "Upload test",
          frontSuspension: "independent",
          boltPattern: "6x139.7",
          stockSetup: setup,
          currentSetup: setup,
        }),
      }),
      ctx(),
    );
    expect(created.status).toBe(201);
    const { vehicle } = (await created.json()) as { vehicle: { id: string } };

    const { stream, pulled } = endlessBody(
      300 * 1024 * 1024,
      '--b\r\nContent-Disposition: form-data; name="file"; filename="big.jpg"\r\nContent-Type: image/jpeg\r\n\r\n',
    );
    const res = await uploads.POST(
      new NextRequest(`http://127.0.0.1:3000/api/vehicles/${vehicle.id}/photos`, {
        method: "POST",
        headers: { "content-type": "multipart/form-data; boundary=b" },
        body: stream,
        duplex: "half",
      } as ConstructorParameters<typeof NextRequest>[1]),
      ctx({ id: vehicle.id }),
    );
    expect(res.status).toBe(413);
    expect(((await res.json()) as { error: string }).error).toMatch(/larger than 10 MB/);
    // The reader may run one chunk past the cap (plus what the stream had queued), never the whole body.
    expect(pulled.bytes).toBeLessThan(MAX_PHOTO_BYTES + 64 * 1024 + 4 * CHUNK);
    expect(await db("vehicle_photos").count<{ count: string }[]>()).toEqual([{ count: "0" }]);
  });

  it("a chunked 200 MB JSON body to the anonymous sign-up route is refused with 413 after reading at most the 64 KB cap", async () => {
    const { stream, pulled } = endlessBody(200 * 1024 * 1024, '{"name":"');
    const res = await signup.POST(
      new NextRequest("http://127.0.0.1:3000/api/account/signup", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: stream,
        duplex: "half",
      } as ConstructorParameters<typeof NextRequest>[1]),
      ctx(),
    );
    expect(res.status).toBe(413);
    expect(((await res.json()) as { error: string }).error).toMatch(/larger than 64 KB/);
    expect(pulled.bytes).toBeLessThan(64 * 1024 + 4 * CHUNK);
    expect(await db("users").whereNot({ id: USER.id })).toHaveLength(0);
  });
});
