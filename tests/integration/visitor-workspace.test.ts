import { readFileSync } from "node:fs";
import { join } from "node:path";
import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import { VISITOR_WORKSPACE, config, proxy } from "@/proxy";

const get = (path: string, cookie?: string) => new NextRequest(`http://127.0.0.1:3000${path}`, { headers: cookie ? { cookie } : {} });
/** Where the proxy sent the request: the rewritten path, or null when it went on unchanged. */
async function rewrittenTo(path: string, cookie?: string) {
  const res = await proxy(get(path, cookie));
  const to = res.headers.get("x-middleware-rewrite");
  return to ? new URL(to).pathname : null;
}

describe("a visitor's bare /workspace is the prerendered page", () => {
  it("is in the proxy's matcher", () => {
    expect(config.matcher).toContain("/workspace");
  });

  it("rewrites /workspace without a session cookie and without a query to the prerendered page", async () => {
    expect(await rewrittenTo("/workspace")).toBe(VISITOR_WORKSPACE);
    expect(await rewrittenTo("/workspace", "theme=dark; other=1")).toBe(VISITOR_WORKSPACE);
  });

  it("leaves members (any session cookie, plain, secure or chunked) to the page rendered for them", async () => {
    expect(await rewrittenTo("/workspace", "next-auth.session-token=abc")).toBeNull();
    expect(await rewrittenTo("/workspace", "__Secure-next-auth.session-token=abc")).toBeNull();
    expect(await rewrittenTo("/workspace", "__Secure-next-auth.session-token.0=abc; __Secure-next-auth.session-token.1=def")).toBeNull();
  });

  it("leaves a link carrying a comparison, a saved comparison or a vehicle to the page that reads it", async () => {
    expect(await rewrittenTo("/workspace?c=1")).toBeNull();
    expect(await rewrittenTo("/workspace?saved=0b000000-0000-4000-8000-00000000000b")).toBeNull();
    expect(await rewrittenTo("/workspace/visitor")).toBeNull();
  });

  it("the prerendered page reads nothing of the request (no cookies, headers or query) and is static", () => {
    const src = readFileSync(join(process.cwd(), "app/(tools)/workspace/visitor/page.tsx"), "utf8");
    expect(src).toContain('export const dynamic = "force-static"');
    expect(src).not.toMatch(/searchParams|cookies\(|headers\(|currentCaller|getServerSession/);
  });
});
