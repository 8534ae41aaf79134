/**
 * The workspace's code that runs only once the reader acts: reading typed text (every field's
 * message), rewriting it for a unit switch, and reading a comparison back from the address on
 * back/forward. The first screen only formats and computes, so this arrives just after the page
 * (useReading.ts) and is not part of its first-load JavaScript.
 */
import { convertDraft, readDraft } from "@/lib/comparisons/readDraft";
import { decodeComparison } from "@/lib/comparisons/urlRead";

export { convertDraft, decodeComparison, readDraft };
