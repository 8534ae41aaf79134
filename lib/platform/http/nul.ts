import { HttpError, fieldPlace } from "./errors";

/**
 * The path of the first string (value or object key) holding a NUL character, or null.
 * PostgreSQL text cannot store U+0000 ("invalid byte sequence for encoding UTF8: 0x00"), so a
 * NUL that reaches a query is a 500; it is never meaningful in a form field or address either.
 *
 * @example
 * findNul({ lines: [{ note: "a\u0000b" }] }); // ["lines", 0, "note"]
 * findNul({ name: "ok" }); // null
 */
export function findNul(value: unknown, path: (string | number)[] = []): (string | number)[] | null {
  if (typeof value === "string") return value.includes("\u0000") ? path : null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = findNul(value[i], [...path, i]);
      if (found) return found;
    }
    return null;
  }
  if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      if (k.includes("\u0000")) return [...path, k.replace(/\u0000/g, "")];
      const found = findNul(v, [...path, k]);
      if (found) return found;
    }
  }
  return null;
}

/**
 * Refuses a request whose body, query or path holds a NUL character, naming the field:
 * 422 for a body field, 400 for a query or path part.
 */
export function assertNoNul(value: unknown, status: 400 | 422): void {
  const path = findNul(value);
  if (!path) return;
  const { row, field } = fieldPlace(path.length ? path : ["_"]);
  const name = field && field !== "the request" ? `The ${field}` : "This value";
  const message = `${row ? `${row}: ` : ""}${name} contains a NUL character (\\0), which Hubface cannot store. Remove it and try again.`;
  throw new HttpError(status, "Some fields need attention.", { [path.length ? path.join(".") : "_"]: [message] });
}
