import "server-only";
import { notFound } from "next/navigation";
import { NotFoundError } from "@/lib/platform/errors";

/**
 * What a server page shows, or the not-found page: the one place a page turns a missing record
 * into a 404. A `get*` query's NotFoundError and a `find*` query's `undefined` both end in
 * `notFound()` (the convention is in lib/platform/errors.ts); any other error goes on to the
 * error page. Call it before anything streams (outside a Suspense boundary or loading.tsx, e.g.
 * in the segment's layout) so the answer's status is 404 and not a 200 with a not-found body.
 *
 * @example
 * const detail = await pageGuard(garageQueries.getVehicleDetail(caller.userId, id));
 * const share = await pageGuard(getSharedComparison(slug)); // undefined → 404
 */
export async function pageGuard<T>(load: Promise<T>): Promise<Exclude<T, undefined>> {
  let value: T;
  try {
    value = await load;
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
  if (value === undefined) notFound();
  return value as Exclude<T, undefined>;
}
