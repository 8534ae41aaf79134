"use client";
import { RecoveringError } from "@/components/feedback/RecoveringError";

export default function AuthError(props: { error: Error & { digest?: string }; reset: () => void }) {
  return <RecoveringError {...props} area="sign-in" />;
}
