"use client";
import { useEffect, useState } from "react";

export type Reading = typeof import("./reading");

let loaded: Reading | null = null;
let loading: Promise<Reading> | null = null;

/** The reading code (./reading.ts), fetched once per page; a failed fetch is tried again on the next call. */
export function loadReading(): Promise<Reading> {
  loading ??= import("./reading").then(
    (m) => (loaded = m),
    (e: unknown) => {
      loading = null;
      throw e;
    },
  );
  return loading;
}

/** The reading code if it has arrived, else null (then {@link loadReading} brings it). */
export const readingNow = (): Reading | null => loaded;

/**
 * The reading code for a component: null until it has arrived (always on the server's and the
 * hydrating render), fetched at once after mounting. A fetch that fails throws to the error boundary,
 * which offers to try again, as a panel whose code does not arrive does.
 */
export function useReading(): Reading | null {
  const [reading, setReading] = useState<Reading | null>(readingNow);
  const [failed, setFailed] = useState<unknown>(null);
  useEffect(() => {
    let live = true;
    loadReading().then(
      (m) => {
        if (live) setReading(() => m);
      },
      (e: unknown) => {
        if (live) setFailed(() => e ?? new Error("The workspace's reading code did not load."));
      },
    );
    return () => {
      live = false;
    };
  }, []);
  if (failed) throw failed;
  return reading;
}
