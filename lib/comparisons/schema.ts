/**
 * The comparison input as zod schemas, for route handlers (`route({ body })`), saved
 * comparisons (validated JSONB) and forms. The rules themselves live in model.ts
 * (`checkComparison`), which the browser uses directly so the workspace ships without zod;
 * these schemas only adapt them: same issues, same paths, same messages.
 */
import { z } from "zod";
import { type Checked, type ComparisonInput, type Issue, type SetupInputValues, checkComparison, checkSetup } from "./model";

export * from "./model";

function adapt<T>(check: (v: unknown) => Checked<T>): z.ZodType<T> {
  return z
    .unknown()
    .superRefine((v, ctx) => {
      const r = check(v);
      if (!r.ok) for (const i of r.issues) ctx.addIssue({ code: "custom", path: i.path, message: i.message });
    })
    .transform((v) => {
      const r = check(v);
      // superRefine has already rejected anything invalid, so this is always ok here.
      return (r.ok ? r.value : v) as T;
    }) as unknown as z.ZodType<T>;
}

export const comparisonInputSchema: z.ZodType<ComparisonInput> = adapt(checkComparison);
export const setupSchema: z.ZodType<SetupInputValues> = adapt((v) => checkSetup(v));
export type { Issue };
