/**
 * Test helper (not exported from index): every number reachable in a value, with its path.
 * @example numbersIn({ a: [1, 2] }); // [{ path: "$.a[0]", value: 1 }, { path: "$.a[1]", value: 2 }]
 */
export function numbersIn(value: unknown, path = "$", out: { path: string; value: number }[] = []): { path: string; value: number }[] {
  if (typeof value === "number") out.push({ path, value });
  else if (Array.isArray(value)) value.forEach((v, i) => numbersIn(v, `${path}[${i}]`, out));
  else if (value !== null && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) numbersIn(v, `${path}.${k}`, out);
  }
  return out;
}

/**
 * Paths of numbers that are NaN or infinite.
 * @example nonFinite({ a: 1, b: NaN }); // ["$.b"]
 */
export function nonFinite(value: unknown): string[] {
  return numbersIn(value).filter((n) => !Number.isFinite(n.value)).map((n) => n.path);
}
