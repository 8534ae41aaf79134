/** The backspacing diagram's box (kept apart so the stand-in shown while it loads does not import the drawing). */
export const BACKSPACING_DIAGRAM_BOX = { viewBox: "0 0 220 92", className: "h-auto w-full max-w-[15rem]" } as const;
