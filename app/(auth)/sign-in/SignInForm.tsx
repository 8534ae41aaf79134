"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import { type SignInInput, signInSchema } from "@/lib/accounts/schema";

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
    <form onSubmit={onSubmit} noValidate className="mt-5 flex flex-col gap-3">
      {notice && <Alert tone="success">{notice}</Alert>}
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
      <TextField label="E-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        {...register("password")}
        error={formState.errors.password?.message}
      />
      <Button type="submit" pending={formState.isSubmitting}>
        Sign in
      </Button>
    </form>
  );
}
