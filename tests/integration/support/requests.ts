import { NextRequest } from "next/server";

/**
 * Route handler inputs as Next builds them. An object goes as JSON; a string or Buffer as it is;
 * FormData as multipart (its boundary header set by the request itself).
 */
export function req(method: string, path: string, body?: string | object | Buffer, headers: Record<string, string> = {}): NextRequest {
  const isRaw = typeof body === "string" || Buffer.isBuffer(body) || body instanceof FormData;
  return new NextRequest(`http://127.0.0.1:3000${path}`, {
    method,
    body: body === undefined ? undefined : isRaw ? (body as BodyInit) : JSON.stringify(body),
    headers: { ...(body !== undefined && !isRaw ? { "content-type": "application/json" } : {}), ...headers },
  });
}

export const ctx = (params: Record<string, string> = {}) => ({ params: Promise.resolve(params) });

/** A next-auth session as getServerSession returns it. */
export const sessionOf = (u: { id: string; role: string; shop_id: string | null; name?: string; email?: string }) => ({
  user: { id: u.id, role: u.role, shopId: u.shop_id, name: u.name ?? "Tester", email: u.email ?? "t@example.test" },
});
