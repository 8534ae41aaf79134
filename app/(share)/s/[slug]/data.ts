import "server-only";
import { cache } from "react";
import type { SharedComparison } from "@/lib/comparisons/api";
import { comparisonQueries } from "@/lib/comparisons/queries";
import { SHARE_SLUG_RE } from "@/lib/comparisons/savedSchema";

/**
 * The one database read of a share view: generateMetadata and the page call this with the same
 * slug and React's cache() makes it one query per render. A slug that cannot be one of ours is
 * answered without asking the database.
 */
export const getSharedComparison = cache(async (slug: string): Promise<SharedComparison | undefined> => {
  if (!SHARE_SLUG_RE.test(slug)) return undefined;
  return comparisonQueries.findSharedComparison(slug);
});
