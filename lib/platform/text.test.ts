import { describe, expect, it } from "vitest";
import { countOf, escapeHtml } from "./text";

describe("escapeHtml", () => {
  it("writes & < > \" ' as numeric character references", () => {
    // Code points from ISO/IEC 646 (ASCII): & 38, " 34, ' 39, < 60, > 62; the reference form is
    // the HTML standard's "decimal numeric character reference" (&#NN;).
    expect(escapeHtml(`Tom & "Jerry's" <Shop>`)).toBe("Tom &#38; &#34;Jerry&#39;s&#34; &#60;Shop&#62;");
  });

  it("leaves other text, accents included, as it is", () => {
    expect(escapeHtml("Çelik Lastik · 35x12.50R17 — 4 × $310")).toBe("Çelik Lastik · 35x12.50R17 — 4 × $310");
  });

  it("escapes an ampersand once, so text that already looks escaped shows as typed", () => {
    expect(escapeHtml("&amp;")).toBe("&#38;amp;");
  });

  it("leaves no tag to open", () => {
    expect(escapeHtml("<script>alert(1)</script>")).not.toMatch(/[<>]/);
  });
});

describe("countOf", () => {
  it("puts the noun in the singular for one only, and groups thousands (en-US)", () => {
    expect([0, 1, 2].map((n) => countOf(n, "booking"))).toEqual(["0 bookings", "1 booking", "2 bookings"]);
    expect(countOf(10000, "row")).toBe("10,000 rows");
  });
});
