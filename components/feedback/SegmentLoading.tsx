import { PageLoading } from "./PageLoading";

/** A route segment's loading.tsx, re-exported where a segment wants the standard loading state. */
export default function SegmentLoading() {
  return <PageLoading />;
}
