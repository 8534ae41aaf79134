"use client";
import { useEffect } from "react";

/** A click that would take this tab to another page of the site (not a new tab, a download or a jump within the page). */
function leavingLink(ev: MouseEvent): HTMLAnchorElement | null {
  if (ev.defaultPrevented || ev.button !== 0 || ev.metaKey || ev.ctrlKey || ev.shiftKey || ev.altKey) return null;
  const a = ev.target instanceof Element ? ev.target.closest("a[href]") : null;
  if (!(a instanceof HTMLAnchorElement) || a.hasAttribute("download") || (a.target && a.target !== "_self")) return null;
  const to = new URL(a.href, window.location.href);
  const here = new URL(window.location.href);
  if (to.origin !== here.origin) return null; // another site: the browser's own beforeunload prompt covers it
  if (to.pathname === here.pathname && to.search === here.search) return null; // a jump within the page
  return a;
}

/**
 * One guard for every screen with unsaved work (the workspace's saved comparison, the quote editor).
 * While `dirty`, leaving the page asks first: closing or reloading the tab through the browser's
 * own "leave site?" prompt (beforeunload), the site's links — client-side navigations that
 * beforeunload never sees — through a confirm naming what would be lost. The click listener runs
 * in the capture phase on the document, before the link's own handler, and cancels the click
 * when the person chooses to stay.
 */
export function useLeaveGuard(dirty: boolean, message: string): void {
  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (ev: BeforeUnloadEvent) => {
      ev.preventDefault();
      // Older browsers show the prompt only when returnValue is set.
      ev.returnValue = "";
    };
    const onClick = (ev: MouseEvent) => {
      // Next's Link skips navigation for a click whose default was prevented.
      if (leavingLink(ev) && !window.confirm(message)) ev.preventDefault();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    document.addEventListener("click", onClick, true);
    return () => {
      window.removeEventListener("beforeunload", onBeforeUnload);
      document.removeEventListener("click", onClick, true);
    };
  }, [dirty, message]);
}
