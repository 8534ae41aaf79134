import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { internalKeys } from "./support/apiKeys";
import { closeDatabases, rebuild, testDb } from "./support/db";
import { ctx, req, sessionOf } from "./support/requests";
import { SHOP_B, U, seedShops } from "./support/shopFixture";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));

const db = testDb();
const customers = await import("@/app/api/shop/customers/route");

beforeAll(async () => {
  await rebuild(db);
  await seedShops(db);
  session.current = sessionOf(U.staffA);
  // Invented people; names with letters Unicode decomposes (é, ë, ř) and letters it does not (Ł, Ø, ß, Æ).
  const add = (name: string, phone: string, email: string) =>
    customers.POST(req("POST", "/api/shop/customers", { name, phone, email }), ctx());
  for (const r of await Promise.all([
    add("Łukasz Wróblewski", "555 014 2001", "lukasz.w@example.test"),
    add("Søren Æbelø", "555 014 2002", "sbaelo@example.test"),
    add("Renée Straßberg", "555 014 2003", "renee.s@example.test"),
    add("Lukas Weber", "555 014 2004", "l.weber@example.test"),
    add("Tomáš Dvořák", "", "quarry.trucks@example.test"),
  ])) {
    expect(r.status).toBe(201);
  }
  await db("customers").insert({
    shop_id: SHOP_B,
    name: "Łukasz Other-Shop",
    phone: "5550142009",
    phone_digits: "5550142009",
    email: "lukasz.o@example.test",
  });
});
afterAll(() => closeDatabases(db));

async function names(q: string): Promise<string[]> {
  session.current = sessionOf(U.staffA);
  const res = await customers.GET(req("GET", `/api/shop/customers?q=${encodeURIComponent(q)}`), ctx());
  expect(res.status, q).toBe(200);
  return ((await res.json()).customers as { name: string }[]).map((c) => c.name).sort();
}

describe("finding a customer again", () => {
  it("by name typed without its accents or special letters, and with them", async () => {
    expect(await names("lukasz")).toEqual(["Łukasz Wróblewski"]);
    expect(await names("LUKASZ WROBLEWSKI")).toEqual(["Łukasz Wróblewski"]);
    expect(await names("Łukasz")).toEqual(["Łukasz Wróblewski"]);
    expect(await names("luka")).toEqual(["Lukas Weber", "Łukasz Wróblewski"]);
    expect(await names("soren aebelo")).toEqual(["Søren Æbelø"]);
    expect(await names("strassberg")).toEqual(["Renée Straßberg"]);
    expect(await names("renee")).toEqual(["Renée Straßberg"]);
    expect(await names("dvorak")).toEqual(["Tomáš Dvořák"]);
  });

  it("by the part of the e-mail address before the @, but not by a domain everyone shares", async () => {
    expect(await names("l.weber")).toEqual(["Lukas Weber"]);
    expect(await names("quarry.trucks")).toEqual(["Tomáš Dvořák"]);
    expect(await names("quarry")).toEqual(["Tomáš Dvořák"]);
    expect(await names("example.test")).toEqual([]);
    // A whole address, in any case, and the start of one.
    expect(await names("L.Weber@Example.test")).toEqual(["Lukas Weber"]);
    expect(await names("renee.s@exa")).toEqual(["Renée Straßberg"]);
  });

  it("by phone digits, and never another shop's customer", async () => {
    expect(await names("(555) 014-2004")).toEqual(["Lukas Weber"]);
    expect(await names("2001")).toEqual(["Łukasz Wróblewski"]);
    expect(await names("2009")).toEqual([]);
    expect(await names("_")).toEqual([]);
    expect(await names("%")).toEqual([]);
    expect(await names("\u0301")).toEqual([]); // a lone accent folds to nothing: nobody, not everybody
  });

  it("keeps the stored search key and the row's columns to itself in every answer", async () => {
    session.current = sessionOf(U.staffA);
    const found = await (await customers.GET(req("GET", "/api/shop/customers?q=lukasz"), ctx())).json();
    expect(found.customers).not.toEqual([]);
    expect(internalKeys(found)).toEqual([]);
    const made = await customers.POST(req("POST", "/api/shop/customers", { name: "Ånund Key", phone: "555 014 2010", email: "" }), ctx());
    const madeBody = await made.json();
    expect(internalKeys(madeBody)).toEqual([]);
    // The API shape (lib/shop/customers/api.ts): no shop id nor the digits kept for searching; ISO dates.
    expect(Object.keys(madeBody.customer).sort()).toEqual(["createdAt", "email", "id", "name", "phone", "updatedAt"]);
    const dup = await customers.POST(req("POST", "/api/shop/customers", { name: "Ånund Again", phone: "555 014 2010", email: "" }), ctx());
    expect(dup.status).toBe(409);
    expect(internalKeys(await dup.json())).toEqual([]);
    const byId = await import("@/app/api/shop/customers/[id]/route");
    const id = found.customers[0].id;
    expect(internalKeys(await (await byId.GET(req("GET", `/api/shop/customers/${id}`), ctx({ id }))).json())).toEqual([]);
  });

  it("answers a search that is too long with a message naming the field as the screen does", async () => {
    const res = await customers.GET(req("GET", `/api/shop/customers?q=${"a".repeat(121)}`), ctx());
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error).toBe("Phone, e-mail or name: use at most 120 characters.");
    expect(body.fieldErrors).toEqual({ q: ["Use at most 120 characters."] });
  });
});
