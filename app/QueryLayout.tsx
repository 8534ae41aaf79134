"use client";
import { QueryClientProvider } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { getQueryClient } from "@/lib/platform/query/client";

/**
 * TanStack Query for the pages that read and write through it: the route groups that need it
 * re-export this as their layout (`export { default } from "@/app/QueryLayout"`), and the
 * workspace's save control wraps itself in it. Pages without it (home, converter, ring helper,
 * share page, a visitor's workspace) never download the library. One client per browser page
 * (lib/platform/query/client.ts), so moving between groups keeps the cache.
 */
export default function QueryLayout({ children }: { children: ReactNode }) {
  return <QueryClientProvider client={getQueryClient()}>{children}</QueryClientProvider>;
}
