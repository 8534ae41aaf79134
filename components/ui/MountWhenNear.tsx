"use client";
import { type ReactNode, useRef } from "react";
import { cx } from "./cx";
import { useVisibleAndIdle } from "./useVisibleAndIdle";

/**
 * Renders `children` only once this spot has come near the viewport and the browser has had an
 * idle moment (useVisibleAndIdle, the mechanism the comparison charts use): a panel below the
 * fold then costs nothing while the page hydrates on a phone. Until then a placeholder named
 * `label` (a status, so a screen reader hears that something is coming) stands in.
 *
 * `reserve` is a min-height class per breakpoint, a lower bound of the panel's own height. The box
 * keeps it after mounting too, so a panel whose code is still arriving (clientLazy) holds its
 * space and nothing below moves; being a lower bound it never adds a gap under the panel.
 * Once mounted the panel stays mounted: what the reader typed into it is kept.
 */
export function MountWhenNear({ label, reserve, children }: { label: string; reserve: string; children: ReactNode }) {
  const box = useRef<HTMLDivElement>(null);
  const ready = useVisibleAndIdle(box);
  return (
    <div ref={box} className={cx("flex flex-col", reserve)}>
      {ready ? (
        children
      ) : (
        <div role="status" aria-label={label} className="grow animate-pulse rounded-card bg-basalt-50 ring-1 ring-basalt-100" />
      )}
    </div>
  );
}
