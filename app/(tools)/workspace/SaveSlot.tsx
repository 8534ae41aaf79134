"use client";
import Link from "next/link";
import { buttonClass } from "@/components/ui/Button";
import { clientLazy } from "@/components/ui/clientLazy";
import { workspaceUrl } from "@/lib/comparisons/url";
import { type OpenedComparison, useCurrentInput } from "./currentInput";

// The members' control carries react-hook-form, zod and TanStack Query; visitors never download them, and the
// workspace's first-load scripts stay within budget. The placeholder keeps the row's height.
const SaveComparison = clientLazy(
  () => import("./SaveComparisonWithQuery").then((m) => m.SaveComparisonWithQuery),
  () => (
    <div
      className="flex min-h-[3.75rem] items-center rounded-lg bg-white px-4 py-3 text-sm text-basalt-600 ring-1 ring-basalt-100"
      aria-busy="true"
    >
      Loading the save control…
    </div>
  ),
);

/**
 * The workspace's save slot. Anonymous visitors get a sign-in link that brings them back to this
 * very comparison (it lives in the URL); members get the save control.
 */
export function SaveSlot({ signedIn, saved }: { signedIn: boolean; saved: OpenedComparison | null }) {
  const { input } = useCurrentInput();
  if (signedIn) return <SaveComparison saved={saved} />;
  const back = workspaceUrl({ input });
  return (
    <div className="flex flex-wrap items-center gap-3 rounded-lg bg-white px-4 py-3 ring-1 ring-basalt-100" data-testid="save-prompt">
      <Link href={`/sign-in?callbackUrl=${encodeURIComponent(back)}`} className={buttonClass("secondary")}>
        Sign in to save
      </Link>
      <p className="text-sm text-basalt-600">
        Signed-in members keep comparisons and share them. Until then this comparison lives in the link.
      </p>
    </div>
  );
}
