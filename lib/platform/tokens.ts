import { createHash, randomBytes } from "node:crypto";

/** Bytes in a link token (password reset, staff invitation, a quote's customer link): 256 bits. */
export const LINK_TOKEN_BYTES = 32;

/**
 * `bytes` from the operating system's CSPRNG as URL-safe base64 without padding (RFC 4648 §5):
 * 4 characters per 3 bytes, so the default 32 bytes make the 43 characters `LINK_TOKEN_RE` takes.
 *
 * @example
 * randomToken();   // "q3V…" (43 characters)
 * randomToken(18); // 24 characters, e.g. a share slug
 */
export function randomToken(bytes: number = LINK_TOKEN_BYTES): string {
  return randomBytes(bytes).toString("base64url");
}

/**
 * The SHA-256 of a token, as hex: what the database keeps, so a leaked table holds no usable link.
 *
 * @example
 * hashToken("abc"); // "ba7816bf…f20015ad" (FIPS 180-2, appendix B.1)
 */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
