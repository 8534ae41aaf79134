/**
 * The cookie a 5xx answer carries with its request id (set in ./request.ts). An error page is a
 * client component and cannot read the answer's headers; it reads this cookie and shows the id,
 * the same one every log line of that request and every 5xx JSON body carry.
 */
export const ERROR_REF_COOKIE = "hubface-error-ref";

/** The request id in a `document.cookie` string, if a 5xx answer left one (only ids as the server makes them). */
export function readErrorRef(cookies: string): string | undefined {
  for (const part of cookies.split(";")) {
    const [name, value] = part.trim().split("=");
    if (name === ERROR_REF_COOKIE && value && /^[A-Za-z0-9._-]{1,64}$/.test(value)) return value;
  }
  return undefined;
}
