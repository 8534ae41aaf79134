import { z } from "zod";
import { comparisonInputSchema } from "@/lib/comparisons/schema";

/**
 * Saved comparisons: what the workspace's save form, the list page and the route handlers
 * accept. The comparison itself is lib/comparisons/schema.ts; key figures are never accepted
 * from a client (unknown keys are dropped and the server computes them).
 */
export const COMPARISON_NAME_MAX = 120;

export const comparisonNameSchema = z
  .string({ error: "Give the comparison a name (e.g. Trail build, 37s on 17s)." })
  .trim()
  .min(1, "Give the comparison a name (e.g. Trail build, 37s on 17s).")
  .max(COMPARISON_NAME_MAX, `Keep the name to ${COMPARISON_NAME_MAX} characters.`);

/** The vehicle it belongs to (a garage vehicle id), or null. */
export const vehicleIdSchema = z.uuid({ error: "That is not a vehicle id." }).nullable();

export const createComparisonSchema = z.object({
  name: comparisonNameSchema,
  input: comparisonInputSchema,
  vehicleId: vehicleIdSchema.optional(),
});

export const updateComparisonSchema = z
  .object({
    name: comparisonNameSchema.optional(),
    input: comparisonInputSchema.optional(),
    vehicleId: vehicleIdSchema.optional(),
  })
  .refine((v) => v.name !== undefined || v.input !== undefined || v.vehicleId !== undefined, {
    message: "Nothing to change: send a name, an input or a vehicle id.",
    path: ["_"],
  });

export const COMPARISON_SORTS = ["updated", "name", "created", "diameter"] as const;
export type ComparisonSort = (typeof COMPARISON_SORTS)[number];
export const COMPARISON_SORT_LABEL: Record<ComparisonSort, string> = {
  updated: "Last changed",
  created: "Newest first",
  name: "Name A–Z",
  diameter: "Largest diameter change",
};

export const listComparisonsQuery = z.object({
  q: z.string().trim().max(100, "Search for at most 100 characters.").optional().default(""),
  sort: z
    .enum(COMPARISON_SORTS, { error: `Sort by one of: ${COMPARISON_SORTS.join(", ")}.` })
    .optional()
    .default("updated"),
});

export const comparisonIdParams = z.object({ id: z.uuid() });

/** A share slug as the app makes them: base64url of 18 random bytes (144 bits). */
export const SHARE_SLUG_RE = /^[A-Za-z0-9_-]{24}$/;
