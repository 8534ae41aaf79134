import type { SavedComparison } from "@/lib/comparisons/api";
import { workspaceUrl } from "@/lib/comparisons/url";

/** Opens the comparison in the workspace through the URL codec, remembering which saved one it is. */
export function workspaceHref(c: SavedComparison): string {
  return workspaceUrl({ input: c.input, savedId: c.id, vehicleId: c.vehicleId });
}
