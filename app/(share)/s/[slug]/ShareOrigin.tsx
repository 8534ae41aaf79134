"use client";
import { type ReactNode, createContext, useContext } from "react";

const ShareOrigin = createContext("");

/**
 * The app's public origin (APP_ORIGIN, else NEXTAUTH_URL), handed down from the server page so
 * links copied from a share page are absolute and point at the public address even when the
 * page was reached through another name (a proxy, a LAN address).
 */
export function ShareOriginProvider({ origin, children }: { origin: string; children: ReactNode }) {
  return <ShareOrigin.Provider value={origin}>{children}</ShareOrigin.Provider>;
}

/** The configured origin without a trailing slash, or "" when none was handed down. */
export const useShareOrigin = () => useContext(ShareOrigin).replace(/\/$/, "");
