import { afterEach, describe, expect, it, vi } from "vitest";
import { api } from "./api";

afterEach(() => vi.unstubAllGlobals());

function stubFetch() {
  const calls: RequestInit[] = [];
  vi.stubGlobal("fetch", async (_url: string, init: RequestInit) => {
    calls.push(init);
    return Response.json({ ok: true }, { status: 201 });
  });
  return calls;
}
const keyOf = (init: RequestInit) => (init.headers as Record<string, string> | undefined)?.["Idempotency-Key"];

describe("api() and Idempotency-Key", () => {
  it("sends a fresh key with each POST, the one given when the caller retries an action, none on GET", async () => {
    const calls = stubFetch();
    await api("/api/vehicles", { body: { name: "a" } });
    await api("/api/vehicles", { body: { name: "a" } });
    await api("/api/vehicles", { body: { name: "a" }, idempotencyKey: "retry-of-one-action" });
    await api("/api/vehicles");
    expect(keyOf(calls[0]!)).toMatch(/^[0-9a-f-]{36}$/);
    expect(keyOf(calls[1]!)).toMatch(/^[0-9a-f-]{36}$/);
    expect(keyOf(calls[1]!)).not.toBe(keyOf(calls[0]!));
    expect(keyOf(calls[2]!)).toBe("retry-of-one-action");
    expect(keyOf(calls[3]!)).toBeUndefined();
    expect((calls[0]!.headers as Record<string, string>)["Content-Type"]).toBe("application/json");
  });
});
