"use client";
import { useRouter } from "next/navigation";
import { startTransition, useEffect, useState, useSyncExternalStore } from "react";
import { Button } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";
import { ERROR_REF_COOKIE, readErrorRef } from "@/lib/platform/log/errorRef";

const seen = new WeakMap<Error, string | undefined>();
const noSubscription = () => () => {};
function requestIdFor(error: Error): string | undefined {
  if (!seen.has(error)) {
    const id = readErrorRef(document.cookie);
    seen.set(error, id);
    if (id) document.cookie = `${ERROR_REF_COOKIE}=; Path=/; Max-Age=0; SameSite=Lax`;
  }
  return seen.get(error);
}

/**
 * The friendly error shown by every area's error.tsx. While the cause is the database being
 * away, it polls /api/health and re-renders the page by itself once the database is back.
 */
export function RecoveringError({ error, reset, area }: { error: Error & { digest?: string }; reset: () => void; area: string }) {
  const router = useRouter();
  const [down, setDown] = useState<boolean | null>(null);
  // A 5xx answer leaves its request id in a cookie (lib/platform/log/errorRef.ts): shown so the
  // admin can find the log lines. Read once per error and cleared, so a later error does not show
  // a stale id; the server render shows none (no cookie there), so hydration agrees.
  const requestId = useSyncExternalStore(
    noSubscription,
    () => requestIdFor(error),
    () => undefined,
  );

  useEffect(() => {
    let stopped = false;
    const retry = () =>
      startTransition(() => {
        router.refresh();
        reset();
      });
    const check = async () => {
      try {
        const res = await fetch("/api/health", { cache: "no-store" });
        if (stopped) return;
        if (res.ok) {
          if (down) retry();
          setDown(false);
        } else setDown(true);
      } catch {
        if (!stopped) setDown(true);
      }
    };
    void check();
    const timer = setInterval(check, 3000);
    return () => {
      stopped = true;
      clearInterval(timer);
    };
  }, [down, reset, router]);

  return (
    <Card className="mx-auto max-w-xl text-center" role="alert">
      <h1 className="text-2xl font-bold">{down ? "Hubface can't reach its database" : `This ${area} page could not be shown`}</h1>
      <p className="mt-2 text-basalt-600">
        {down
          ? "Your work is not lost. This page will come back by itself as soon as the database answers again."
          : "Something went wrong while loading it. Try again; if it keeps happening, tell the site's admin."}
      </p>
      {(requestId || error.digest) && (
        <p className="mt-2 text-xs text-basalt-500">
          {requestId && <>Request id {requestId}</>}
          {requestId && error.digest && " · "}
          {error.digest && <>Reference {error.digest}</>}
        </p>
      )}
      <div className="mt-5 flex justify-center gap-3">
        <Button
          onClick={() =>
            startTransition(() => {
              router.refresh();
              reset();
            })
          }
        >
          Try again
        </Button>
      </div>
    </Card>
  );
}
