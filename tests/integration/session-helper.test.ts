import { afterEach, describe, expect, it, vi } from "vitest";

const session = vi.hoisted(() => ({ current: null as unknown }));
vi.mock("next-auth", () => ({ getServerSession: async () => session.current }));
vi.mock("next/navigation", () => ({
  redirect: (to: string) => {
    throw new Error(`REDIRECT ${to}`);
  },
}));

const { admits, requireCaller, requirePageCaller } = await import("@/lib/platform/auth/session");
const { HttpError } = await import("@/lib/platform/http/errors");

const as = (role: string, shopId: string | null = null) => ({ user: { id: "u1", role, shopId, name: "N", email: "n@example.test" } });

afterEach(() => {
  session.current = null;
});

describe("the role helper", () => {
  it("admits by role, signed-in, or public", () => {
    const member = { userId: "u", role: "member" as const, shopId: null, name: "", email: "" };
    expect(admits("public", null)).toBe(true);
    expect(admits("signed-in", null)).toBe(false);
    expect(admits("signed-in", member)).toBe(true);
    expect(admits(["admin"], member)).toBe(false);
    expect(admits(["member", "admin"], member)).toBe(true);
  });

  it("answers 401 to anonymous callers and 403 to the wrong role", async () => {
    await expect(requireCaller()).rejects.toMatchObject({ status: 401 });
    session.current = as("member");
    await expect(requireCaller(["admin"])).rejects.toMatchObject({ status: 403 });
    await expect(requireCaller(["admin"])).rejects.toBeInstanceOf(HttpError);
  });

  it("hands back the ids that scope queries", async () => {
    session.current = as("shop_owner", "s1");
    await expect(requireCaller(["shop_owner"])).resolves.toMatchObject({ userId: "u1", role: "shop_owner", shopId: "s1" });
  });

  it("refuses a shop role without a shop id", async () => {
    session.current = as("shop_staff", null);
    await expect(requireCaller(["shop_staff"])).rejects.toMatchObject({ status: 403 });
  });

  it("sends pages to sign-in or /forbidden", async () => {
    await expect(requirePageCaller("/admin/users", ["admin"])).rejects.toThrow("REDIRECT /sign-in?callbackUrl=%2Fadmin%2Fusers");
    session.current = as("member");
    await expect(requirePageCaller("/admin/users", ["admin"])).rejects.toThrow("REDIRECT /forbidden");
  });
});
