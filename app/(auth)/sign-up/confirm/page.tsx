import type { Metadata } from "next";
import Link from "next/link";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { SIGN_UP_LINK_GONE, signUpQueries } from "@/lib/accounts/signUpQueries";
import { isLinkToken } from "@/lib/platform/tokenFormat";
import { ConfirmSignUpForm } from "./ConfirmSignUpForm";

export const metadata: Metadata = { title: "Confirm your account", referrer: "no-referrer", robots: { index: false } };

/** Opening the link only reads the pending sign-up; the form's button creates the account. */
export default async function ConfirmSignUpPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const pending = token && isLinkToken(token) ? await signUpQueries.findPendingSignUp(token) : undefined;
  return (
    <Card className="mx-auto max-w-md">
      <h1 className="text-2xl font-bold">Confirm your account</h1>
      {token && pending ? (
        <>
          <p className="mt-1 text-sm text-basalt-600">
            One step left: confirm the Hubface account for <strong>{pending.email}</strong> and sign in.
          </p>
          <ConfirmSignUpForm token={token} email={pending.email} />
        </>
      ) : (
        <Alert tone="error" className="mt-4">
          {token ? SIGN_UP_LINK_GONE : "This page needs the link from the sign-up e-mail."}{" "}
          <Link className="underline" href="/sign-up">
            Sign up again
          </Link>
          .
        </Alert>
      )}
    </Card>
  );
}
