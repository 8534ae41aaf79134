/**
 * The shape of a link token as `randomToken()` makes it (32 bytes → 43 URL-safe base64 characters).
 * Kept apart from the token maker, which needs node:crypto, so forms in the browser can check it too.
 */
export const LINK_TOKEN_RE = /^[A-Za-z0-9_-]{43}$/;

/**
 * True when `text` could be a link token; anything else is refused before the database is asked.
 *
 * @example
 * isLinkToken("x".repeat(43)); // true
 * isLinkToken("x".repeat(44)); // false
 */
export function isLinkToken(text: string): boolean {
  return LINK_TOKEN_RE.test(text);
}
