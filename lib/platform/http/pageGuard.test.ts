import { describe, expect, it } from "vitest";
import { ConflictError, NotFoundError } from "@/lib/platform/errors";
import { pageGuard } from "./pageGuard";

/** What Next's notFound() throws: an error whose digest asks for the 404 fallback. */
const NOT_FOUND_DIGEST = /^NEXT_HTTP_ERROR_FALLBACK;404$/;
const digestOf = async (p: Promise<unknown>) => {
  try {
    await p;
  } catch (e) {
    return (e as { digest?: string }).digest ?? `not a Next fallback: ${String(e)}`;
  }
  return "resolved";
};

describe("pageGuard", () => {
  it("hands the record on", async () => {
    await expect(pageGuard(Promise.resolve({ id: "v1" }))).resolves.toEqual({ id: "v1" });
    // null and 0 are values a query may return on purpose; only undefined means "not found".
    await expect(pageGuard(Promise.resolve(null))).resolves.toBeNull();
  });

  it("turns a get* query's NotFoundError into Next's 404", async () => {
    expect(await digestOf(pageGuard(Promise.reject(new NotFoundError("That vehicle"))))).toMatch(NOT_FOUND_DIGEST);
  });

  it("turns a find* query's undefined into Next's 404", async () => {
    expect(await digestOf(pageGuard(Promise.resolve(undefined)))).toMatch(NOT_FOUND_DIGEST);
  });

  it("lets every other error through to the error page", async () => {
    const conflict = new ConflictError("Only a draft can be edited.");
    await expect(pageGuard(Promise.reject(conflict))).rejects.toBe(conflict);
    const outage = Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" });
    await expect(pageGuard(Promise.reject(outage))).rejects.toBe(outage);
  });
});
