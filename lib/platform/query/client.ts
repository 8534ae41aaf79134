import { QueryClient, isServer } from "@tanstack/react-query";

/** One factory for every QueryClient: the same defaults on the server and in the browser. */
export function makeQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: 1, refetchOnWindowFocus: false },
    },
  });
}

let browserClient: QueryClient | undefined;

/** On the server a fresh client per request; in the browser one client for the page's life. */
export function getQueryClient(): QueryClient {
  if (isServer) return makeQueryClient();
  return (browserClient ??= makeQueryClient());
}
