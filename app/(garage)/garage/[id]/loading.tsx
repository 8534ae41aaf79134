import { PageLoading } from "@/components/feedback/PageLoading";

export default function Loading() {
  return <PageLoading />;
}
