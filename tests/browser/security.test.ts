import { describe, expect, it } from "vitest";
import { BASE } from "./support/browser";
import { call, cookieFor } from "./support/http";

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
    for (const cookie of [
      "next-auth.session-token=eyJhbGciOiJkaXIiLCJlbmMiOiJBMjU2R0NNIn0..garbage.garbage.garbage",
      "next-auth.session-token=%%%",
    ]) {
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
    const target = async (q: string) =>
      /\\"callbackUrl\\":\\"([^"\\]*)\\"/.exec(await (await fetch(`${BASE}/sign-in?callbackUrl=${q}`)).text())?.[1];
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

  it("refuses a state-changing request from another site (Origin) with 403, and a signed-in one without Origin", async () => {
    const body = { name: "Cross Site", email: `cross.${Date.now()}@example.test`, password: "a long enough password" };
    const foreign = await call("anonymous", "POST", "/api/account/signup", body, { Origin: "https://evil.example" });
    expect(foreign.status).toBe(403);
    expect((await foreign.json()).error).toMatch(/another site/);
    const member = await cookieFor("member");
    const bare = await fetch(`${BASE}/api/comparisons`, {
      method: "POST",
      headers: { Cookie: member, "Content-Type": "application/json" },
      body: JSON.stringify({ name: "No origin" }),
    });
    expect(bare.status).toBe(403);
    // Reads are not checked: a link from elsewhere still opens.
    expect((await fetch(`${BASE}/api/health`, { headers: { Origin: "https://evil.example" } })).status).toBe(200);
  });

  it("refuses a JSON route's body sent as text/plain (what a cross-site form can send) with 415", async () => {
    const res = await fetch(`${BASE}/api/account/signup`, {
      method: "POST",
      headers: { Origin: new URL(BASE).origin, "Content-Type": "text/plain;charset=UTF-8" },
      body: JSON.stringify({ name: "Plain", email: `plain.${Date.now()}@example.test`, password: "a long enough password" }),
    });
    expect(res.status).toBe(415);
    expect((await res.json()).error).toBe("Send JSON with Content-Type: application/json.");
  });

  it("answers a NUL character in a field or search with a message naming it, not 500", async () => {
    const body = await call("anonymous", "POST", "/api/account/signup", {
      name: "Nul\u0000",
      email: `nul.${Date.now()}@example.test`,
      password: "a long enough password",
    });
    expect(body.status).toBe(422);
    expect((await body.json()).fieldErrors.name[0]).toMatch(/NUL character/);
    const search = await call("member", "GET", "/api/comparisons?q=a%00b");
    expect(search.status).toBe(400);
    expect((await search.json()).fieldErrors.q[0]).toMatch(/NUL character/);
  });
});
