"use client";
import { RecoveringError } from "@/components/feedback/RecoveringError";

export default function AreaError(props: { error: Error & { digest?: string }; reset: () => void }) {
  return <RecoveringError {...props} area="share" />;
}
