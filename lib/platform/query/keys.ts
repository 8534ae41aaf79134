/**
 * Every TanStack Query key of the app, built in one place.
 *
 * Each feature's keys start with the feature's root, and each list's keys with the list's root,
 * so invalidating a root reaches everything below it (TanStack matches keys by prefix):
 * `invalidateQueries({ queryKey: queryKeys.shop.catalog.all })` refreshes the catalog table's
 * pages and the quote's catalog picker alike. Only keys a `useQuery` reads are listed here: a
 * server-rendered list is refreshed with `router.refresh()`, never through a key nothing reads.
 *
 * @example
 * useQuery({ queryKey: queryKeys.garage.vehicle(id), queryFn: ... });
 * qc.invalidateQueries({ queryKey: queryKeys.garage.vehicle(id) });
 */

const comparisons = ["comparisons"] as const;
const comparisonLists = [...comparisons, "list"] as const;
const garage = ["garage"] as const;
const shop = ["shop"] as const;
const catalog = [...shop, "catalog"] as const;
const customers = [...shop, "customers"] as const;
const admin = ["admin"] as const;
const users = [...admin, "users"] as const;

export const queryKeys = {
  comparisons: {
    all: comparisons,
    /** Every cached page of the saved-comparison list, whatever its search and order. */
    lists: comparisonLists,
    list: (filter: { q: string; sort: string }) => [...comparisonLists, filter] as const,
  },
  garage: {
    all: garage,
    /** One vehicle with its points and photos. */
    vehicle: (id: string) => [...garage, "vehicle", id] as const,
    /** One vehicle's placard, scale weights and body points. */
    loadProfile: (id: string) => [...garage, "vehicle", id, "load"] as const,
  },
  shop: {
    all: shop,
    catalog: {
      all: catalog,
      /** One page of the catalog table (its query string: page, size, order, filters). */
      page: (query: string) => [...catalog, "page", query] as const,
      /** The quote's catalog picker: what was searched for. */
      pick: (asked: { q: string; kind: string } | null) => [...catalog, "pick", asked] as const,
    },
    customers: {
      all: customers,
      search: (text: string) => [...customers, "search", text] as const,
      /** The saved vehicles of one customer. */
      vehicles: (customerId: string) => [...customers, customerId, "vehicles"] as const,
    },
    staff: { all: [...shop, "staff"] as const },
    /** The staff calendar: one day or one week of bookings per bay. */
    calendar: {
      all: [...shop, "calendar"] as const,
      range: (from: string, days: number) => [...shop, "calendar", from, days] as const,
    },
    /** Free install starts (the customer's link and the counter read the same answer shape). */
    slots: {
      all: [...shop, "slots"] as const,
      week: (slotsUrl: string, from: string | null) => [...shop, "slots", slotsUrl, from] as const,
    },
  },
  admin: {
    all: admin,
    jobs: { all: [...admin, "jobs"] as const },
    users: {
      all: users,
      list: (search: string) => [...users, "list", search] as const,
    },
  },
} as const;
