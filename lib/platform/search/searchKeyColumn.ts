import "server-only";

/**
 * Rows of catalog_items and customers carry a generated search_key column (db/migrations/…_search_keys.ts)
 * that only searches read; answers and row types leave it out.
 *
 * @example
 * withoutSearchKey({ id: "1", name: "Ann", search_key: "ann" }); // { id: "1", name: "Ann" }
 */
export function withoutSearchKey<T extends object>(row: T): Omit<T, "search_key"> {
  const { search_key: _key, ...rest } = row as T & { search_key?: unknown };
  return rest;
}
