import { describe, expect, it } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import { workspaceUrl } from "@/lib/comparisons/url";
import { call } from "./support/http";

// A visitor's bare /workspace is the prerendered page (proxy.ts → app/(tools)/workspace/visitor);
// members and links with a comparison get the page rendered for them.
describe("/workspace over HTTP", () => {
  it("serves a visitor the prerendered workspace: the demo comparison drawn, the sign-in prompt, cacheable", async () => {
    const res = await call("anonymous", "GET", "/workspace");
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('data-testid="cross-section"');
    expect(html).toContain("Sign in to save");
    // A prerendered page is cacheable by shared caches; a page rendered per request is no-store.
    expect(res.headers.get("cache-control") ?? "").not.toMatch(/no-store|private/);
  });

  it("renders a member's /workspace for them (their name in the header), never the visitor's copy", async () => {
    const res = await call("member", "GET", "/workspace");
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('data-testid="signed-in-as"');
    expect(html).not.toContain("Sign in to save");
  });

  it("renders a visitor's link with a comparison from the link, not the demo", async () => {
    const input = { ...DEFAULT_INPUT, current: { ...DEFAULT_INPUT.current, tire: "285/70R17" } };
    const res = await call("anonymous", "GET", workspaceUrl({ input }));
    expect(res.status).toBe(200);
    expect(await res.text()).toContain("285/70R17");
  });
});
