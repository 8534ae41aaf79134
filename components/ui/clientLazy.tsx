"use client";
import { type ComponentType, type ReactNode, Suspense, lazy, useSyncExternalStore } from "react";

const noSubscribe = () => () => {};

/**
 * A component whose code is fetched the first time it renders in the browser, as next/dynamic with
 * `ssr: false` does, on React's own lazy and Suspense. next/dynamic's loader (with its server-side
 * bail-out and async storage, about 2 kB gzip) then stays out of the first-load scripts of the
 * pages that only defer browser-side work (the workspace). On the server and while the page
 * hydrates `placeholder` renders (nothing without one), and it stands in while the code arrives,
 * so a placeholder with the component's height keeps the layout still. A failed load throws to the
 * nearest error boundary, as next/dynamic's does.
 *
 * @example
 * const Charts = clientLazy(() => import("./ComparisonCharts").then((m) => m.default), ChartsPlaceholder);
 */
export function clientLazy<P extends object>(load: () => Promise<ComponentType<P>>, placeholder?: () => ReactNode): ComponentType<P> {
  const Lazy = lazy(async () => ({ default: await load() }));
  function ClientLazy(props: P) {
    const inBrowser = useSyncExternalStore(
      noSubscribe,
      () => true,
      () => false,
    );
    const fallback = placeholder ? placeholder() : null;
    if (!inBrowser) return fallback;
    return (
      <Suspense fallback={fallback}>
        <Lazy {...props} />
      </Suspense>
    );
  }
  return ClientLazy;
}
