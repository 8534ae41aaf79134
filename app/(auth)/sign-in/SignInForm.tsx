"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { TextField } from "@/components/ui/TextField";
import { type SignInInput, signInSchema } from "@/lib/accounts/schema";
import { AuthForm } from "../AuthForm";
import { PasswordField } from "../PasswordField";

export function SignInForm({ callbackUrl, notice }: { callbackUrl: string; notice?: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const res = await signIn("credentials", { ...values, redirect: false });
    if (!res || res.error) {
      setFailure(res?.error && res.error !== "CredentialsSignin" ? res.error : "Sign-in failed. Try again.");
      return;
    }
    router.push(callbackUrl);
    router.refresh();
  });

  return (
    <AuthForm onSubmit={onSubmit} failure={failure} pending={formState.isSubmitting} submit="Sign in" notice={notice}>
      <TextField label="E-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <PasswordField {...register("password")} error={formState.errors.password?.message} />
    </AuthForm>
  );
}
