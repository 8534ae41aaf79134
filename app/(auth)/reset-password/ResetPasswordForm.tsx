"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/Alert";
import { Button } from "@/components/ui/Button";
import { TextField } from "@/components/ui/TextField";
import { api, applyFieldErrors } from "@/lib/platform/client/api";
import { type ResetPasswordInput, resetPasswordSchema } from "@/lib/accounts/schema";

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<ResetPasswordInput>({
    resolver: zodResolver(resetPasswordSchema),
    defaultValues: { token },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await api("/api/account/password/reset", { body: values });
      router.push("/sign-in?reset=1");
    } catch (e) {
      setFailure(applyFieldErrors(e, setError, ["password", "confirm"]));
    }
  });

  const tokenError = formState.errors.token?.message;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-5 flex flex-col gap-3">
      <input type="hidden" {...register("token")} />
      <div aria-live="assertive">
        {(failure || tokenError) && (
          <Alert tone="error">
            {failure ?? tokenError}{" "}
            <Link className="underline" href="/forgot-password">
              Ask for a new link
            </Link>
            .
          </Alert>
        )}
      </div>
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        {...register("password")}
        error={formState.errors.password?.message}
      />
      <TextField
        label="Repeat the new password"
        type="password"
        autoComplete="new-password"
        {...register("confirm")}
        error={formState.errors.confirm?.message}
      />
      <Button type="submit" pending={formState.isSubmitting}>
        Change password
      </Button>
    </form>
  );
}
