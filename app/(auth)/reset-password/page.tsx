import type { Metadata } from "next";
import Link from "next/link";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { ResetPasswordForm } from "./ResetPasswordForm";

export const metadata: Metadata = { title: "Choose a new password", referrer: "no-referrer" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <Card className="mx-auto max-w-md">
      <h1 className="text-2xl font-bold">Choose a new password</h1>
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <Alert tone="error" className="mt-4">
          This page needs the link from the e-mail.{" "}
          <Link className="underline" href="/forgot-password">
            Ask for a new link
          </Link>
          .
        </Alert>
      )}
    </Card>
  );
}
