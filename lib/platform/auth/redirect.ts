/**
 * Where to send a person after signing in: only a path on this site. A `callbackUrl` comes from
 * the address bar, so anyone can craft one; browsers read `/\evil.example` and `/<TAB>/evil.example`
 * as `//evil.example` (another host), so a prefix test on "/" is not enough. The text is resolved
 * the way a browser resolves it (WHATWG URL parsing, which folds backslashes and drops tabs and
 * newlines) against a placeholder origin, and kept only when it stays on that origin.
 */
const PLACEHOLDER = "http://hubface.invalid";

/**
 * @example
 * safeLocalPath("/garage/1?x=2#top");        // "/garage/1?x=2#top"
 * safeLocalPath("/\\evil.example/phish");     // "/account" (the fallback)
 * safeLocalPath("https://evil.example/");     // "/account"
 */
export function safeLocalPath(raw: string | null | undefined, fallback = "/account"): string {
  if (typeof raw !== "string" || !raw.startsWith("/") || raw.length > 2000) return fallback;
  // Control characters and backslashes have no place in a path this site writes.
  if (/[\u0000-\u001f\u007f\\]/.test(raw)) return fallback;
  let url: URL;
  try {
    url = new URL(raw, PLACEHOLDER);
  } catch {
    return fallback;
  }
  if (url.origin !== PLACEHOLDER) return fallback;
  const out = `${url.pathname}${url.search}${url.hash}`;
  // The browser resolves the result again: it must still start with exactly one slash.
  return out.startsWith("//") ? fallback : out;
}
