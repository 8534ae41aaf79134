/** Keys that must never reach a browser: secrets' hashes and internal search columns. */
const INTERNAL_KEY = /(^|_)hash$|Hash$|^search_?key$|^searchKey$/;
/** A database column name as it is: the API speaks camelCase (lib/garage/types.ts and the features' api.ts). */
const SNAKE_KEY = /^[a-z][a-z0-9]*(_[a-z0-9]+)+$/;

/**
 * Everything in an answer that is not the API's shape, as paths: an internal key
 * ("quote.public_token_hash"), a snake_case key ("items[0].price_cents (snake_case)") or a Date
 * object ("quote.createdAt (Date)": the API sends ISO strings, so a Date means a row went out
 * unmapped). Use on `await res.json()` and on values a page hands to a client component.
 */
export function internalKeys(value: unknown, at = ""): string[] {
  if (Array.isArray(value)) return value.flatMap((v, i) => internalKeys(v, `${at}[${i}]`));
  if (value instanceof Date) return [`${at} (Date)`];
  if (value === null || typeof value !== "object") return [];
  return Object.entries(value).flatMap(([k, v]) => {
    const path = `${at}${at ? "." : ""}${k}`;
    const own = INTERNAL_KEY.test(k) ? [path] : SNAKE_KEY.test(k) ? [`${path} (snake_case)`] : [];
    return [...own, ...internalKeys(v, path)];
  });
}
