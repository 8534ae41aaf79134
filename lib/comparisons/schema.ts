/**
 * The comparison input as a zod schema, for route handlers (`route({ body })`) and saved
 * comparisons (validated JSONB). The rules themselves live in checkInput.ts (`checkComparison`, with
 * the setups checked by lib/setup), which the browser uses directly so the workspace ships
 * without zod; this schema only adapts them: same issues, same paths, same messages.
 */
import type { z } from "zod";
import { zodFromCheck } from "@/lib/setup/schema";
import { checkComparison } from "./checkInput";
import type { ComparisonInput } from "./model";

export * from "./model";

export const comparisonInputSchema: z.ZodType<ComparisonInput> = zodFromCheck(checkComparison);
