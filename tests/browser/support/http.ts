import type { Page } from "playwright-core";
import { signInOverHttp } from "@/scripts/http-session";
import { BASE, signInAs } from "./browser";

export const DEMO_PASSWORD = "hubface-demo-1";
export const DEMO = {
  member: "juno@demo.hubface.test",
  shop_staff: "teo@demo.hubface.test",
  shop_owner: "mara@demo.hubface.test",
  admin: "admin@demo.hubface.test",
} as const;
export type DemoRole = keyof typeof DEMO;
export type Who = "anonymous" | DemoRole;
export const EVERYONE: Who[] = ["anonymous", "member", "shop_staff", "shop_owner", "admin"];

/** Signs in over HTTP exactly as the sign-in form does and returns the Cookie header. */
export function sessionCookie(email: string, password = DEMO_PASSWORD): Promise<string> {
  return signInOverHttp(BASE, email, password);
}

const cache = new Map<Who, Promise<string>>();
/** One session per demo role for the whole test file. */
export function cookieFor(who: Who): Promise<string> {
  if (who === "anonymous") return Promise.resolve("");
  if (!cache.has(who)) cache.set(who, sessionCookie(DEMO[who]));
  return cache.get(who)!;
}

/** `page`, with the demo account of `role` signed in on it through the sign-in form. */
export async function signedInDemo(page: Page, role: DemoRole): Promise<Page> {
  await signInAs(page, DEMO[role], DEMO_PASSWORD);
  return page;
}

/** A call as the app's own pages make it: a browser sends Origin on every POST/PUT/PATCH/DELETE (lib/platform/http/origin.ts). */
export async function call(
  who: Who,
  method: string,
  path: string,
  body?: unknown,
  extraHeaders: Record<string, string> = {},
): Promise<Response> {
  const cookie = await cookieFor(who);
  return fetch(`${BASE}${path}`, {
    method,
    redirect: "manual",
    headers: {
      ...(cookie ? { Cookie: cookie } : {}),
      ...(method === "GET" || method === "HEAD" ? {} : { Origin: new URL(BASE).origin }),
      ...(body === undefined ? {} : { "Content-Type": "application/json" }),
      ...extraHeaders,
    },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
}
