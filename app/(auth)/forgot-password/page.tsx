import type { Metadata } from "next";
import { Card } from "@/components/ui/Card";
import { ForgotPasswordForm } from "./ForgotPasswordForm";

export const metadata: Metadata = { title: "Reset your password" };

export default function ForgotPasswordPage() {
  return (
    <Card className="mx-auto max-w-md">
      <h1 className="text-2xl font-bold">Reset your password</h1>
      <p className="mt-1 text-sm text-basalt-600">We will e-mail you a link that works once and expires in 30 minutes.</p>
      <ForgotPasswordForm />
    </Card>
  );
}
