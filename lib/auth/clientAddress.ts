type HeaderBag = Record<string, string | string[] | undefined> | Headers | undefined;

/**
 * The client's address for throttling: the first X-Forwarded-For entry (the load balancer in
 * front of the app servers must overwrite, not append to, what the client sent).
 */
export function clientAddress(headers: HeaderBag): string {
  const get = (name: string): string | undefined => {
    if (!headers) return undefined;
    if (typeof (headers as Headers).get === "function") return (headers as Headers).get(name) ?? undefined;
    const v = (headers as Record<string, string | string[] | undefined>)[name];
    return Array.isArray(v) ? v[0] : v;
  };
  const forwarded = get("x-forwarded-for")?.split(",")[0]?.trim();
  const real = get("x-real-ip")?.trim();
  // Next's own server fills x-forwarded-for with the socket peer when no proxy set it. A
  // forged header can only spread failures over more address keys; the per-account limit
  // still holds whatever the caller claims.
  return forwarded || real || "unknown";
}
