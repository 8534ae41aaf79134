"use client";
import { useId, useRef, useState, useSyncExternalStore } from "react";
import { Button } from "@/components/ui/Button";
import type { ComparisonResult } from "@/lib/comparison/compute";
import type { DisplayPrefs } from "@/lib/comparison/format";
import { forumPost } from "@/lib/comparison/forumPost";

const noSubscribe = () => () => {};

/**
 * "Copy as forum post": the key figures as a Markdown table with the link. Uses the clipboard
 * where the browser allows it; otherwise (or on request) the text appears selected in a box
 * to copy by hand.
 */
export function ForumPostButton({ result, prefs, name, path }: { result: ComparisonResult; prefs: DisplayPrefs; name: string; path: string }) {
  const origin = useSyncExternalStore(noSubscribe, () => window.location.origin, () => "");
  const [state, setState] = useState<"idle" | "copied" | "manual">("idle");
  const box = useRef<HTMLTextAreaElement>(null);
  const boxId = useId();
  const text = forumPost(result, prefs, { name, url: `${origin}${path}` });

  const copy = async () => {
    try {
      if (!navigator.clipboard) throw new Error("no clipboard");
      await navigator.clipboard.writeText(text);
      setState("copied");
    } catch {
      setState("manual");
      requestAnimationFrame(() => box.current?.select());
    }
  };

  return (
    <div className="flex flex-col items-end gap-1">
      <div className="flex items-center gap-2">
        <Button onClick={copy}>Copy as forum post</Button>
        <Button variant="ghost" onClick={() => setState(state === "manual" ? "idle" : "manual")} aria-expanded={state === "manual"} aria-controls={boxId}>
          {state === "manual" ? "Hide text" : "Show text"}
        </Button>
      </div>
      <span role="status" className="text-sm text-basalt-600" data-testid="forum-status">
        {state === "copied" ? "Copied: a Markdown table with the link. Paste it into the thread." : state === "manual" ? "Select the text below and copy it (Ctrl+C / ⌘C)." : ""}
      </span>
      {state === "manual" && (
        <textarea
          id={boxId}
          ref={box}
          readOnly
          aria-label="Forum post text"
          value={text}
          rows={16}
          className="mt-1 w-full min-w-[min(40rem,90vw)] rounded-lg border border-basalt-300 bg-white p-3 font-mono text-xs text-basalt-900"
          data-testid="forum-text"
        />
      )}
    </div>
  );
}
