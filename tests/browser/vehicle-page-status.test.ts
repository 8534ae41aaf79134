import { describe, expect, it } from "vitest";
import { call } from "./support/http";

// The demo member's vehicle (db/seeds/04_demo_garage.ts); the shop owner keeps no such vehicle.
const HAULER = "d4000000-0000-4000-8000-000000000001";
const MISSING = "d4000000-0000-4000-8000-0000000000ff";
const PAGES = (id: string) => [`/garage/${id}`, `/garage/${id}/edit`, `/garage/${id}/finder`];

describe("a vehicle page's HTTP status", () => {
  it("is 200 for the owner", async () => {
    for (const path of PAGES(HAULER)) expect((await call("member", "GET", path)).status, path).toBe(200);
  });

  it("is 404 — not a streamed 200 with a not-found body — for a missing vehicle and for someone else's", async () => {
    for (const path of [...PAGES(MISSING), `/garage/${MISSING}/checklist`]) {
      const res = await call("member", "GET", path);
      expect(res.status, path).toBe(404);
      expect(await res.text(), path).toMatch(/Nothing here/); // app/not-found.tsx
    }
    for (const path of PAGES(HAULER)) expect((await call("shop_owner", "GET", path)).status, `${path} as another person`).toBe(404);
  });

  it("still sends an anonymous visitor to sign-in", async () => {
    const res = await call("anonymous", "GET", `/garage/${HAULER}`);
    // Before anything streams a redirect is a 307; once streaming it is a page that redirects in the browser.
    if (res.status === 200) expect(await res.text()).toMatch(/sign-in\?callbackUrl=/);
    else expect(res.headers.get("location") ?? "").toMatch(/\/sign-in\?callbackUrl=/);
  });
});
