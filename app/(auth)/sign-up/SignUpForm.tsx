"use client";
import { useState } from "react";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import type { SignUpAnswer } from "@/lib/accounts/api";
import { type SignUpInput, signUpSchema } from "@/lib/accounts/schema";
import { AuthForm } from "../AuthForm";
import { PasswordField } from "../PasswordField";
import { useApiForm } from "../useApiForm";

/**
 * Sign-up sends a confirmation mail; the account is made when its link is used. The answer is
 * the same for an address that already has an account (its owner gets a mail instead), so the
 * screen says "check your e-mail" either way.
 */
export function SignUpForm() {
  const [sent, setSent] = useState<SignUpAnswer | null>(null);
  const { form, frame } = useApiForm<SignUpInput, SignUpAnswer>({
    schema: signUpSchema,
    url: "/api/account/signup",
    fields: ["name", "email", "password"],
    onDone: (answer) => setSent(answer),
  });
  const { register, formState } = form;

  return (
    <>
      <div aria-live="polite">
        {sent && (
          <Alert tone="success" title={sent.title} className="mt-5">
            <p className="mt-1">{sent.message}</p>
          </Alert>
        )}
      </div>
      {sent ? (
        <Button variant="secondary" className="mt-3" onClick={() => setSent(null)}>
          Sign up with another address
        </Button>
      ) : (
        <AuthForm {...frame} submit="Create account">
          <TextField label="Name" autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
          <TextField label="E-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
          <PasswordField choose hint="At least 10 characters." {...register("password")} error={formState.errors.password?.message} />
        </AuthForm>
      )}
    </>
  );
}
