"use client";
import { type RefObject, useEffect, useState } from "react";

/** How far below the viewport a deferred block starts loading, so it is there when scrolled to. */
export const VISIBLE_MARGIN = "300px 0px";

/**
 * True once the element has come within {@link VISIBLE_MARGIN} of the viewport and the browser
 * has then had an idle moment (requestIdleCallback, bounded by `timeoutMs`): for work that
 * should neither delay the first paint nor compete with the reader's typing. Browsers without
 * IntersectionObserver (and the server) see it at once after mounting.
 */
export function useVisibleAndIdle(ref: RefObject<Element | null>, timeoutMs = 1500): boolean {
  const [ready, setReady] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (ready || !el) return;
    let cancelIdle = () => {};
    const whenIdle = () => {
      if (typeof window.requestIdleCallback === "function") {
        const h = window.requestIdleCallback(() => setReady(true), { timeout: timeoutMs });
        cancelIdle = () => window.cancelIdleCallback(h);
      } else {
        const h = window.setTimeout(() => setReady(true), 1);
        cancelIdle = () => window.clearTimeout(h);
      }
    };
    if (typeof IntersectionObserver !== "function") {
      whenIdle();
      return () => cancelIdle();
    }
    const io = new IntersectionObserver(
      (entries) => {
        if (entries.some((e) => e.isIntersecting)) {
          io.disconnect();
          whenIdle();
        }
      },
      { rootMargin: VISIBLE_MARGIN },
    );
    io.observe(el);
    return () => {
      io.disconnect();
      cancelIdle();
    };
  }, [ref, ready, timeoutMs]);
  return ready;
}
