/** Keys that must never reach a browser: secrets' hashes and internal search columns. */
const INTERNAL_KEY = /(^|_)hash$|Hash$|^search_?key$|^searchKey$/;

/** Every internal key anywhere in a JSON answer, as a path ("quote.public_token_hash"). */
export function internalKeys(value: unknown, at = ""): string[] {
  if (Array.isArray(value)) return value.flatMap((v, i) => internalKeys(v, `${at}[${i}]`));
  if (value === null || typeof value !== "object") return [];
  return Object.entries(value).flatMap(([k, v]) => [...(INTERNAL_KEY.test(k) ? [`${at}${at ? "." : ""}${k}`] : []), ...internalKeys(v, `${at}${at ? "." : ""}${k}`)]);
}
