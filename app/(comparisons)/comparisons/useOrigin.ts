import { useSyncExternalStore } from "react";

const noSubscribe = () => () => {};
/** The page's origin in the browser ("" while rendering on the server). */
export function useOrigin(): string {
  return useSyncExternalStore(
    noSubscribe,
    () => window.location.origin,
    () => "",
  );
}
