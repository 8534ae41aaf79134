/**
 * The name of next-auth's session cookie: plain or `__Secure-` (over HTTPS), whole or in chunks
 * (`.0`, `.1`, … when the token is long). Plain code with no imports: the proxy, the origin check
 * and the server's micro-cache (outside Next's bundle) all read it.
 *
 * @example SESSION_COOKIE_NAME.test("__Secure-next-auth.session-token.0"); // true
 */
export const SESSION_COOKIE_NAME = /^(?:__Secure-)?next-auth\.session-token(?:\.\d+)?$/;

/**
 * True when a Cookie header carries a session cookie (its value is not checked: a stale one counts).
 *
 * @example hasSessionCookie("theme=dark; next-auth.session-token=abc"); // true
 */
export function hasSessionCookie(cookieHeader: string | undefined | null): boolean {
  if (!cookieHeader) return false;
  return cookieHeader.split(";").some((pair) => SESSION_COOKIE_NAME.test(pair.split("=", 1)[0]!.trim()));
}
