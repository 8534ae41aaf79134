import { describe, expect, it } from "vitest";
import { call } from "./support/http";

// The demo shop's paid quote (db/seeds/05_demo_shop.ts DEMO_QUOTES.paid) and ids that name nothing.
const PAID = "d0000000-0000-4000-8000-000000000003";
const MISSING = "d0000000-0000-4000-8000-0000000000ff";

describe("a shop item page's HTTP status", () => {
  it("is 200 for the shop's own quote (the owner sees every quote of the shop)", async () => {
    expect((await call("shop_owner", "GET", `/shop/quotes/${PAID}`)).status).toBe(200);
  });

  it("is 404 — not a streamed 200 with a not-found body — for a missing quote or work order, and for an id that cannot be one", async () => {
    for (const path of [`/shop/quotes/${MISSING}`, `/shop/work-orders/${MISSING}`, "/shop/quotes/not-a-quote"]) {
      const res = await call("shop_owner", "GET", path);
      expect(res.status, path).toBe(404);
      expect(await res.text(), path).toMatch(/Nothing here/); // app/not-found.tsx
    }
  });
});
