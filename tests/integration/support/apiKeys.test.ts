import { describe, expect, it } from "vitest";
import { internalKeys } from "./apiKeys";

// Common practice, no source: the API answers camelCase with ISO date strings; this is the check the route tests lean on.
describe("internalKeys", () => {
  it("finds hashes, search keys, snake_case keys and Date objects at any depth", () => {
    const answer = { quote: { id: "q", public_token_hash: "x", createdAt: new Date(0) }, items: [{ searchKey: "a", price_cents: 1 }] };
    expect(internalKeys(answer)).toEqual([
      "quote.public_token_hash",
      "quote.createdAt (Date)",
      "items[0].searchKey",
      "items[0].price_cents (snake_case)",
    ]);
  });

  it("passes the API's own shape", () => {
    expect(internalKeys({ items: [{ priceCents: 1, createdAt: "1970-01-01T00:00:00.000Z", tireSize: null }], total: 1 })).toEqual([]);
  });
});
