import { QueryClient, type QueryKey } from "@tanstack/react-query";
import { describe, expect, it } from "vitest";
import { queryKeys as k } from "./keys";

/** One key of every kind the app reads, by a name for the messages. */
const READ: Record<string, QueryKey> = {
  comparisonList: k.comparisons.list({ q: "", sort: "updated" }),
  comparisonSearch: k.comparisons.list({ q: "35x", sort: "name" }),
  vehicle: k.garage.vehicle("v1"),
  otherVehicle: k.garage.vehicle("v2"),
  catalogPage: k.shop.catalog.page("page=1&pageSize=25"),
  catalogPick: k.shop.catalog.pick({ q: "37x", kind: "tire" }),
  customerSearch: k.shop.customers.search("555"),
  customerVehicles: k.shop.customers.vehicles("c1"),
  staff: k.shop.staff.all,
  jobs: k.admin.jobs.all,
  users: k.admin.users.list(""),
  userSearch: k.admin.users.list("ada"),
};

/** Fills a client with every key, invalidates `root`, and names the keys it marked stale. */
async function hitBy(root: QueryKey): Promise<string[]> {
  const qc = new QueryClient();
  for (const key of Object.values(READ)) qc.setQueryData(key, 1);
  await qc.invalidateQueries({ queryKey: root });
  return Object.entries(READ)
    .filter(([, key]) => qc.getQueryState(key)?.isInvalidated)
    .map(([name]) => name)
    .sort();
}

describe("queryKeys", () => {
  it("gives every query its own key", () => {
    const hashes = Object.values(READ).map((key) => JSON.stringify(key));
    expect(new Set(hashes).size).toBe(hashes.length);
  });

  it("nests each feature's keys under the feature's root", async () => {
    expect(await hitBy(k.comparisons.all)).toEqual(["comparisonList", "comparisonSearch"]);
    expect(await hitBy(k.garage.all)).toEqual(["otherVehicle", "vehicle"]);
    expect(await hitBy(k.shop.all)).toEqual(["catalogPage", "catalogPick", "customerSearch", "customerVehicles", "staff"]);
    expect(await hitBy(k.admin.all)).toEqual(["jobs", "userSearch", "users"]);
  });

  it("nests a list's pages under the list's root, and nothing else", async () => {
    expect(await hitBy(k.comparisons.lists)).toEqual(["comparisonList", "comparisonSearch"]);
    expect(await hitBy(k.shop.catalog.all)).toEqual(["catalogPage", "catalogPick"]);
    expect(await hitBy(k.shop.customers.all)).toEqual(["customerSearch", "customerVehicles"]);
    expect(await hitBy(k.admin.users.all)).toEqual(["userSearch", "users"]);
    expect(await hitBy(k.admin.jobs.all)).toEqual(["jobs"]);
  });

  it("keeps one vehicle's key apart from another's", async () => {
    expect(await hitBy(k.garage.vehicle("v1"))).toEqual(["vehicle"]);
  });

  it("reaches every key the app reads from one of the four feature roots", async () => {
    const roots = [k.comparisons.all, k.garage.all, k.shop.all, k.admin.all];
    const reached = (await Promise.all(roots.map(hitBy))).flat().sort();
    expect(reached).toEqual(Object.keys(READ).sort());
  });
});
