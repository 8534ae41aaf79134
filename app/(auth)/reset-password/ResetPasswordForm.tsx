"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { type ResetPasswordInput, resetPasswordSchema } from "@/lib/accounts/schema";
import { AuthForm } from "../AuthForm";
import { PasswordField } from "../PasswordField";
import { useApiForm } from "../useApiForm";

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const { form, frame } = useApiForm<ResetPasswordInput>({
    schema: resetPasswordSchema,
    url: "/api/account/password/reset",
    fields: ["password", "confirm"],
    linkField: "token",
    defaultValues: { token },
    onDone: () => router.push("/sign-in?reset=1"),
  });
  const { register, formState } = form;

  return (
    <AuthForm
      {...frame}
      submit="Change password"
      recovery={
        <>
          <Link className="underline" href="/forgot-password">
            Ask for a new link
          </Link>
          .
        </>
      }
    >
      <input type="hidden" {...register("token")} />
      <PasswordField
        choose
        label="New password"
        hint="At least 10 characters."
        {...register("password")}
        error={formState.errors.password?.message}
      />
      <PasswordField choose label="Repeat the new password" {...register("confirm")} error={formState.errors.confirm?.message} />
    </AuthForm>
  );
}
