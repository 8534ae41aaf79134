import { describe, expect, it } from "vitest";
import { BASE } from "./support/browser";
import { call } from "./support/http";

describe("security basics over HTTP", () => {
  it("sends the security headers on pages and API answers", async () => {
    for (const path of ["/", "/api/health"]) {
      const res = await fetch(`${BASE}${path}`);
      const csp = res.headers.get("content-security-policy") ?? "";
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("default-src 'self'");
      expect(csp).not.toContain("unsafe-eval");
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
      expect(res.headers.get("x-powered-by")).toBeNull();
    }
  });

  it("treats a tampered session cookie as signed out (401, not 500)", async () => {
    for (const cookie of ["next-auth.session-token=eyJhbGciOiJkaXIiLCJlbmMiOiJBMjU2R0NNIn0..garbage.garbage.garbage", "next-auth.session-token=%%%"]) {
      const res = await fetch(`${BASE}/api/me`, { headers: { Cookie: cookie } });
      expect(res.status).toBe(401);
    }
    const page = await fetch(`${BASE}/account`, { headers: { Cookie: "next-auth.session-token=tampered" }, redirect: "manual" });
    expect([302, 307]).toContain(page.status);
    expect(page.headers.get("location")).toMatch(/\/sign-in/);
  });

  it("answers oversized and malformed bodies with a clear 4xx", async () => {
    const big = await call("anonymous", "POST", "/api/account/signup", JSON.stringify({ name: "x".repeat(200_000) }));
    expect(big.status).toBe(413);
    expect((await big.json()).error).toMatch(/larger than/);
    const bad = await call("anonymous", "POST", "/api/account/signup", "{oops");
    expect(bad.status).toBe(400);
    const wrongShape = await call("anonymous", "POST", "/api/account/signup", [1, 2, 3]);
    expect(wrongShape.status).toBe(422);
  });

  it("never carries a sign-in callbackUrl that a browser reads as another host (open redirect)", async () => {
    // The page hands the sign-in form the path to go to next (a prop in the page's flight data).
    const target = async (q: string) => /\\"callbackUrl\\":\\"([^"\\]*)\\"/.exec(await (await fetch(`${BASE}/sign-in?callbackUrl=${q}`)).text())?.[1];
    for (const q of ["/%5Cevil.example/phish", "/%09/evil.example/phish", "%2F%2Fevil.example"]) {
      expect(await target(q), q).toBe("/account");
    }
    expect(await target("%2Fgarage%3Ftab%3Dphotos")).toBe("/garage?tab=photos");
  });

  it("answers a GET of the credentials callback with 405, not 500", async () => {
    const res = await fetch(`${BASE}/api/auth/callback/credentials`, { redirect: "manual" });
    expect(res.status).toBe(405);
    expect(res.headers.get("allow")).toBe("POST");
    // The rest of next-auth's GET routes are unchanged.
    expect((await fetch(`${BASE}/api/auth/csrf`)).status).toBe(200);
  });
});
