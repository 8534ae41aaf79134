import { describe, expect, it } from "vitest";
import { SESSION_COOKIE_NAME, hasSessionCookie } from "./sessionCookie";

// next-auth v4 names its JWT session cookie next-auth.session-token, with the __Secure- prefix
// over HTTPS (RFC 6265bis cookie prefixes) and .0, .1, … chunks past about 4 kB (next-auth docs).
describe("the session cookie's name", () => {
  it("matches the plain, secure and chunked names and nothing that only contains them", () => {
    for (const name of ["next-auth.session-token", "__Secure-next-auth.session-token", "next-auth.session-token.1"]) {
      expect(SESSION_COOKIE_NAME.test(name), name).toBe(true);
    }
    for (const name of [
      "next-auth.csrf-token",
      "x-next-auth.session-token",
      "next-auth.session-token.x",
      "__Host-next-auth.session-token",
    ]) {
      expect(SESSION_COOKIE_NAME.test(name), name).toBe(false);
    }
  });

  it("finds one in a Cookie header among others, by name, whatever its value", () => {
    expect(hasSessionCookie("theme=dark; next-auth.session-token=")).toBe(true);
    expect(hasSessionCookie("a=next-auth.session-token=1")).toBe(false);
    expect(hasSessionCookie("next-auth.callback-url=%2F")).toBe(false);
    expect(hasSessionCookie(undefined)).toBe(false);
    expect(hasSessionCookie("")).toBe(false);
  });
});
