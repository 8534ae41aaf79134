import { describe, expect, it } from "vitest";
import { isLinkToken, LINK_TOKEN_RE } from "./tokenFormat";
import { hashToken, LINK_TOKEN_BYTES, randomToken } from "./tokens";

describe("randomToken", () => {
  it("makes 43 URL-safe characters from 32 bytes, the shape links are checked against", () => {
    // RFC 4648 §5 (base64url, no padding): ceil(32 × 8 / 6) = 43 characters.
    expect(LINK_TOKEN_BYTES).toBe(32);
    for (let i = 0; i < 50; i++) {
      const t = randomToken();
      expect(t).toHaveLength(43);
      expect(t).toMatch(LINK_TOKEN_RE);
      expect(isLinkToken(t)).toBe(true);
    }
  });

  it("makes 24 characters from 18 bytes (18 × 8 / 6 = 24, RFC 4648 §5)", () => {
    expect(randomToken(18)).toMatch(/^[A-Za-z0-9_-]{24}$/);
  });

  it("does not repeat itself (256 bits each)", () => {
    const seen = new Set(Array.from({ length: 1000 }, () => randomToken()));
    expect(seen.size).toBe(1000);
  });
});

describe("hashToken", () => {
  it("is SHA-256 in hex", () => {
    // FIPS 180-2, appendix B.1: SHA-256("abc").
    expect(hashToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    // FIPS 180-2, appendix B.2: the 448-bit message.
    expect(hashToken("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq")).toBe(
      "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
    );
  });
});

describe("isLinkToken", () => {
  it("refuses anything but 43 characters of the URL-safe alphabet", () => {
    expect(isLinkToken("A".repeat(42))).toBe(false);
    expect(isLinkToken("A".repeat(44))).toBe(false);
    expect(isLinkToken(`${"A".repeat(42)}+`)).toBe(false); // "+" is standard base64, not URL-safe (RFC 4648 §4 vs §5)
    expect(isLinkToken(`${"A".repeat(42)}=`)).toBe(false); // no padding
    expect(isLinkToken(`${"A".repeat(41)}-_`)).toBe(true);
    expect(isLinkToken(`${"A".repeat(43)}\n`)).toBe(false);
  });
});
