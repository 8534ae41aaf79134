"use client";
import { useId, useRef, useState, useSyncExternalStore } from "react";
import { Segmented } from "@/components/comparison/Segmented";
import { Button } from "@/components/ui/Button";
import { labelOptions } from "@/components/ui/labelOptions";
import type { ComparisonResult } from "@/lib/comparisons/compute";
import type { DisplayPrefs } from "@/lib/comparisons/format";
import { FORUM_FORMAT_LABEL, type ForumFormat, forumPost } from "@/lib/comparisons/forumPost";
import { useShareOrigin } from "./ShareOrigin";

const noSubscribe = () => () => {};

/**
 * "Copy as forum post": the key figures, the drawing (the share page's Open Graph image) and
 * the link, in Markdown or BBCode. Uses the clipboard where the browser allows it; otherwise
 * (or on request) the text appears selected in a box to copy by hand.
 */
export function ForumPostButton({
  result,
  prefs,
  name,
  path,
}: {
  result: ComparisonResult;
  prefs: DisplayPrefs;
  name: string;
  path: string;
}) {
  const configured = useShareOrigin();
  const browser = useSyncExternalStore(
    noSubscribe,
    () => window.location.origin,
    () => "",
  );
  const origin = configured || browser;
  const [format, setFormat] = useState<ForumFormat>("markdown");
  const [state, setState] = useState<"idle" | "copied" | "manual">("idle");
  const box = useRef<HTMLTextAreaElement>(null);
  const boxId = useId();
  const groupName = useId();
  const text = forumPost(result, prefs, { name, url: `${origin}${path}`, imageUrl: `${origin}${path}/opengraph-image`, format });

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
      <div className="flex flex-wrap items-center justify-end gap-2">
        <Segmented
          legend="Forum post format"
          hideLegend
          name={groupName}
          value={format}
          options={labelOptions(FORUM_FORMAT_LABEL)}
          onChange={(f) => {
            setFormat(f);
            if (state === "copied") setState("idle");
          }}
        />
        <Button onClick={copy}>Copy as forum post</Button>
        <Button
          variant="ghost"
          onClick={() => setState(state === "manual" ? "idle" : "manual")}
          aria-expanded={state === "manual"}
          aria-controls={boxId}
        >
          {state === "manual" ? "Hide text" : "Show text"}
        </Button>
      </div>
      <p className="text-xs text-basalt-500">Markdown for forums with a Markdown editor; BBCode for most classic forums.</p>
      <span role="status" className="text-sm text-basalt-600" data-testid="forum-status">
        {state === "copied"
          ? `Copied as ${FORUM_FORMAT_LABEL[format]}: the figures, the drawing and the link. Paste it into the thread.`
          : state === "manual"
            ? "Select the text below and copy it (Ctrl+C / ⌘C)."
            : ""}
      </span>
      {state === "manual" && (
        <textarea
          id={boxId}
          ref={box}
          readOnly
          aria-label={`Forum post text (${FORUM_FORMAT_LABEL[format]})`}
          value={text}
          rows={16}
          className="mt-1 w-full min-w-[min(40rem,90vw)] rounded-lg border border-basalt-300 bg-white p-3 font-mono text-xs text-basalt-900"
          data-testid="forum-text"
        />
      )}
    </div>
  );
}
