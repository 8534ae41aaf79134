/**
 * Signs in over HTTP exactly as the sign-in form does — next-auth's CSRF token, then the
 * credentials callback, keeping the cookies each answer sets — and returns the Cookie header that
 * carries the session. For code that talks to a running server without a browser: the browser
 * tests' API calls (tests/browser/support/http.ts) and the measuring scripts.
 * `headers` go on the sign-in request as well (an Origin, say).
 */
export async function signInOverHttp(base: string, email: string, password: string, headers: Record<string, string> = {}): Promise<string> {
  const jar = new Map<string, string>();
  const take = (res: Response) => {
    for (const c of res.headers.getSetCookie()) {
      const pair = c.split(";")[0] ?? "";
      const i = pair.indexOf("=");
      jar.set(pair.slice(0, i), pair.slice(i + 1));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  take(csrfRes);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "Content-Type": "application/x-www-form-urlencoded", Cookie: cookie(), ...headers },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  take(res);
  if (!/session-token=/.test(cookie()))
    throw new Error(`sign-in as ${email} on ${base} failed (${res.status} ${res.headers.get("location")})`);
  return cookie();
}
