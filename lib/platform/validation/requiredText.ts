import { z } from "zod";

/**
 * A text field that must not be left empty: trimmed, and one message whether the value is
 * missing, not text, or only spaces, so the screen names the field the same way every time.
 * Callers chain their own limits (`.max(…)`, `.superRefine(…)`). Pure: used by forms and routes.
 *
 * @example
 * requiredText("Describe the line.").max(200, "Use at most 200 characters.").safeParse("  ").error?.issues[0]?.message;
 * // "Describe the line."
 */
export const requiredText = (message: string) => z.string({ error: message }).trim().min(1, message);
