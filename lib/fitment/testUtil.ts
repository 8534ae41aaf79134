import fc from "fast-check";
import { FitmentInputError } from "./errors";

/**
 * Test helper: a double in [min, max], never NaN, for fast-check properties over the engine's inputs.
 * @example fc.property(real(600, 1200), (diameterMm) => diameterMm >= 600);
 */
export const real = (min: number, max: number): fc.Arbitrary<number> => fc.double({ min, max, noNaN: true });

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
  return numbersIn(value)
    .filter((n) => !Number.isFinite(n.value))
    .map((n) => n.path);
}

/**
 * The `field` of the FitmentInputError `f` throws; fails when it throws anything else or nothing.
 * @example errorField(() => loadIndexKg(-1)); // "loadIndex"
 */
export function errorField(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    if (e instanceof FitmentInputError) return e.field;
    throw e;
  }
  throw new Error("expected a FitmentInputError, nothing was thrown");
}
