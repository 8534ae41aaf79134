import type { Metadata } from "next";

/** The workspace's title and description, shared by the page rendered per request and the visitor's prerendered one. */
export const WORKSPACE_METADATA: Metadata = {
  title: "Comparison workspace",
  description:
    "Your current wheel and tire setup beside the one you plan: diameter, clearance, poke, scrub, track, speedometer and engine speed, with a to-scale drawing.",
};

export const WORKSPACE_LEAD =
  "Enter what you run and what you plan. Every figure updates as you type, in your browser; the link in the address bar reproduces this comparison.";
