import { describe, expect, it } from "vitest";
import { safeLocalPath } from "./redirect";

describe("safeLocalPath (the sign-in page's callbackUrl)", () => {
  it("keeps a path on this site with its query and fragment", () => {
    expect(safeLocalPath("/garage/abc?tab=photos#top")).toBe("/garage/abc?tab=photos#top");
    expect(safeLocalPath("/shop")).toBe("/shop");
  });

  it("refuses every form a browser reads as another host (open redirect)", () => {
    // The security review's two findings, as the page receives them (already percent-decoded).
    expect(safeLocalPath("/\\evil.example/phish")).toBe("/account");
    expect(safeLocalPath("/\t/evil.example/phish")).toBe("/account");
    for (const raw of [
      "//evil.example",
      "https://evil.example/",
      "/\n/evil.example",
      "/\r\n/evil.example",
      "\\\\evil.example",
      " /evil",
      "javascript:alert(1)",
      "/%2F%2Fevil.example",
    ]) {
      const out = safeLocalPath(raw);
      expect(new URL(out, "https://hubface.test").host, raw).toBe("hubface.test");
    }
  });

  it("uses the fallback for missing or overlong text", () => {
    expect(safeLocalPath(undefined)).toBe("/account");
    expect(safeLocalPath("", "/shop")).toBe("/shop");
    expect(safeLocalPath(`/${"a".repeat(3000)}`)).toBe("/account");
  });
});
