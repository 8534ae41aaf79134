"use client";
import { useCallback, useLayoutEffect, useRef } from "react";

/** When to look again after a write: Next's router settles within a frame or two, a slow phone later. */
const RECHECKS_MS = [150, 600, 2000];

/**
 * Writes the workspace's link into the address bar and keeps it there.
 *
 * Next patches `history.pushState`/`replaceState` and, when its router commits, writes back the
 * URL it was told about. With keys pressed a few milliseconds apart it can commit an earlier write
 * after a later one, leaving the link one keystroke behind what the screen shows (a reload or a
 * copied address then loses the last figure). So after each write the address bar is read again a
 * few times and the last URL written is put back if something replaced it. Back and Forward (and
 * leaving the page) end the watch: the address bar then belongs to the entry the person went to.
 *
 * @example
 * const writeUrl = useAddressBar();
 * writeUrl("/workspace?pt=35x12.50R17", "push"); // a new history entry
 * writeUrl("/workspace?pt=35x12.50R17&po=-24", "replace"); // the same entry, one keystroke later
 */
export function useAddressBar(): (url: string, mode: "push" | "replace") => void {
  const wanted = useRef<string | null>(null);
  const timers = useRef<ReturnType<typeof setTimeout>[]>([]);

  const stop = useCallback(() => {
    wanted.current = null;
    for (const t of timers.current) clearTimeout(t);
    timers.current = [];
  }, []);

  // A layout effect: its cleanup runs in the commit that leaves the page, before a timer can fire.
  useLayoutEffect(() => {
    window.addEventListener("popstate", stop);
    return () => {
      window.removeEventListener("popstate", stop);
      stop();
    };
  }, [stop]);

  return useCallback(
    (url: string, mode: "push" | "replace") => {
      stop();
      wanted.current = url;
      if (url !== here()) {
        if (mode === "push") window.history.pushState(null, "", url);
        else window.history.replaceState(window.history.state, "", url);
      }
      timers.current = RECHECKS_MS.map((ms) =>
        setTimeout(() => {
          // A later write, Back/Forward or leaving the page cleared `wanted`: nothing to keep.
          // Only while the address bar is still on this page: a move to another page is never undone.
          const samePage = window.location.pathname === new URL(url, window.location.origin).pathname;
          if (wanted.current === url && samePage && here() !== url) window.history.replaceState(window.history.state, "", url);
        }, ms),
      );
    },
    [stop],
  );
}

const here = () => `${window.location.pathname}${window.location.search}`;
