import { describe, expect, it } from "vitest";
import { quoteListQuerySchema, quoteListSearch } from "./listQuery";

describe("the quotes list's address", () => {
  it("reads an empty form as any status, newest first, first page", () => {
    expect(quoteListQuerySchema.parse({ q: "", status: "", sort: "" })).toEqual({ q: "", status: undefined, sort: "newest" });
  });

  it("writes only what differs from the plain list, so the plain list is the plain address", () => {
    expect(quoteListSearch({ sort: "newest", page: 1 })).toBe("");
    expect(quoteListSearch({ q: "Q-1042", status: "sent", sort: "total", page: 3 })).toBe("q=Q-1042&status=sent&sort=total&page=3");
  });

  it("gives back the same query when the address it wrote is read again", () => {
    const query = quoteListQuerySchema.parse({ q: "łukasz & co", status: "deposit_paid", sort: "customer", page: "2" });
    const again = quoteListQuerySchema.parse(Object.fromEntries(new URLSearchParams(quoteListSearch(query))));
    expect(again).toEqual(query);
  });
});
