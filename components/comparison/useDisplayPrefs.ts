"use client";
import { useCallback, useSyncExternalStore } from "react";
import { DEFAULT_PREFS, type DisplayPrefs, PREFS_STORAGE_KEY, parsePrefs } from "@/lib/comparisons/format";

/**
 * The reader's unit choice (inch/metric, decimals/fractions), remembered in localStorage and
 * shared by every comparison screen in the tab. The server renders with the defaults; the
 * stored choice applies right after hydration.
 */
const listeners = new Set<() => void>();
let cachedRaw: string | null | undefined;
let cached: DisplayPrefs = DEFAULT_PREFS;

function read(): DisplayPrefs {
  let raw: string | null = null;
  try {
    raw = window.localStorage.getItem(PREFS_STORAGE_KEY);
  } catch {
    raw = null;
  }
  if (raw !== cachedRaw) {
    cachedRaw = raw;
    cached = parsePrefs(raw);
  }
  return cached;
}

function subscribe(fn: () => void): () => void {
  listeners.add(fn);
  const onStorage = (e: StorageEvent) => {
    if (e.key === PREFS_STORAGE_KEY) fn();
  };
  window.addEventListener("storage", onStorage);
  return () => {
    listeners.delete(fn);
    window.removeEventListener("storage", onStorage);
  };
}

export function useDisplayPrefs(): [DisplayPrefs, (next: Partial<DisplayPrefs>) => void] {
  const prefs = useSyncExternalStore(subscribe, read, () => DEFAULT_PREFS);
  const set = useCallback((next: Partial<DisplayPrefs>) => {
    const merged = { ...read(), ...next };
    try {
      window.localStorage.setItem(PREFS_STORAGE_KEY, JSON.stringify(merged));
    } catch {
      // Private mode or storage full: the choice still applies until the tab closes.
      cachedRaw = JSON.stringify(merged);
      cached = merged;
    }
    for (const fn of listeners) fn();
  }, []);
  return [prefs, set];
}
