"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { type SignUpInput, signUpSchema } from "@/lib/accounts/schema";

export function SignUpForm() {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await api("/api/account/signup", { body: values });
    } catch (e) {
      setFailure(applyFieldErrors(e, setError, ["name", "email", "password"]));
      return;
    }
    const res = await signIn("credentials", { email: values.email, password: values.password, redirect: false });
    router.push(res?.ok ? "/account?welcome=1" : "/sign-in");
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-5 flex flex-col gap-3">
      <div aria-live="assertive">{failure && <Alert tone="error">{failure}</Alert>}</div>
      <TextField label="Name" autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
      <TextField label="E-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        {...register("password")}
        error={formState.errors.password?.message}
      />
      <Button type="submit" pending={formState.isSubmitting}>
        Create account
      </Button>
    </form>
  );
}
