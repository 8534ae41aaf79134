"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { type ForgotPasswordInput, forgotPasswordSchema } from "@/lib/accounts/schema";

export function ForgotPasswordForm() {
  const [done, setDone] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<ForgotPasswordInput>({ resolver: zodResolver(forgotPasswordSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      const res = await api<{ message: string }>("/api/account/password/forgot", { body: values });
      setDone(res.message);
    } catch (e) {
      setFailure(applyFieldErrors(e, setError, ["email"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-5 flex flex-col gap-3">
      <div aria-live="polite">
        {done && <Alert tone="success">{done}</Alert>}
        {failure && <Alert tone="error">{failure}</Alert>}
      </div>
      <TextField label="E-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Button type="submit" pending={formState.isSubmitting}>
        Send the reset link
      </Button>
    </form>
  );
}
