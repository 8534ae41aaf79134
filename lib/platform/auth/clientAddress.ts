import { BlockList, isIP } from "node:net";

type HeaderBag = Record<string, string | string[] | undefined> | Headers | undefined;

/**
 * The header our own server (scripts/serve.ts) sets to the client's address. It deletes any
 * copy the client sent first, and marks the process (below) so the header is only believed
 * when that server is the one in front of Next.
 */
export const CLIENT_ADDRESS_HEADER = "x-hubface-client-address";
const TRUSTED_MARK = Symbol.for("hubface.clientAddressHeaderTrusted");

/** Called once by scripts/serve.ts: from now on CLIENT_ADDRESS_HEADER was set by us. */
export function trustClientAddressHeader(): void {
  (globalThis as Record<symbol, unknown>)[TRUSTED_MARK] = true;
}

/** "::ffff:203.0.113.9" → "203.0.113.9"; brackets and zone ids dropped. */
function normalize(address: string): string {
  const a = address
    .trim()
    .replace(/^\[|\]$/g, "")
    .replace(/%.*$/, "");
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(a);
  return mapped ? mapped[1]! : a.toLowerCase();
}

/**
 * TRUSTED_PROXIES ("10.0.0.5, 10.1.0.0/16, fd00::/8") as a BlockList. Unset or empty: trust no
 * proxy. An entry that is not an address or CIDR is an error at start-up, not a silent gap.
 *
 * @example trustedProxies("127.0.0.1, 10.0.0.0/8").check("10.2.3.4"); // true
 */
export function trustedProxies(list: string | undefined = process.env.TRUSTED_PROXIES): BlockList {
  const block = new BlockList();
  for (const entry of (list ?? "").split(/[\s,]+/).filter(Boolean)) {
    const [addr, bits] = entry.split("/");
    const ip = normalize(addr ?? "");
    const family = isIP(ip);
    if (!family || (bits !== undefined && !/^\d{1,3}$/.test(bits)))
      throw new Error(`TRUSTED_PROXIES: “${entry}” is not an IP address or CIDR range.`);
    const type = family === 6 ? "ipv6" : "ipv4";
    if (bits === undefined) block.addAddress(ip, type);
    else block.addSubnet(ip, Number(bits), type);
  }
  return block;
}

function isTrusted(block: BlockList, address: string): boolean {
  const family = isIP(address);
  return family !== 0 && block.check(address, family === 6 ? "ipv6" : "ipv4");
}

/**
 * The client's address from the socket peer and X-Forwarded-For. X-Forwarded-For is written by
 * whoever sent the request, so it is read only when the peer is a trusted proxy, from the right
 * (the entry our own proxy appended) leftwards past further trusted proxies: the first address
 * that is not one of ours is the client. Anything left of it is the client's own claim.
 *
 * @example
 * resolveClientAddress("203.0.113.9", "1.2.3.4", trustedProxies("")); // "203.0.113.9" (peer not trusted)
 * resolveClientAddress("10.0.0.5", "1.2.3.4, 198.51.100.7", trustedProxies("10.0.0.0/8")); // "198.51.100.7"
 */
export function resolveClientAddress(peer: string | undefined, forwardedFor: string | undefined, trusted: BlockList): string {
  let client = normalize(peer ?? "");
  if (!client) return "unknown";
  if (!isTrusted(trusted, client)) return client;
  const hops = (forwardedFor ?? "").split(",").map(normalize).filter(Boolean);
  for (let i = hops.length - 1; i >= 0; i--) {
    const hop = hops[i]!;
    if (!isIP(hop)) return client; // garbage in the chain: stop at the last address we can vouch for
    client = hop;
    if (!isTrusted(trusted, hop)) return hop;
  }
  return client;
}

/**
 * The client's address for rate limits and sign-in backoff, from CLIENT_ADDRESS_HEADER when
 * scripts/serve.ts (npm start) set it. Without that server (`next dev`, a bare `next start`)
 * route handlers cannot see the socket, and X-Forwarded-For is the client's to write, so every
 * caller counts as "unknown": limits then hold per account and globally, never per forged address.
 */
export function clientAddress(headers: HeaderBag): string {
  if (!(globalThis as Record<symbol, unknown>)[TRUSTED_MARK] || !headers) return "unknown";
  const value =
    typeof (headers as Headers).get === "function"
      ? (headers as Headers).get(CLIENT_ADDRESS_HEADER)
      : (headers as Record<string, string | string[] | undefined>)[CLIENT_ADDRESS_HEADER];
  const address = normalize((Array.isArray(value) ? value[0] : value) ?? "");
  return isIP(address) ? address : "unknown";
}
