import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/Card";
import { safeLocalPath } from "@/lib/platform/auth/redirect";
import { SignInForm } from "./SignInForm";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const sp = await searchParams;
  const callbackUrl = safeLocalPath(sp.callbackUrl);
  return (
    <Card className="mx-auto max-w-md">
      <h1 className="text-2xl font-bold">Sign in</h1>
      <p className="mt-1 text-sm text-basalt-600">
        New here?{" "}
        <Link className="font-medium text-ember-700 underline" href="/sign-up">
          Create an account
        </Link>
      </p>
      <SignInForm
        callbackUrl={callbackUrl}
        notice={
          sp.reset === "1"
            ? "Your password was changed. Sign in with the new one."
            : sp.ended === "1"
              ? "You were signed out on every device. Sign in again here."
              : sp.confirmed === "1"
                ? "Your account is ready. Sign in with the password you chose."
                : undefined
        }
      />
      <p className="mt-4 text-sm">
        <Link className="text-ember-700 underline" href="/forgot-password">
          Forgot your password?
        </Link>
      </p>
    </Card>
  );
}
